package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.nebulith.equilibrium.ConvergenceException;
import org.nebulith.equilibrium.EquilibriumProblem;
import org.nebulith.equilibrium.SystemSpec;
import org.nebulith.errors.InputException;
import org.nebulith.thermo.Element;

/** Only the input and the numerical exception map to exit 2 and 3; everything else is an internal error. */
class FailureReportTest {

    @Test
    void onlyTheTwoExceptionsMapToTwoAndThree() {
        assertEquals(2, FailureReport.classify(InputException.atOption("--floor-K", 100, "too cold", ">= 200")).exitCode());
        assertEquals(2, FailureReport.classify(new RuntimeException("wrapped",
                InputException.atField("z.csv", 2, "shape", "box", "unknown shape", "tophat, gaussian"))).exitCode());
        FailureReport.Outcome bug = FailureReport.classify(new IllegalArgumentException("floor must be >= 200 K"));
        assertEquals(1, bug.exitCode());
        assertTrue(bug.message().startsWith("internal error: ") && bug.message().contains("please report it"),
                bug.message());
    }

    @Test
    void convergenceFailureIsNumericalAndCarriesTheState() {
        EquilibriumProblem p = new EquilibriumProblem(SystemSpec.defaults().build(EnumSet.of(Element.H, Element.O)),
                1234.5, 1e-4, new double[] {1, 5e-4});
        ConvergenceException e = ConvergenceException.at(p, "phase selection cycled", List.of("gas"),
                Map.of("balance", 2e-9));
        FailureReport.Outcome o = FailureReport.classify(e);
        assertEquals(3, o.exitCode());
        assertEquals(e.getMessage(), o.message(), "the message is shown whole, nothing stripped");
        assertTrue(o.message().startsWith("no converged equilibrium at T = 1234.5 K"), o.message());
        assertEquals(1234.5, e.temperatureK());
        assertEquals(1e-4, e.pressureBar());
        assertEquals(Map.of("H", 1.0, "O", 5e-4), e.composition());
        assertEquals(List.of("gas"), e.phases());
        assertEquals(2e-9, e.residuals().get("balance"));
    }
}
