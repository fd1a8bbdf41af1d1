package org.nebulith.cli;

import java.util.List;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;

import picocli.CommandLine.Command;
import picocli.CommandLine.Unmatched;

// placeholder: wired by the engine work
/**
 * PLACEHOLDER registration of {@code nebulith sequence}: help text and examples only. It accepts any
 * arguments and fails with "not yet available" (exit code 2). The engine work replaces this class
 * with the real command (same name, extending {@link RunCommand}).
 */
@Command(name = "sequence",
        description = {
            "Condensation sequence: what condenses, and when, as a gas cools.",
            "At fixed pressure or along a P-T path: phases against T, the fraction of each",
            "element condensed, 50% condensation temperatures, phase appearance.",
        },
        footerHeading = "%nExamples:%n",
        footer = {
            "  nebulith sequence --composition protosolar-lodders2003 --P-bar 1e-4",
            "  nebulith sequence --composition protosolar-lodders2003 --P-bar 1e-3 \\",
            "      --T-max-K 1800 --T-min-K 400",
            "  nebulith sequence --path my-path.csv --out reports/cooling-path",
            "      (path CSV header: T_K,P_bar)",
        })
public final class SequenceCommand extends RunCommand {

    // placeholder: wired by the engine work (swallows the future options so that examples reach execute)
    @Unmatched
    private List<String> notYetParsed;

    @Override
    protected int execute(final RunContext context) {
        // placeholder: wired by the engine work
        throw new InputException(Messages.NOT_YET_AVAILABLE, null, "sequence");
    }
}
