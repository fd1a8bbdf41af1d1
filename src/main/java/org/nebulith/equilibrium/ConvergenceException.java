package org.nebulith.equilibrium;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.StringJoiner;

import org.nebulith.errors.Messages;
import org.nebulith.errors.NumericalException;
import org.nebulith.format.Decimal;

/**
 * The solver could not find an equilibrium that passes its checks. The message names the state and
 * what failed; the state itself is kept as fields so that a caller can record or retry it without
 * reading the text: temperature [K], pressure [bar], element totals [mol], the phases present in
 * the last iterate and the residuals of the last rejected result. It is the one numerical exception
 * of the solver (the command line maps it, like every {@link NumericalException}, to exit code 3).
 */
public class ConvergenceException extends NumericalException {
    private static final long serialVersionUID = 1L;

    private final double temperatureK;
    private final double pressureBar;
    private final transient Map<String, Double> composition;
    private final transient List<String> phases;
    private final transient Map<String, Double> residuals;

    /**
     * A failure known only by its text (the state fields are NaN and empty).
     *
     * @param message what failed, at which state
     */
    public ConvergenceException(String message) {
        this(message, Double.NaN, Double.NaN, Map.of(), List.of(), Map.of());
    }

    private ConvergenceException(String message, double tK, double pBar, Map<String, Double> composition,
                                 List<String> phases, Map<String, Double> residuals) {
        super(Messages.NO_EQUILIBRIUM, null, message);
        this.temperatureK = tK;
        this.pressureBar = pBar;
        this.composition = Collections.unmodifiableMap(new LinkedHashMap<>(composition));
        this.phases = List.copyOf(phases);
        this.residuals = Collections.unmodifiableMap(new LinkedHashMap<>(residuals));
    }

    /**
     * @param problem   the state that failed
     * @param what      what failed
     * @param phases    names of the phases present in the last iterate (may be empty)
     * @param residuals named residuals of the last rejected result, e.g. {@code balance},
     *                  {@code potential_RT}, {@code affinity_RT} (may be empty)
     * @return the exception; its message reads {@code no converged equilibrium at T = .. K, P = .. bar,
     *         composition (mol) H=..,O=..: <what>}, every number in its shortest round-trip form so that
     *         the state can be reproduced
     */
    public static ConvergenceException at(EquilibriumProblem problem, String what, List<String> phases,
                                          Map<String, Double> residuals) {
        Map<String, Double> comp = new LinkedHashMap<>();
        ChemicalSystem system = problem.system();
        for (int j = 0; j < system.elementCount(); j++) {
            comp.put(system.elements().get(j).symbol(), problem.total(j));
        }
        StringJoiner inline = new StringJoiner(",");
        comp.forEach((el, mol) -> inline.add(el + "=" + Decimal.format(mol)));
        String message = "no converged equilibrium at T = " + Decimal.format(problem.temperatureK()) + " K, P = "
                + Decimal.format(problem.pressureBar()) + " bar, composition (mol) " + inline + ": " + what;
        return new ConvergenceException(message, problem.temperatureK(), problem.pressureBar(), comp, phases,
                residuals);
    }

    /** @return temperature of the failed state [K], NaN if unknown */
    public double temperatureK() {
        return temperatureK;
    }

    /** @return pressure of the failed state [bar], NaN if unknown */
    public double pressureBar() {
        return pressureBar;
    }

    /** @return element symbol to total [mol] of the failed state, in the system's order (empty if unknown) */
    public Map<String, Double> composition() {
        return composition;
    }

    /** @return names of the phases present in the last iterate (empty if unknown) */
    public List<String> phases() {
        return phases;
    }

    /** @return named residuals of the last rejected result (empty if none was built) */
    public Map<String, Double> residuals() {
        return residuals;
    }
}
