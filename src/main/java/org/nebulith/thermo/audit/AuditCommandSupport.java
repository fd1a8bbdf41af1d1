package org.nebulith.thermo.audit;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.nebulith.thermo.SpeciesDatabase;
import org.nebulith.thermo.source.Corrections;
import org.nebulith.thermo.source.DatabaseConverter;
import org.nebulith.thermo.source.NasaGlennReader;

/** Builds the audit report from a database and, where available, the source folder it was built from. */
public final class AuditCommandSupport {
    private AuditCommandSupport() {
    }

    /**
     * @param db      the database to audit
     * @param sources the source folder (for the enthalpies printed in the NASA records and the corrections),
     *                or null to skip that comparison
     * @return the report
     * @throws IOException on read failure
     */
    public static AuditReport report(SpeciesDatabase db, Path sources) throws IOException {
        Map<String, Double> printed = new LinkedHashMap<>();
        List<String> notes = new ArrayList<>();
        Corrections corrections = Corrections.none();
        if (sources != null) {
            try (Reader in = Files.newBufferedReader(sources.resolve(DatabaseConverter.NASA_FILE), StandardCharsets.US_ASCII)) {
                for (NasaGlennReader.Entry e : NasaGlennReader.read(in, DatabaseConverter.NASA_FILE)) {
                    printed.put(e.name(), e.hf298());
                }
            }
            corrections = Corrections.read(new StringReader(Files.readString(sources.resolve(Corrections.FILE),
                    StandardCharsets.UTF_8)), Corrections.FILE);
            notes.add("Enthalpies printed in the NASA records read from " + sources.resolve(DatabaseConverter.NASA_FILE)
                    + "; corrected entries are compared with their second source only.");
        } else {
            notes.add("No source folder given (--sources): the polynomial-versus-printed enthalpy comparison was not run.");
        }
        notes.add(String.format(java.util.Locale.ROOT, "Thresholds: vapour pressure 1 bar; gas enthalpy of formation "
                + "%.0f J/mol (polynomial) and %.0f J/mol (second source); piece jumps %.0e in h/RT, s/R, g/RT; "
                + "families %.1f kJ per mole of atoms at 500, 1000, 1500 K; formation from the oxides %.1f kJ/mol.",
                DataAudit.HF_POLYNOMIAL_THRESHOLD, DataAudit.HF_SECOND_SOURCE_THRESHOLD, DataAudit.JUMP_THRESHOLD,
                DataAudit.FAMILY_THRESHOLD_KJ, DataAudit.OXIDE_THRESHOLD_KJ));
        List<Finding> findings = DataAudit.run(db, printed, GasReferences.bundled());
        return new AuditReport(findings, AcceptedFindings.bundled(), corrections.all(), notes);
    }
}
