package org.nebulith.report.survey;

import java.io.BufferedReader;
import java.io.Closeable;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.nebulith.errors.InputException;
import org.nebulith.survey.SurveyCsv;
import org.nebulith.survey.SurveyFailures;

/**
 * Reads the failures table of an earlier run for {@code --resume}, star by star in catalogue order
 * (each star's failures are consecutive lines; stars are unique in a catalogue). A final line
 * without its line end is dropped.
 */
final class ExistingFailures implements Closeable {

    private final BufferedReader in;
    private String pending;

    private ExistingFailures(Path file, BufferedReader in) throws IOException {
        this.in = in;
        String header = readLine();
        if (header == null || !header.equals(SurveyFailures.HEADER)) {
            throw InputException.inFile(file, "--resume: the header is not that of a failures table from this version",
                    "a failures.csv starting with " + SurveyFailures.HEADER.strip());
        }
        pending = readLine();
    }

    /**
     * @param file the failures table of the earlier run
     * @return the reader
     * @throws IOException if it cannot be read
     * @throws InputException if it is missing or not a failures table
     */
    static ExistingFailures open(Path file) throws IOException {
        if (!Files.exists(file)) {
            throw InputException.inFile(file, "--resume: the earlier run's failures table is missing",
                    "the folder of an earlier run, with its " + SurveyFailures.FILE);
        }
        BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8);
        try {
            return new ExistingFailures(file, in);
        } catch (IOException | RuntimeException e) {
            in.close();
            throw e;
        }
    }

    /**
     * @param star the next star taken over
     * @return its lines (empty if it had no failures)
     */
    String take(String star) throws IOException {
        StringBuilder b = new StringBuilder();
        while (pending != null && SurveyCsv.starOf(pending.stripTrailing()).equals(star)) {
            b.append(pending);
            pending = readLine();
        }
        return b.toString();
    }

    private String readLine() throws IOException {
        return ExistingSurvey.terminatedLine(in);
    }

    @Override
    public void close() throws IOException {
        in.close();
    }
}
