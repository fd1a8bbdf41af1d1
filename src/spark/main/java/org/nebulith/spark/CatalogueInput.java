package org.nebulith.spark;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import org.apache.hadoop.conf.Configuration;
import org.apache.hadoop.fs.FileSystem;
import org.apache.hadoop.fs.Path;
import org.nebulith.errors.InputException;
import org.nebulith.survey.CatalogueCheck;
import org.nebulith.survey.CatalogueProblem;
import org.nebulith.survey.CatalogueReader;
import org.nebulith.survey.EstimatorCache;
import org.nebulith.survey.PlanetEstimator;
import org.nebulith.survey.StarRow;
import org.nebulith.survey.SurveySettings;

/**
 * Reads and checks a catalogue on the driver with the local survey's reader and checks
 * ({@link CatalogueReader}, {@link CatalogueCheck}: one line per problem, duplicates found), from
 * any Hadoop file system. Disk and zone files are not opened here: they need only exist where the
 * tasks run, and a star whose files cannot be used fails in its task (listed, not fatal).
 */
public final class CatalogueInput {

    private static final int SHOWN_PROBLEMS = 100;

    /** Stands in for the estimator during the check: the driver builds none. */
    private static final PlanetEstimator NOT_BUILT = gas -> {
        throw new IllegalStateException("the driver computes no estimate");
    };

    private CatalogueInput() {
    }

    /**
     * @param catalogue the catalogue (a Hadoop path or URI)
     * @param hadoop    the Hadoop configuration
     * @param settings  the run's settings
     * @param skipBad   skip bad rows (each is reported) instead of stopping
     * @param warn      receives each problem line
     * @return the good rows, in catalogue order
     * @throws IOException if the catalogue cannot be read
     * @throws InputException if it has problems (and they may not be skipped) or no rows
     */
    public static List<StarRow> read(String catalogue, Configuration hadoop, SurveySettings settings, boolean skipBad,
                                     Consumer<String> warn) throws IOException {
        java.nio.file.Path local = Files.createTempFile("nebulith-catalogue", ".csv");
        try {
            Path source = new Path(catalogue);
            FileSystem fs = source.getFileSystem(hadoop);
            if (!fs.isFile(source)) {
                throw InputException.inFile(catalogue, "no such file", "a readable catalogue CSV (local path or URI)");
            }
            try (InputStream in = fs.open(source)) {
                Files.copy(in, local, StandardCopyOption.REPLACE_EXISTING);
            }
            return read(local, catalogue, settings, skipBad, warn);
        } finally {
            Files.deleteIfExists(local);
        }
    }

    /**
     * @param file      a local catalogue file
     * @param shownName the catalogue as the user named it (messages)
     * @param settings  the run's settings
     * @param skipBad   skip bad rows instead of stopping
     * @param warn      receives each problem line
     * @return the good rows, in catalogue order
     * @throws IOException if the file cannot be read
     */
    public static List<StarRow> read(java.nio.file.Path file, String shownName, SurveySettings settings, boolean skipBad,
                                     Consumer<String> warn) throws IOException {
        CatalogueCheck check = CatalogueCheck.run(file, settings, new EstimatorCache(s -> NOT_BUILT));
        List<CatalogueProblem> problems = check.problems();
        for (int i = 0; i < Math.min(SHOWN_PROBLEMS, problems.size()); i++) {
            warn.accept(problems.get(i).text(shownName));
        }
        if (problems.size() > SHOWN_PROBLEMS) {
            warn.accept("... and " + (problems.size() - SHOWN_PROBLEMS) + " more problems");
        }
        if (!problems.isEmpty() && (!skipBad || !check.skippable())) {
            throw InputException.inFile(shownName, problems.size() + " problem(s), listed above; nothing was computed",
                    check.headerOk() ? "a corrected catalogue, or --skip-bad to skip the bad rows"
                            : "a header of star, X_H, X_H_err columns (header problems cannot be skipped)");
        }
        if (check.goodRows() == 0) {
            throw InputException.inFile(shownName, "the catalogue has no star rows", "a header line and one row per star");
        }
        if (!problems.isEmpty()) {
            warn.accept("--skip-bad: skipping " + check.bad().size() + " bad row(s)");
        }
        List<StarRow> rows = new ArrayList<>();
        try (CatalogueReader reader = CatalogueReader.open(file)) {
            for (CatalogueReader.Parsed p = reader.next(); p != null; p = reader.next()) {
                if (p.row() != null && !check.bad().containsKey(p.line())) {
                    rows.add(p.row());
                }
            }
        }
        return rows;
    }
}
