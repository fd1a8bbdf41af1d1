package org.nebulith.survey;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.nebulith.errors.InputException;
import org.nebulith.files.RunInputs;

/**
 * The validating first pass over a catalogue: every row is parsed, duplicates are found, and each
 * distinct disk and zone setting is resolved to an estimator, before anything is computed.
 *
 * <p>Memory: constant per row except a 64-bit hash and line number per star name (for duplicates,
 * about 100 bytes a star) and the list of bad rows; the compute pass that follows keeps none.
 *
 * @param problems every problem, in file order
 * @param bad      line to star name of every row that cannot be used
 * @param goodRows number of usable rows
 * @param headerOk whether the header is usable (header problems are never skippable)
 */
public record CatalogueCheck(List<CatalogueProblem> problems, Map<Long, String> bad, long goodRows, boolean headerOk) {

    /**
     * @param file      the catalogue
     * @param settings  the run settings
     * @param estimators the estimator cache (filled for every setting in use)
     * @return the check
     * @throws IOException if the file cannot be read
     * @throws InputException if the run's own disk or zones (not a star's) cannot be used
     */
    public static CatalogueCheck run(Path file, SurveySettings settings, EstimatorCache estimators) throws IOException {
        estimators.get(settings);
        List<CatalogueProblem> problems = new ArrayList<>();
        Map<Long, String> bad = new TreeMap<>();
        Map<Long, Long> names = new HashMap<>();
        Map<SurveySettings, String> unusable = new HashMap<>();
        long good = 0;
        try (CatalogueReader reader = CatalogueReader.open(file)) {
            problems.addAll(reader.headerProblems());
            for (CatalogueReader.Parsed p = reader.next(); p != null; p = reader.next()) {
                List<CatalogueProblem> rowProblems = new ArrayList<>(p.problems());
                if (!p.star().isEmpty()) {
                    Long first = names.putIfAbsent(DrawRandom.fnv1a64(p.star()), p.line());
                    if (first != null) {
                        rowProblems.add(new CatalogueProblem(p.line(), CatalogueColumns.STAR, p.star(),
                                "duplicate star (first at line " + first + ")", "each star once"));
                    }
                }
                if (rowProblems.isEmpty()) {
                    checkSettings(p.row(), settings, estimators, unusable, rowProblems);
                }
                if (rowProblems.isEmpty()) {
                    good++;
                } else {
                    problems.addAll(rowProblems);
                    bad.put(p.line(), p.star());
                }
            }
        }
        return new CatalogueCheck(List.copyOf(problems), bad, good, problems.stream().noneMatch(p -> isHeader(p, bad)));
    }

    /**
     * The cheap pass before any output is opened: registers every existing file named in a star's
     * disk or zones column as an input of the run (so no output may replace it) and counts the rows.
     *
     * @param file      the catalogue
     * @param shownName the catalogue as the user named it
     * @param inputs    the run's inputs
     * @return the number of star rows (good or not)
     * @throws IOException if the file cannot be read
     */
    public static long registerNamedFiles(Path file, String shownName, RunInputs inputs) throws IOException {
        inputs.add(file, "catalogue");
        long rows = 0;
        try (CatalogueReader reader = CatalogueReader.open(file)) {
            for (CatalogueReader.Parsed p = reader.next(); p != null; p = reader.next()) {
                rows++;
                if (p.row() != null) {
                    register(p.row().disk(), "disk (catalogue line " + p.line() + ")", inputs);
                    register(p.row().zones(), "feeding zones (catalogue line " + p.line() + ")", inputs);
                }
            }
        }
        return rows;
    }

    private static void register(String value, String role, RunInputs inputs) {
        if (value != null) {
            Path path = Path.of(value);
            if (Files.isRegularFile(path)) {
                inputs.add(path, role);
            }
        }
    }

    private static boolean isHeader(CatalogueProblem p, Map<Long, String> bad) {
        return !bad.containsKey(p.line());
    }

    private static void checkSettings(StarRow row, SurveySettings settings, EstimatorCache estimators,
                                      Map<SurveySettings, String> unusable, List<CatalogueProblem> out) {
        SurveySettings own = settings.forStar(row);
        if (own.equals(settings)) {
            return;
        }
        String why = unusable.get(own);
        if (why == null) {
            try {
                estimators.get(own);
                return;
            } catch (InputException | IllegalArgumentException e) {
                why = e.getMessage();
                unusable.put(own, why);
            }
        }
        String column = row.disk() != null ? CatalogueColumns.DISK : CatalogueColumns.ZONES;
        out.add(new CatalogueProblem(row.line(), column, row.star(), "cannot use the star's disk/zones: " + why,
                "a disk preset name or file, a feeding-zone file, or empty for the run's"));
    }

    /** @return whether the run may go ahead with skipping (no header problems and at least one row) */
    public boolean skippable() {
        return headerOk && goodRows > 0;
    }
}
