package org.nebulith.api;

import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.condensation.PressurePath;
import org.nebulith.condensation.SequenceRunner;
import org.nebulith.condensation.SequenceSettings;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumSolver;

/**
 * A condensation sequence on cooling. Defaults, as on the command line: the protosolar composition
 * (Lodders 2003), 1e-4 bar, 2000 K to 300 K in 1 K steps, equilibrium condensation (removal
 * fraction 0), phase boundaries and 50 % points refined to 0.05 K, the bundled data.
 */
public final class SequenceBuilder {
    private ElementAbundances composition = Compositions.resolve(AbundancePresets.PROTOSOLAR_LODDERS2003);
    private PressurePath path = PressurePath.constant(1e-4);
    private double tMaxK = 2000;
    private double tMinK = 300;
    private double tStepK = 1;
    private double removalFraction;
    private ThermoData data = ThermoData.bundled();

    SequenceBuilder() {
    }

    /** @param preset a preset name, an abundance file or inline {@code H=1,O=4.9e-4} @return this */
    public SequenceBuilder composition(String preset) {
        this.composition = Compositions.resolve(preset);
        return this;
    }

    /** @param c the element amounts [mol] @return this */
    public SequenceBuilder composition(ElementAbundances c) {
        this.composition = c;
        return this;
    }

    /** @param p constant pressure [bar] @return this */
    public SequenceBuilder pressureBar(double p) {
        this.path = PressurePath.constant(p);
        return this;
    }

    /** @param p pressure along the cooling path @return this */
    public SequenceBuilder path(PressurePath p) {
        this.path = p;
        return this;
    }

    /**
     * @param hotK  starting temperature [K]
     * @param coldK final temperature [K]
     * @param stepK grid step [K]
     * @return this
     */
    public SequenceBuilder range(double hotK, double coldK, double stepK) {
        this.tMaxK = hotK;
        this.tMinK = coldK;
        this.tStepK = stepK;
        return this;
    }

    /**
     * @param phi fraction in [0, 1] of the newly condensed solids removed from further reaction at each
     *            step (0: equilibrium condensation, 1: fractional)
     * @return this
     */
    public SequenceBuilder removalFraction(double phi) {
        this.removalFraction = phi;
        return this;
    }

    /** @param d the thermodynamic data @return this */
    public SequenceBuilder data(ThermoData d) {
        this.data = d;
        return this;
    }

    /**
     * @return the sequence
     * @throws org.nebulith.equilibrium.ConvergenceException naming the state where it stopped
     */
    public Sequence run() {
        ChemicalSystem system = data.spec().build(composition.elements());
        double[] b = new double[system.elementCount()];
        for (int j = 0; j < b.length; j++) {
            b[j] = composition.moles(system.elements().get(j));
        }
        SequenceSettings settings = new SequenceSettings(path, tMaxK, tMinK, tStepK, removalFraction, 0.05);
        return new Sequence(new SequenceRunner(new EquilibriumSolver()).run(system, b, settings));
    }
}
