package org.nebulith.report.survey;

import java.io.BufferedReader;
import java.io.Closeable;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.nebulith.errors.InputException;
import org.nebulith.survey.SurveyCsv;

/**
 * Reads an earlier {@code survey.csv} (complete, or the partial file of an interrupted run) star by
 * star, for {@code --resume}. A final line without its line end (cut by an interruption) is
 * dropped; the last block may therefore be incomplete, which {@link SurveyResume} handles.
 * Memory: one star's block.
 */
final class ExistingSurvey implements Closeable {

    /**
     * The consecutive rows of one star.
     *
     * @param star the star
     * @param text its lines, each ending in a line end
     * @param last whether no block follows
     */
    record Block(String star, String text, boolean last) {
    }

    private final Path file;
    private final BufferedReader in;
    private String pendingLine;
    private Block next;

    private ExistingSurvey(Path file, BufferedReader in) throws IOException {
        this.file = file;
        this.in = in;
        String header = readLine();
        if (header == null || !(header).equals(SurveyCsv.HEADER)) {
            throw InputException.inFile(file, "--resume: the header is not that of a survey table from this version",
                    "a survey.csv starting with " + SurveyCsv.HEADER.strip());
        }
        pendingLine = readLine();
        next = readBlock();
    }

    static ExistingSurvey open(Path file) throws IOException {
        BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8);
        try {
            return new ExistingSurvey(file, in);
        } catch (IOException | RuntimeException e) {
            in.close();
            throw e;
        }
    }

    Path file() {
        return file;
    }

    /** @return the next block without consuming it, or null */
    Block peek() {
        return next;
    }

    /** @return the next block, or null */
    Block next() throws IOException {
        Block b = next;
        next = b == null ? null : readBlock();
        if (b != null && next == null) {
            b = new Block(b.star(), b.text(), true);
        }
        return b;
    }

    private Block readBlock() throws IOException {
        if (pendingLine == null) {
            return null;
        }
        String star = SurveyCsv.starOf(pendingLine.stripTrailing());
        StringBuilder text = new StringBuilder();
        while (pendingLine != null && SurveyCsv.starOf(pendingLine.stripTrailing()).equals(star)) {
            text.append(pendingLine);
            pendingLine = readLine();
        }
        return new Block(star, text.toString(), false);
    }

    private String readLine() throws IOException {
        return terminatedLine(in);
    }

    /**
     * @param in a reader of a table written by this tool
     * @return the next line with its '\n', or null at the end or for a final line without one (a
     *         line cut by an interruption)
     */
    static String terminatedLine(final java.io.Reader in) throws IOException {
        StringBuilder line = new StringBuilder(96);
        int c;
        while ((c = in.read()) >= 0) {
            line.append((char) c);
            if (c == '\n') {
                return line.toString();
            }
        }
        return null;
    }

    @Override
    public void close() throws IOException {
        in.close();
    }
}
