package org.nebulith.cli;

import java.util.List;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;

import picocli.CommandLine.Command;
import picocli.CommandLine.Unmatched;

// placeholder: wired by the engine work
/**
 * PLACEHOLDER registration of {@code nebulith point}: help text and examples only. It accepts any
 * arguments and fails with "not yet available" (exit code 2). The engine work replaces this class
 * with the real command (same name, extending {@link RunCommand}).
 */
@Command(name = "point",
        description = {
            "Equilibrium of one state: every gas species and condensed phase at one T, P.",
            "Gibbs free-energy minimisation for a given element inventory; writes CSV",
            "(species,phase,moles) to --out FILE or standard output.",
        },
        footerHeading = "%nExamples:%n",
        footer = {
            "  nebulith point --composition protosolar-lodders2003 --T-K 1400 --P-bar 1e-4",
            "  nebulith point --elements H=1,He=0.085,O=4.9e-4,Mg=3.4e-5,Si=3.2e-5 \\",
            "      --T-K 1200 --P-bar 1e-3",
            "  nebulith point --preset NAME --T-K 1500 --out state.csv",
            "      (options on the command line override the preset)",
        })
public final class PointCommand extends RunCommand {

    // placeholder: wired by the engine work (swallows the future options so that examples reach execute)
    @Unmatched
    private List<String> notYetParsed;

    @Override
    protected int execute(final RunContext context) {
        // placeholder: wired by the engine work
        throw new InputException(Messages.NOT_YET_AVAILABLE, null, "point");
    }
}
