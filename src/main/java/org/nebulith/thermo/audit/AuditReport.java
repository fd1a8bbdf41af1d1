package org.nebulith.thermo.audit;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.nebulith.thermo.source.Corrections;

/** The findings of a data audit with their status, as CSV (full numbers) and Markdown (for people). */
public final class AuditReport {
    /** CSV columns. */
    public static final List<String> COLUMNS = List.of("check", "subject", "value", "threshold", "unit", "status",
            "reason", "detail");

    /** A finding with its status: accepted (with the reason) or new. */
    public record Row(Finding finding, String status, String reason) {
    }

    private final List<Row> rows;
    private final List<Corrections.Correction> corrections;
    private final List<String> notes;

    /**
     * @param findings    the findings
     * @param accepted    the accepted list
     * @param corrections the corrections applied when the database was built
     * @param notes       lines on checks not run or their inputs
     */
    public AuditReport(List<Finding> findings, AcceptedFindings accepted, List<Corrections.Correction> corrections,
                       List<String> notes) {
        List<Row> r = new ArrayList<>();
        for (Finding f : findings) {
            r.add(accepted.accepting(f).map(a -> new Row(f, "accepted", a.reason())).orElse(new Row(f, "new", "")));
        }
        this.rows = List.copyOf(r);
        this.corrections = List.copyOf(corrections);
        this.notes = List.copyOf(notes);
    }

    /** @return every row */
    public List<Row> rows() {
        return rows;
    }

    /** @return the findings not in the accepted list */
    public List<Finding> newFindings() {
        return rows.stream().filter(r -> r.status().equals("new")).map(Row::finding).toList();
    }

    /** @return the CSV text */
    public String csv() {
        StringBuilder b = new StringBuilder();
        try (CSVPrinter p = new CSVPrinter(b, CSVFormat.RFC4180.builder().setRecordSeparator("\n").get())) {
            p.printRecord(COLUMNS);
            for (Row r : rows) {
                Finding f = r.finding();
                p.printRecord(f.check(), f.subject(), Double.toString(f.value()), Double.toString(f.threshold()),
                        f.unit(), r.status(), r.reason(), f.detail());
            }
        } catch (java.io.IOException ex) {
            throw new java.io.UncheckedIOException(ex);
        }
        return b.toString();
    }

    /** A table cell: pipes escaped so that subjects such as {@code gas|solid} stay in one column. */
    private static String cell(String text) {
        return text.replace("|", "\\|");
    }

    /** @return the Markdown text */
    public String markdown() {
        StringBuilder b = new StringBuilder("# Thermodynamic data audit\n\n");
        b.append(String.format(Locale.ROOT, "%d findings: %d accepted with a reason, %d new.%n%n", rows.size(),
                rows.size() - newFindings().size(), newFindings().size()));
        notes.forEach(n -> b.append("- ").append(n).append('\n'));
        b.append("\n## Corrections applied when the database was built\n\n| species | field | file value | corrected |"
                + " source | reason |\n|---|---|---|---|---|---|\n");
        for (Corrections.Correction c : corrections) {
            b.append("| ").append(cell(c.species())).append(" | ").append(c.field()).append(" | ").append(c.fileValue())
                    .append(" | ").append(c.correctedValue()).append(" | ").append(cell(c.source())).append(" | ")
                    .append(cell(c.reason())).append(" |\n");
        }
        Map<String, List<Row>> byCheck = new LinkedHashMap<>();
        rows.forEach(r -> byCheck.computeIfAbsent(r.finding().check(), k -> new ArrayList<>()).add(r));
        for (Map.Entry<String, List<Row>> e : byCheck.entrySet()) {
            b.append("\n## ").append(e.getKey()).append(" (").append(e.getValue().size()).append(")\n\n")
                    .append("| subject | value | threshold | status | detail | reason |\n|---|---|---|---|---|---|\n");
            for (Row r : e.getValue()) {
                Finding f = r.finding();
                b.append(String.format(Locale.ROOT, "| %s | %.3g %s | %.3g | %s | %s | %s |%n", cell(f.subject()),
                        f.value(), f.unit(), f.threshold(), r.status(), cell(f.detail()), cell(r.reason())));
            }
        }
        return b.toString();
    }
}
