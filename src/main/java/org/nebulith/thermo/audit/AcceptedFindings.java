package org.nebulith.thermo.audit;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.nebulith.errors.InputException;

/**
 * Findings of the data audit that were examined and accepted, each with its reason (bundled resource
 * {@code accepted-findings.csv}; columns {@code check,subject,max_value,reason}). {@code subject} is
 * a glob ({@code *} any text); a finding is accepted when check and subject match and its value does not
 * exceed {@code max_value}, so a finding that grows is new again.
 */
public final class AcceptedFindings {
    /** One accepted rule. */
    public record Rule(String check, String subject, double maxValue, String reason, Pattern pattern) {
        boolean accepts(Finding f) {
            return f.check().equals(check) && pattern.matcher(f.subject()).matches() && f.value() <= maxValue;
        }
    }

    private final List<Rule> rules;

    private AcceptedFindings(List<Rule> rules) {
        this.rules = List.copyOf(rules);
    }

    /** @return the bundled list */
    public static AcceptedFindings bundled() {
        try (InputStream in = AcceptedFindings.class.getResourceAsStream("accepted-findings.csv")) {
            return read(new InputStreamReader(in, StandardCharsets.UTF_8), "accepted-findings.csv");
        } catch (IOException ex) {
            throw new UncheckedIOException(ex);
        }
    }

    /**
     * @param in   the list
     * @param file its name for messages
     * @return the rules
     * @throws IOException on read failure
     */
    public static AcceptedFindings read(Reader in, String file) throws IOException {
        List<Rule> out = new ArrayList<>();
        CSVFormat fmt = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get();
        try (CSVParser p = CSVParser.parse(in, fmt)) {
            for (CSVRecord r : p) {
                long line = r.getRecordNumber() + 1;
                double max;
                try {
                    max = Double.parseDouble(r.get("max_value").trim());
                } catch (NumberFormatException ex) {
                    throw InputException.atField(file, line, "max_value", r.get("max_value"), "not a number",
                            "the largest accepted value in the finding's unit");
                }
                if (r.get("reason").isBlank()) {
                    throw InputException.atField(file, line, "reason", r.get("reason"), "empty", "why the finding is accepted");
                }
                String subject = r.get("subject").trim();
                Pattern glob = Pattern.compile(Pattern.quote(subject).replace("*", "\\E.*\\Q"));
                out.add(new Rule(r.get("check").trim(), subject, max, r.get("reason").trim(), glob));
            }
        }
        return new AcceptedFindings(out);
    }

    /** @param f a finding @return the first rule accepting it, if any */
    public Optional<Rule> accepting(Finding f) {
        return rules.stream().filter(r -> r.accepts(f)).findFirst();
    }
}
