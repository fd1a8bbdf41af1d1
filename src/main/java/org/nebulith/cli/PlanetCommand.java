package org.nebulith.cli;

import java.util.List;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;

import picocli.CommandLine.Command;
import picocli.CommandLine.Unmatched;

// placeholder: wired by the engine work
/**
 * PLACEHOLDER registration of {@code nebulith planet}: help text and examples only. It accepts any
 * arguments and fails with "not yet available" (exit code 2). The engine work replaces this class
 * with the real command (same name, extending {@link RunCommand}).
 */
@Command(name = "planet",
        description = {
            "Bulk composition of a rocky planet formed from its feeding zone in a disk.",
            "Integrates what condenses across the zone; core/mantle split; key ratios beside",
            "the host star, bulk Earth and CI chondrite. Without arguments it runs the",
            "built-in demo scenario (an invented star, disk and planet).",
        },
        footerHeading = "%nExamples:%n",
        footer = {
            "  nebulith planet                  demo scenario, report in reports/",
            "  nebulith planet --composition protosolar-lodders2003 --disk NAME \\",
            "      --zones feeding-zones/FILE.csv",
            "  nebulith planet --preset NAME --out reports/my-planet --force",
        })
public final class PlanetCommand extends RunCommand {

    // placeholder: wired by the engine work (swallows the future options so that examples reach execute)
    @Unmatched
    private List<String> notYetParsed;

    @Override
    protected int execute(final RunContext context) {
        // placeholder: wired by the engine work
        throw new InputException(Messages.NOT_YET_AVAILABLE, null, "planet");
    }
}
