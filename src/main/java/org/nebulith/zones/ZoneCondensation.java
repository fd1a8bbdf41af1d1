package org.nebulith.zones;

import java.util.ArrayList;
import java.util.List;

import org.nebulith.disk.DiskModel;
import org.nebulith.disk.DiskState;
import org.nebulith.equilibrium.ChemicalSystem;

/**
 * Integrates the local condensates across a feeding zone: finds the condensation fronts inside
 * the zone (radii where a phase appears or vanishes), then integrates
 * Sigma_gas(r) x condensed moles per gram(r) x 2 pi r dr x kernel(r) piecewise between them.
 */
public final class ZoneCondensation {
    private final RadialIntegrator integrator;
    private final int frontSamples;
    private final double frontTolRel;

    /**
     * @param integrator   the radial integrator
     * @param frontSamples grid points per zone for the front search, &gt;= 2
     * @param frontTolRel  width to which fronts are bisected, relative to the zone's full width
     */
    public ZoneCondensation(RadialIntegrator integrator, int frontSamples, double frontTolRel) {
        this.integrator = integrator;
        this.frontSamples = frontSamples;
        this.frontTolRel = frontTolRel;
    }

    /** @return settings for reports: 1e-7 relative, 8-point panels, 48 front samples */
    public static ZoneCondensation defaults() {
        return new ZoneCondensation(new RadialIntegrator(1e-7, 8, 2, 200_000), 48, 1e-7);
    }

    /** @return faster settings for Monte Carlo surveys: 1e-5 relative, 4-point panels, 12 samples */
    public static ZoneCondensation fast() {
        return new ZoneCondensation(new RadialIntegrator(1e-5, 4, 1, 200_000), 12, 1e-5);
    }

    /**
     * @param zone  the zone (inside the disk's range)
     * @param disk  the disk
     * @param local the local condensation of the gas
     * @return what the zone collects
     */
    public ZoneInventory integrate(FeedingZone zone, DiskModel disk, LocalCondensation local) {
        double lo = zone.rInnerAU();
        double hi = zone.rOuterAU();
        disk.checkRange(lo);
        disk.checkRange(hi);
        List<Double> fronts = FrontFinder.find(lo, hi, frontSamples,
                r -> LocalCondensation.signature(local.at(disk.stateAt(r))), frontTolRel * (hi - lo));
        ChemicalSystem sys = local.system();
        int[][] index = new int[sys.phaseCount()][];
        int dim = 0;
        for (int p = 1; p < sys.phaseCount(); p++) {
            index[p] = new int[sys.memberNames(p).size()];
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
                LocalCondensation.Local l = local.at(s);
                for (int p : l.result().presentCondensedPhases()) {
                    for (int k = 0; k < index[p].length; k++) {
                        out[index[p][k]] = l.result().memberMoles(p, k);
                    }
                }
                out[iceIndex] = l.iceMoles();
            }
        };
        ZoneIntegral zi = integrator.integrate(zone, disk, f, fronts);
        double[][] moles = new double[sys.phaseCount()][];
        moles[0] = new double[sys.memberNames(0).size()];
        for (int p = 1; p < sys.phaseCount(); p++) {
            moles[p] = new double[index[p].length];
            for (int k = 0; k < index[p].length; k++) {
                moles[p][k] = zi.total(index[p][k]);
            }
        }
        return new ZoneInventory(zone, sys, moles, zi.total(iceIndex), zi.gasMassG(), new ArrayList<>(fronts),
                zi.evaluations());
    }
}
