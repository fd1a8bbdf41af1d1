package org.nebulith.condensation;

import java.util.List;

import org.nebulith.equilibrium.ChemicalSystem;

/**
 * A computed condensation sequence: the steps on the temperature grid (hottest first), the phase
 * stability intervals and the element condensation temperatures, with the settings and the input.
 */
public final class CondensationSequence {
    private final ChemicalSystem system;
    private final double[] inputTotals;
    private final SequenceSettings settings;
    private final List<SequenceStep> steps;
    private final List<PhaseEvent> events;
    private final List<ElementCondensation> temperatures;
    private final double[][] finalWithdrawn;
    private final double[] finalReactingTotals;
    private final double[] floorAdded;

    CondensationSequence(ChemicalSystem system, double[] inputTotals, SequenceSettings settings,
                         List<SequenceStep> steps, List<PhaseEvent> events, List<ElementCondensation> temperatures,
                         double[][] finalWithdrawn, double[] finalReactingTotals, double[] floorAdded) {
        this.system = system;
        this.inputTotals = inputTotals.clone();
        this.settings = settings;
        this.steps = List.copyOf(steps);
        this.events = List.copyOf(events);
        this.temperatures = List.copyOf(temperatures);
        this.finalWithdrawn = finalWithdrawn;
        this.finalReactingTotals = finalReactingTotals.clone();
        this.floorAdded = floorAdded.clone();
    }

    /**
     * @return moles of each element added over the run to keep reacting totals at
     *         {@link SequenceRunner#REACTING_FLOOR} of the input (withdrawal mode only; zero otherwise)
     */
    public double[] floorAddedMoles() {
        return floorAdded.clone();
    }

    /** @return the chemical system */
    public ChemicalSystem system() {
        return system;
    }

    /** @return element totals of the input [mol], in the system's element order */
    public double[] inputTotals() {
        return inputTotals.clone();
    }

    /** @return the settings */
    public SequenceSettings settings() {
        return settings;
    }

    /** @return the grid steps, hottest first */
    public List<SequenceStep> steps() {
        return steps;
    }

    /** @return phase stability intervals, in order of appearance on cooling */
    public List<PhaseEvent> phaseEvents() {
        return events;
    }

    /** @return condensation temperatures per element, in element order */
    public List<ElementCondensation> condensationTemperatures() {
        return temperatures;
    }

    /**
     * @param p phase @param k member
     * @return moles of the member withdrawn over the whole run (after the last step's removal)
     */
    public double finalWithdrawnMoles(int p, int k) {
        return finalWithdrawn == null ? 0 : finalWithdrawn[p][k];
    }

    /** @return element totals still reacting after the last step [mol] */
    public double[] finalReactingTotals() {
        return finalReactingTotals.clone();
    }
}
