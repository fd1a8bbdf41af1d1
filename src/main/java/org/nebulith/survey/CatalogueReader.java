package org.nebulith.survey;

import java.io.BufferedReader;
import java.io.Closeable;
import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.nebulith.errors.Messages;
import org.nebulith.thermo.Element;

/**
 * Reads a star catalogue row by row (memory constant in its length): one CSV record per line,
 * lines starting with {@code #} and blank lines ignored, a header first (see
 * {@link CatalogueColumns}). An empty value and error cell means the star lacks the element (it
 * follows [Fe/H]). Each row comes back either as a {@link StarRow} or with its problems; problems
 * that need the whole file (duplicate stars) are found by {@link CatalogueCheck}.
 *
 * <p>Accepted values: [X/H] finite, from {@value #MIN_DEX} to {@value #MAX_DEX} dex (a larger value
 * is most likely a log eps), errors from 0 to {@value #MAX_ERROR} dex, err_corr from 0 to 1.
 * Quoted cells may not span lines.
 */
public final class CatalogueReader implements Closeable {

    static final double MIN_DEX = -5;
    static final double MAX_DEX = 2;
    static final double MAX_ERROR = 1;
    private static final CSVFormat LINE = CSVFormat.DEFAULT.builder().setTrim(true).get();

    /**
     * A parsed row: the star if the row is good, else its problems.
     *
     * @param line     1-based line
     * @param star     the star's name as written (may be empty)
     * @param row      the row, or null if it has problems
     * @param problems the row's problems (empty for a good row)
     */
    public record Parsed(long line, String star, StarRow row, List<CatalogueProblem> problems) {
    }

    private final BufferedReader in;
    private final CatalogueColumns columns;
    private long line;

    private CatalogueReader(BufferedReader in) throws IOException {
        this.in = in;
        List<String> header;
        try {
            header = nextRecord();
        } catch (IllegalStateException | UncheckedIOException e) {
            header = null;
        }
        if (header == null) {
            columns = CatalogueColumns.parse(List.of(), Math.max(1, line));
            columns.problems.clear();
            columns.problems.add(new CatalogueProblem(Math.max(1, line), "(header)", "", "no readable header row",
                    CatalogueColumns.ACCEPTED));
        } else {
            columns = CatalogueColumns.parse(header, line);
        }
    }

    /**
     * @param file a catalogue file (UTF-8)
     * @return the reader, positioned after the header
     * @throws IOException if the file cannot be read
     */
    public static CatalogueReader open(Path file) throws IOException {
        BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8);
        try {
            return new CatalogueReader(in);
        } catch (IOException | RuntimeException e) {
            in.close();
            throw e;
        }
    }

    /** @return problems of the header (if any, {@link #next()} returns no rows) */
    public List<CatalogueProblem> headerProblems() {
        return List.copyOf(columns.problems);
    }

    /** @return the elements that have columns, in {@link Element} order */
    public List<Element> elements() {
        return List.copyOf(columns.elements.keySet());
    }

    /**
     * @return the next row, or null at the end of the file (or at once if the header is bad)
     * @throws IOException if reading fails
     */
    public Parsed next() throws IOException {
        if (!columns.problems.isEmpty()) {
            return null;
        }
        List<String> cells;
        try {
            cells = nextRecord();
        } catch (IllegalStateException | UncheckedIOException e) {
            return new Parsed(line, "", null, List.of(new CatalogueProblem(line, "(row)", "",
                    "cannot split the line into CSV cells (" + e.getMessage() + ")", "one CSV record per line")));
        }
        return cells == null ? null : parse(cells);
    }

    private Parsed parse(List<String> cells) {
        List<CatalogueProblem> problems = new ArrayList<>();
        String star = cells.size() > columns.star ? cells.get(columns.star) : "";
        if (cells.size() != columns.names.size()) {
            problems.add(new CatalogueProblem(line, "(row)", star, String.join(",", cells), cells.size() + " cells for " + columns.names.size()
                    + " columns", "one cell per header column (empty cells allowed)"));
            return new Parsed(line, star, null, problems);
        }
        if (star.isEmpty()) {
            problems.add(new CatalogueProblem(line, CatalogueColumns.STAR, "", "empty star name", "a name for every row"));
        }
        Map<Element, Measurement> abundances = new EnumMap<>(Element.class);
        columns.elements.forEach((el, idx) -> readElement(el, cells.get(idx[0]), cells.get(idx[1]), star, abundances, problems));
        if (!abundances.containsKey(Element.Fe) && problems.stream().noneMatch(p -> p.column().startsWith("Fe_H"))) {
            problems.add(new CatalogueProblem(line, "Fe_H", star, "no [Fe/H] value (elements the star lacks follow it)",
                    "[Fe/H] with its error for every star"));
        }
        double correlation = readCorrelation(cells, star, problems);
        problems.sort(java.util.Comparator.comparingInt(p -> columnIndex(p.column())));
        if (!problems.isEmpty()) {
            return new Parsed(line, star, null, problems);
        }
        return new Parsed(line, star, new StarRow(star, line, abundances, optional(cells, columns.disk),
                optional(cells, columns.zones), correlation), List.of());
    }

    private void readElement(Element el, String value, String error, String star, Map<Element, Measurement> out,
                             List<CatalogueProblem> problems) {
        String valueColumn = columns.names.get(columns.elements.get(el)[0]).trim();
        String errorColumn = columns.names.get(columns.elements.get(el)[1]).trim();
        if (value.isEmpty() && error.isEmpty()) {
            return;
        }
        if (value.isEmpty()) {
            problems.add(new CatalogueProblem(line, valueColumn, star, "an error without a value",
                    "both cells empty (the element follows [Fe/H]) or both given"));
            return;
        }
        if (error.isEmpty()) {
            problems.add(new CatalogueProblem(line, errorColumn, star, "a value without an error",
                    "an error in dex (0 for an exact value), or both cells empty"));
            return;
        }
        Double dex = number(value, valueColumn, star, MIN_DEX, MAX_DEX, "[X/H] in dex from " + MIN_DEX + " to +" + MAX_DEX
                + " relative to the solar reference (log eps values must be converted)", problems);
        Double err = number(error, errorColumn, star, 0, MAX_ERROR, "a 1-sigma error in dex from 0 to " + MAX_ERROR, problems);
        if (dex != null && err != null) {
            out.put(el, new Measurement(dex, err));
        }
    }

    private double readCorrelation(List<String> cells, String star, List<CatalogueProblem> problems) {
        if (columns.errorCorrelation < 0 || cells.get(columns.errorCorrelation).isEmpty()) {
            return 0;
        }
        Double rho = number(cells.get(columns.errorCorrelation), CatalogueColumns.ERROR_CORRELATION, star, 0, 1,
                "a correlation coefficient from 0 to 1, or empty (independent errors)", problems);
        return rho == null ? 0 : rho;
    }

    private Double number(String text, String column, String star, double min, double max, String accepted,
                          List<CatalogueProblem> problems) {
        double v;
        try {
            v = Double.parseDouble(text);
        } catch (NumberFormatException e) {
            problems.add(new CatalogueProblem(line, column, star, text, "not a number", accepted));
            return null;
        }
        if (!Double.isFinite(v) || v < min || v > max) {
            problems.add(new CatalogueProblem(line, column, star, text,
                    v < 0 && min == 0 ? "negative value" : "out of range", accepted));
            return null;
        }
        return v;
    }

    private int columnIndex(String column) {
        for (int i = 0; i < columns.names.size(); i++) {
            if (columns.names.get(i).trim().equalsIgnoreCase(column)) {
                return i;
            }
        }
        return -1;
    }

    private static String optional(List<String> cells, int index) {
        return index < 0 || cells.get(index).isEmpty() ? null : cells.get(index);
    }

    /** @return the cells of the next non-comment, non-blank line, or null at the end */
    private List<String> nextRecord() throws IOException {
        String text;
        while ((text = in.readLine()) != null) {
            line++;
            if (line == 1 && text.startsWith("\uFEFF")) {
                text = text.substring(1);
            }
            String t = text.strip();
            if (t.isEmpty() || t.startsWith("#")) {
                continue;
            }
            try (CSVParser parser = CSVParser.parse(new StringReader(text), LINE)) {
                List<CSVRecord> records = parser.getRecords();
                List<String> cells = new ArrayList<>();
                records.get(0).forEach(cells::add);
                return cells;
            }
        }
        return null;
    }

    @Override
    public void close() throws IOException {
        in.close();
    }
}
