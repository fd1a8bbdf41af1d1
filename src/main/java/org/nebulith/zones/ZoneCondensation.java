package org.nebulith.zones;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.nebulith.disk.DiskModel;
import org.nebulith.disk.DiskState;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.errors.NumericalException;

/**
 * Integrates the local condensates across a feeding zone: finds the condensation fronts inside
 * the zone (radii where a phase appears or vanishes), then integrates
 * Sigma_gas(r) x condensed moles per gram(r) x 2 pi r dr x kernel(r) piecewise between them.
 */
public final class ZoneCondensation {
    private final RadialIntegrator integrator;
    private final int frontSamples;
    private final double frontTolRel;
    private final int fixedPanels;

    /**
     * @param integrator   the radial integrator
     * @param frontSamples grid points per zone for the front search, &gt;= 2
     * @param frontTolRel  width to which fronts are bisected, relative to the zone's full width
     */
    public ZoneCondensation(RadialIntegrator integrator, int frontSamples, double frontTolRel) {
        this(integrator, frontSamples, frontTolRel, 0);
    }

    private ZoneCondensation(RadialIntegrator integrator, int frontSamples, double frontTolRel, int fixedPanels) {
        this.integrator = integrator;
        this.frontSamples = frontSamples;
        this.frontTolRel = frontTolRel;
        this.fixedPanels = fixedPanels;
    }

    /**
     * @param panels number of equal panels
     * @param points Gauss-Legendre points per panel
     * @return a fixed composite rule without front search ({@link RadialIntegrator#integrateFixed}); the
     *         front-search settings do not apply
     */
    public static ZoneCondensation fixed(int panels, int points) {
        if (panels < 1) {
            throw new IllegalArgumentException("need at least one panel, got " + panels);
        }
        return new ZoneCondensation(RadialIntegrator.gaussRule(points), 0, Double.NaN, panels);
    }

    /** Grid points per zone of the front search of {@link #defaults()}. */
    public static final int DEFAULT_FRONT_SAMPLES = 48;

    /**
     * @return settings for reports: {@link RadialIntegrator#defaults()} (1e-7 relative, 8-point panels),
     *         48 front samples, fronts bisected to the same 1e-7 of the zone width
     */
    public static ZoneCondensation defaults() {
        return new ZoneCondensation(RadialIntegrator.defaults(), DEFAULT_FRONT_SAMPLES, RadialIntegrator.DEFAULT_REL_TOL);
    }

    /**
     * @return the settings for Monte Carlo surveys: 4 panels of 3 Gauss-Legendre points, no front
     *         search. On the default survey zone the core mass fraction and mantle Mg# differ from
     *         the adaptive integration by under 1e-4 relative for the proto-solar gas, and by up to
     *         6.5e-4 (core mass fraction) and 3.2e-4 (Mg#) for compositions 0.1 dex away; Mg/Si, Fe/Si
     *         by under 1e-8 (measured; contributors' guide, "Survey speed and memory"), far below the
     *         spread from the abundance errors; zones that straddle major condensation fronts do worse
     *         (a kink inside a panel gives a second-order error).
     */
    public static ZoneCondensation fast() {
        return fixed(4, 3);
    }

    /**
     * @param zone  the zone (inside the disk's range)
     * @param disk  the disk
     * @param local the local condensation of the gas
     * @return what the zone collects
     */
    public ZoneInventory integrate(FeedingZone zone, DiskModel disk, LocalCondensation local) {
        return integrate(zone, disk, local, 0.0);
    }

    /**
     * @param zone          the zone (inside the disk's range)
     * @param disk          the disk
     * @param local         the local condensation of the gas
     * @param continuityRel the largest jump of G/RT between pieces of the system's thermodynamic data
     *                      ({@link org.nebulith.thermo.PieceJumps#largest}); 0 accepts no stalled panel
     * @return what the zone collects
     * @throws NumericalException naming the zone, radius, T and P if an equilibrium or the integral fails
     */
    public ZoneInventory integrate(FeedingZone zone, DiskModel disk, LocalCondensation local, double continuityRel) {
        double lo = zone.rInnerAU();
        double hi = zone.rOuterAU();
        disk.checkRange(lo);
        disk.checkRange(hi);
        List<Double> fronts = fixedPanels > 0 ? List.of() : FrontFinder.find(lo, hi, frontSamples,
                r -> LocalCondensation.signature(solve(zone, local, disk.stateAt(r))), frontTolRel * (hi - lo));
        ChemicalSystem sys = local.system();
        int[][] index = new int[sys.phaseCount()][];
        int dim = 0;
        for (int p = 1; p < sys.phaseCount(); p++) {
            index[p] = new int[sys.memberCount(p)];
            for (int k = 0; k < index[p].length; k++) {
                index[p][k] = dim++;
            }
        }
        final int iceIndex = dim++;
        final int n = dim;
        RadialIntegrand f = new RadialIntegrand() {
            @Override
            public int dimension() {
                return n;
            }

            @Override
            public void evaluate(DiskState s, double[] out) {
                java.util.Arrays.fill(out, 0.0);
                LocalCondensation.Local l = solve(zone, local, s);
                for (int p : l.result().presentCondensedPhases()) {
                    for (int k = 0; k < index[p].length; k++) {
                        out[index[p][k]] = l.result().memberMoles(p, k);
                    }
                }
                out[iceIndex] = l.iceMoles();
            }
        };
        // the fixed rule (the survey's) needs no error control: it is not built per draw
        ZoneIntegral zi = fixedPanels > 0 ? integrator.integrateFixed(zone, disk, f, fixedPanels)
                : integrator.integrate(zone, disk, f, fronts, control(sys, index, n, continuityRel));
        double[][] moles = new double[sys.phaseCount()][];
        moles[0] = new double[sys.memberCount(0)];
        for (int p = 1; p < sys.phaseCount(); p++) {
            moles[p] = new double[index[p].length];
            for (int k = 0; k < index[p].length; k++) {
                moles[p][k] = zi.total(index[p][k]);
            }
        }
        return new ZoneInventory(zone, sys, moles, zi.total(iceIndex), zi.gasMassG(), new ArrayList<>(fronts),
                zi.evaluations(), zi.quality());
    }

    private static LocalCondensation.Local solve(FeedingZone zone, LocalCondensation local, DiskState s) {
        try {
            return local.at(s);
        } catch (NumericalException e) {
            throw NumericalException.inZone(zone.name(), s.rAU(), s.temperatureK(), s.pressureBar(), e.getMessage(), e);
        }
    }

    /**
     * One control group per distinct formula of condensed member (polymorphs, the liquid and the
     * solution end-member of one compound move into each other at transitions; their sum is what
     * must be smooth), water ice on its own.
     */
    private static ErrorControl control(ChemicalSystem sys, int[][] index, int n, double continuityRel) {
        int[] groupOf = new int[n];
        Map<List<Double>, Integer> byFormula = new HashMap<>();
        for (int p = 1; p < sys.phaseCount(); p++) {
            for (int k = 0; k < index[p].length; k++) {
                List<Double> key = new ArrayList<>();
                for (double a : sys.memberStoichiometry(p, k)) {
                    key.add(a);
                }
                groupOf[index[p][k]] = byFormula.computeIfAbsent(key, x -> byFormula.size());
            }
        }
        groupOf[n - 1] = byFormula.size();
        return new ErrorControl(groupOf, byFormula.size() + 1, continuityRel);
    }
}
