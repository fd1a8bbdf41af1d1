package org.nebulith.cli;

import java.util.List;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;

import picocli.CommandLine.Command;
import picocli.CommandLine.Unmatched;

// placeholder: wired by the engine work
/**
 * PLACEHOLDER registration of {@code nebulith survey}: help text and examples only. It accepts any
 * arguments and fails with "not yet available" (exit code 2). The engine work replaces this class
 * with the real command (same name, extending {@link RunCommand}).
 */
@Command(name = "survey",
        description = {
            "Host-star survey: predicted rocky planets for a catalogue of stars.",
            "Monte Carlo over the abundance errors: median, 16th and 84th percentiles of",
            "every quantity; parallel, and reproducible for a given seed.",
        },
        footerHeading = "%nExamples:%n",
        footer = {
            "  nebulith survey --catalogue CATALOGUE.csv --draws 1000 --seed 7",
            "  nebulith survey --catalogue CATALOGUE.csv --threads 2 --out reports/survey-demo",
        })
public final class SurveyCommand extends RunCommand {

    // placeholder: wired by the engine work (swallows the future options so that examples reach execute)
    @Unmatched
    private List<String> notYetParsed;

    @Override
    protected int execute(final RunContext context) {
        // placeholder: wired by the engine work
        throw new InputException(Messages.NOT_YET_AVAILABLE, null, "survey");
    }
}
