package org.nebulith.api;

import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumProblem;
import org.nebulith.equilibrium.EquilibriumSolver;

/**
 * One equilibrium state. Defaults: the protosolar composition (Lodders 2003), 1e-4 bar, the bundled
 * data with every solution; the temperature must be given.
 */
public final class StateBuilder {
    private ElementAbundances composition = Compositions.resolve(AbundancePresets.PROTOSOLAR_LODDERS2003);
    private double temperatureK = Double.NaN;
    private double pressureBar = 1e-4;
    private ThermoData data = ThermoData.bundled();

    StateBuilder() {
    }

    /** @param preset a preset name, an abundance file or inline {@code H=1,O=4.9e-4} @return this */
    public StateBuilder composition(String preset) {
        this.composition = Compositions.resolve(preset);
        return this;
    }

    /** @param c the element amounts [mol] @return this */
    public StateBuilder composition(ElementAbundances c) {
        this.composition = c;
        return this;
    }

    /** @param t temperature [K] @return this */
    public StateBuilder temperatureK(double t) {
        this.temperatureK = t;
        return this;
    }

    /** @param p pressure [bar] @return this */
    public StateBuilder pressureBar(double p) {
        this.pressureBar = p;
        return this;
    }

    /** @param d the thermodynamic data @return this */
    public StateBuilder data(ThermoData d) {
        this.data = d;
        return this;
    }

    /**
     * @return the checked equilibrium
     * @throws org.nebulith.equilibrium.ConvergenceException naming the state if none was found
     */
    public State solve() {
        ChemicalSystem system = data.spec().build(composition.elements());
        double[] b = new double[system.elementCount()];
        for (int j = 0; j < b.length; j++) {
            b[j] = composition.moles(system.elements().get(j));
        }
        return new State(new EquilibriumSolver().solve(new EquilibriumProblem(system, temperatureK, pressureBar, b)));
    }
}
