package org.nebulith.cli;

import java.nio.file.Files;
import java.nio.file.Path;

import org.nebulith.errors.InputException;
import org.nebulith.files.RunFolder;
import org.nebulith.thermo.SpeciesDatabase;
import org.nebulith.thermo.audit.AuditCommandSupport;
import org.nebulith.thermo.audit.AuditReport;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Audits every species of the bundled database (every data set) and writes the findings. */
@Command(name = "data-audit",
        description = {
            "Audit the thermodynamic data: vapour pressure of each gas over its own solid,",
            "gas enthalpies of formation (polynomial, printed value, second source), jumps",
            "at polynomial piece boundaries, differences between source families at 500,",
            "1000, 1500 K, formation energies from the oxides.",
            "Writes data-audit.md and data-audit.csv (every finding, accepted with its",
            "reason or new) into --out (default reports/data-audit-<yyyyMMdd-HHmmss>/).",
            "The count of new findings is printed; the test suite fails on any.",
        },
        footer = {"%nExamples:", "  nebulith data-audit --out reports/audit",
            "  nebulith data-audit --sources src/data/thermo-sources --out reports/audit"})
public final class DataAuditCommand extends RunCommand {

    @Mixin
    private RunOptions output;

    @Override
    protected OutputTarget outputTarget() {
        return output;
    }

    @Option(names = "--sources", paramLabel = "DIR",
            description = "Source folder the database was built from (for the enthalpies printed in the NASA records"
                    + " and the corrections table); without it that comparison is skipped.")
    private Path sources;

    @Override
    protected int execute(RunContext context) throws Exception {
        if (sources != null && !Files.isRegularFile(sources.resolve("nasa_glenn_thermo.inp"))) {
            throw InputException.atOption("--sources", sources.toString(), "no nasa_glenn_thermo.inp in it",
                    "the folder src/data/thermo-sources of the source tree");
        }
        if (sources != null) {
            context.input(sources.resolve("nasa_glenn_thermo.inp"), "thermodynamic source");
        }
        AuditReport report;
        try (RunFolder run = context.openRunFolder(context.defaultRunName())) {
            report = AuditCommandSupport.report(SpeciesDatabase.bundled(), sources);
            run.writeText("data-audit.md", report.markdown());
            run.writeText("data-audit.csv", report.csv());
            run.commit();
        }
        context.info(report.rows().size() + " findings, " + report.newFindings().size() + " new (not accepted)");
        return ExitCodes.OK;
    }
}
