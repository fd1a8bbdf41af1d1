package org.nebulith.cli;

import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumProblem;
import org.nebulith.equilibrium.EquilibriumResult;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.equilibrium.PhaseKind;
import org.nebulith.equilibrium.SystemSpec;
import org.nebulith.errors.InputException;
import org.nebulith.files.AtomicOutput;
import org.nebulith.report.Cautions;
import org.nebulith.files.CsvTableWriter;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code nebulith point}: the equilibrium of one state (T, P, element inventory), solved from a
 * cold start and checked a posteriori. Writes one CSV row per gas species with data at T and per
 * member of every condensed phase present (see {@link PointTable}) to {@code --out FILE}
 * (atomically) or to standard output; a summary goes to standard error.
 */
@Command(name = "point",
        description = {
            "Equilibrium of one state: every gas species and condensed phase at one T, P.",
            "Gibbs free-energy minimisation for a given element inventory; writes the CSV",
            "species,phase,moles,mole_fraction,state,data_id to --out FILE or standard",
            "output (data_id: the species' id in the thermodynamic data).",
            "Amounts are moles on the basis of the composition as given.",
        },
        footerHeading = "%nExamples:%n",
        footer = {
            "  nebulith point --composition protosolar-lodders2003 --T-K 1400 --P-bar 1e-4",
            "  nebulith point --elements H=1,He=0.085,O=4.9e-4,Mg=3.4e-5,Si=3.2e-5 \\",
            "      --T-K 1200 --P-bar 1e-3",
            "  nebulith point --data nasa --gases gases.txt --condensed condensed.txt \\",
            "      --elements H=1,He=0.085,O=4.9e-4,C=2.7e-4,Fe=2.9e-5 \\",
            "      --T-K 1300 --P-bar 1e-4",
            "  nebulith point --preset NAME --T-K 1500 --out state.csv",
            "      (options on the command line override the preset)",
        })
public final class PointCommand extends RunCommand {

    @Mixin
    private FileOutputOptions output;

    @Override
    protected OutputTarget outputTarget() {
        return output;
    }

    @Mixin
    private ChemistryOptions chemistry;

    @Option(names = "--T-K", paramLabel = "T", required = true, description = "Temperature [K].")
    private double temperatureK;

    @Option(names = "--P-bar", paramLabel = "P", required = true, description = "Total pressure [bar].")
    private double pressureBar;

    @Override
    protected int execute(final RunContext context) throws IOException {
        checkState();
        ElementAbundances comp = chemistry.composition(context);
        SystemSpec spec = chemistry.systemSpec(context);
        DomainChecks.temperature("--T-K", temperatureK, spec.species());
        DomainChecks.pressure("--P-bar", pressureBar);
        Optional<Path> out = context.outOption();
        try (AtomicOutput.OutputFile file = context.reserveOutputFile(String.join(",", PointTable.COLUMNS)).orElse(null)) {
            ChemicalSystem system = spec.build(comp.elements());
            EquilibriumProblem problem = EquilibriumProblem.of(system, temperatureK, pressureBar, comp.asMap());
            EquilibriumResult result = solve(problem);
            String csv = csv(result);
            if (file != null) {
                file.write(o -> o.write(csv.getBytes(StandardCharsets.UTF_8)));
            } else {
                Writer w = new OutputStreamWriter(context.out(), StandardCharsets.UTF_8);
                w.write(csv);
                w.flush();
            }
            summarise(context, result, spec, out);
        }
        return ExitCodes.OK;
    }

    private void checkState() {
        if (!(temperatureK > 0) || !Double.isFinite(temperatureK)) {
            throw InputException.atOption("--T-K", temperatureK, "not a positive temperature", "a finite number of K > 0");
        }
        if (!(pressureBar > 0) || !Double.isFinite(pressureBar)) {
            throw InputException.atOption("--P-bar", pressureBar, "not a positive pressure", "a finite number of bar > 0");
        }
    }

    private static EquilibriumResult solve(final EquilibriumProblem problem) {
        return new EquilibriumSolver().solve(problem);
    }

    private static String csv(final EquilibriumResult result) {
        StringWriter text = new StringWriter();
        try (CsvTableWriter w = CsvTableWriter.open(text, "point", PointTable.COLUMNS)) {
            PointTable.rows(result).forEach(w::row);
        }
        return text.toString();
    }

    private static void summarise(final RunContext context, final EquilibriumResult r, final SystemSpec spec,
                                  final Optional<Path> out) {
        EquilibriumResult.Diagnostics d = r.diagnostics();
        context.info(String.format(Locale.ROOT, "point: T = %s K, P = %s bar; %s", fmt(r.problem().temperatureK()),
                fmt(r.problem().pressureBar()), spec.describe()));
        context.info("condensed phases present: " + (r.presentPhaseNames().isEmpty() ? "none"
                : r.presentPhaseNames().stream().map(org.nebulith.thermo.PhaseNames::display).distinct()
                        .collect(java.util.stream.Collectors.joining(", "))));
        context.info(String.format(Locale.ROOT, "checks: element balance %.1e, largest residual %.1e RT, smallest "
                        + "absent affinity %.3g RT per atom%s; %d Newton iterations",
                d.maxBalanceError(), d.maxPotentialResidual(), d.minAbsentAffinity(),
                d.minAffinityPhase().isEmpty() ? "" : " (" + d.minAffinityPhase() + ")", d.newtonIterations()));
        int solutions = 0;
        for (int p : r.presentCondensedPhases()) {
            solutions += r.system().phaseKind(p) == PhaseKind.SOLUTION ? 1 : 0;
        }
        if (solutions > 0) {
            context.info(Cautions.point());
        }
        out.ifPresent(f -> context.info("wrote " + f));
    }

    private static String fmt(final double v) {
        return org.nebulith.format.Decimal.format(v);
    }
}
