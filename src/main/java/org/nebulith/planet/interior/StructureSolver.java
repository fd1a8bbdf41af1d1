package org.nebulith.planet.interior;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.FixedStepHandler;
import org.apache.commons.math3.ode.sampling.StepNormalizer;
import org.apache.commons.math3.ode.sampling.StepNormalizerBounds;
import org.apache.commons.math3.ode.sampling.StepNormalizerMode;

/**
 * Solves the structure of a layered planet: hydrostatic equilibrium dP/dr = -G m rho / r^2 and mass
 * continuity dm/dr = 4 pi r^2 rho, integrated from the centre outward with an adaptive
 * Dormand-Prince 8(5,3) integrator; layer boundaries (at the layer masses) and mantle phase changes
 * (at their pressures) are located as events and the integration restarts with the next material.
 * The central pressure is found by shooting: Brent's method on ln P_c until the surface (P = 0)
 * encloses the planet's mass (to 1e-10 relative).
 */
public final class StructureSolver {
    private static final double REL_TOL = 1e-9;
    private static final double R_START_M = 1.0;
    private static final double PROFILE_STEP_M = 10e3;
    private static final double P_LOW_PA = 1e5;
    /** Central pressure guess P ~ 400 GPa (M / M_earth)^1.7 (a rough power law of such models) and its bracket (ln). */
    private static final double GUESS_PA = 4e11;
    private static final double GUESS_EXPONENT = 1.7;
    private static final double BRACKET = Math.log(4);
    private static final double P_LIMIT_PA = 1e17;
    private static final double TOO_HIGH = 1.0;

    /** The outcome of one outward integration. */
    private static final class Run {
        double surfaceMassKg;
        double surfaceRadiusM;
        double coreRadiusM;
        double cmbPa = Double.NaN;
        double waterBasePa;
        final List<ProfilePoint> profile = new ArrayList<>();
    }

    private enum Segment { CORE, MANTLE, WATER }

    /**
     * @param model the planet
     * @return its structure
     * @throws StructureException if the shooting or the integration fails
     */
    public Structure solve(final InteriorModel model) {
        double massKg = model.massMearth() * Constants.M_EARTH_KG;
        UnivariateFunction residual = lnPc -> residual(model, Math.exp(lnPc), massKg);
        double guess = Math.log(GUESS_PA * Math.pow(model.massMearth(), GUESS_EXPONENT));
        double lo = Math.max(Math.log(P_LOW_PA), guess - BRACKET);
        double hi = guess + BRACKET;
        try {
            while (lo > Math.log(P_LOW_PA) && residual.value(lo) > 0) {
                hi = lo;
                lo = Math.max(Math.log(P_LOW_PA), lo - BRACKET);
            }
            while (residual.value(hi) < 0) {
                lo = hi;
                hi += Math.log(10);
                if (hi > Math.log(P_LIMIT_PA)) {
                    throw new StructureException(model, "no central pressure below 1e17 Pa encloses the mass", null);
                }
            }
            if (residual.value(lo) > 0) {
                throw new StructureException(model, "the central pressure is below 1e5 Pa (body too small)", null);
            }
            double lnPc = new BrentSolver(1e-12, 1e-12, 1e-12).solve(300, residual, lo, hi);
            Run run = integrate(model, Math.exp(lnPc), true);
            double pc = Math.exp(lnPc);
            boolean hasCore = model.coreMassFraction() > 0;
            return new Structure(model, run.surfaceRadiusM / 1e3, hasCore ? run.coreRadiusM / 1e3 : 0, pc / 1e9,
                    (hasCore && model.coreMassFraction() < 1 ? run.cmbPa : pc) / 1e9, run.waterBasePa / 1e9,
                    List.copyOf(run.profile));
        } catch (MathIllegalStateException | IllegalArgumentException e) {
            throw new StructureException(model, "structure integration failed: " + e.getMessage(), e);
        }
    }

    /**
     * @return ln(enclosed mass / mass) for a trial central pressure; a trial that takes a layer beyond
     *         its fit's compression has too high a central pressure (pressure at every mass coordinate
     *         grows with it), so it counts as enclosing too much mass
     */
    private static double residual(final InteriorModel model, final double pc, final double massKg) {
        try {
            return Math.log(integrate(model, pc, false).surfaceMassKg / massKg);
        } catch (IllegalArgumentException beyondFit) {
            return TOO_HIGH;
        }
    }

    private static List<Segment> segments(final InteriorModel model, final List<Double> tops) {
        double m = model.massMearth() * Constants.M_EARTH_KG;
        double water = model.waterMassFraction() * m;
        double core = model.coreMassFraction() * (m - water);
        double mantle = m - water - core;
        List<Segment> s = new ArrayList<>();
        if (core > 0) {
            s.add(Segment.CORE);
            tops.add(core);
        }
        if (mantle > 0) {
            s.add(Segment.MANTLE);
            tops.add(core + mantle);
        }
        if (water > 0) {
            s.add(Segment.WATER);
            tops.add(m);
        }
        return s;
    }

    private static Run integrate(final InteriorModel model, final double pc, final boolean record) {
        List<Double> tops = new ArrayList<>();
        List<Segment> segments = segments(model, tops);
        Run run = new Run();
        int seg = 0;
        LayerKind region = regionOf(segments.get(0), pc);
        EquationOfState eos0 = eos(model, region);
        double rhoC = eos0.density(pc);
        double r = R_START_M;
        double[] y = {4.0 / 3.0 * Math.PI * r * r * r * rhoC, pc - 2.0 / 3.0 * Math.PI * Constants.G * rhoC * rhoC * r * r};
        double scale = Math.cbrt(model.massMearth()) * Constants.R_EARTH_M;
        double[] absTol = {REL_TOL * model.massMearth() * Constants.M_EARTH_KG * 1e-3, REL_TOL * pc * 1e-3};
        double[] relTol = {REL_TOL, REL_TOL};
        while (true) {
            boolean last = seg == segments.size() - 1;
            EquationOfState eos = eos(model, region);
            DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-6, scale / 20, absTol, relTol);
            Event surface = new Event(-1, 0);
            Event boundary = new Event(0, last ? Double.NaN : tops.get(seg));
            double nextTransition = segments.get(seg) == Segment.MANTLE ? nextTransition(y[1]) : Double.NaN;
            Event transition = new Event(1, nextTransition);
            integrator.addEventHandler(surface, scale / 200, 1e-4, 200);
            if (!last) {
                integrator.addEventHandler(boundary, scale / 200, 1e-4, 200);
            }
            if (!Double.isNaN(nextTransition)) {
                integrator.addEventHandler(transition, scale / 200, 1e-4, 200);
            }
            if (record) {
                LayerKind here = region;
                integrator.addStepHandler(new StepNormalizer(PROFILE_STEP_M, new FixedStepHandler() {
                    @Override
                    public void init(final double t0, final double[] y0, final double t) {
                    }

                    @Override
                    public void handleStep(final double t, final double[] state, final double[] dot, final boolean isLast) {
                        run.profile.add(point(t, state, eos, here));
                    }
                }, StepNormalizerMode.MULTIPLES, StepNormalizerBounds.BOTH));
            }
            double[] out = y.clone();
            double rEnd = integrator.integrate(equations(eos), r, y, 20 * scale, out);
            r = rEnd;
            y = out;
            if (surface.fired || y[1] <= 0) {
                run.surfaceMassKg = y[0];
                run.surfaceRadiusM = r;
                return run;
            }
            if (boundary.fired) {
                if (segments.get(seg) == Segment.CORE) {
                    run.coreRadiusM = r;
                    run.cmbPa = y[1];
                }
                seg++;
                if (segments.get(seg) == Segment.WATER) {
                    run.waterBasePa = y[1];
                }
                region = regionOf(segments.get(seg), y[1] * (1 - 1e-12));
            } else if (transition.fired) {
                region = MantleComposition.regionAt(nextTransition * (1 - 1e-9));
            } else {
                throw new IllegalStateException("the surface was not reached within 20 times the Earth-scaled radius");
            }
        }
    }

    private static double nextTransition(final double p) {
        if (p > Materials.POST_BRIDGMANITE_PA) {
            return Materials.POST_BRIDGMANITE_PA;
        }
        return p > Materials.UPPER_TO_LOWER_MANTLE_PA ? Materials.UPPER_TO_LOWER_MANTLE_PA : Double.NaN;
    }

    private static ProfilePoint point(final double r, final double[] y, final EquationOfState eos, final LayerKind layer) {
        double p = Math.max(0, y[1]);
        double g = r > 0 ? Constants.G * y[0] / (r * r) : 0;
        return new ProfilePoint(r / 1e3, y[0] / Constants.M_EARTH_KG, p / 1e9, eos.density(p), g, layer);
    }

    private static LayerKind regionOf(final Segment s, final double p) {
        switch (s) {
            case CORE:
                return LayerKind.CORE;
            case WATER:
                return LayerKind.WATER_ICE;
            default:
                return MantleComposition.regionAt(p);
        }
    }

    private static EquationOfState eos(final InteriorModel model, final LayerKind region) {
        switch (region) {
            case CORE:
                return model.core().equationOfState();
            case WATER_ICE:
                return Materials.ICE_VII;
            default:
                return model.mantle().equationOfState(region);
        }
    }

    private static FirstOrderDifferentialEquations equations(final EquationOfState eos) {
        return new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public void computeDerivatives(final double r, final double[] y, final double[] dot) {
                double rho = eos.density(Math.max(0, y[1]));
                dot[0] = 4 * Math.PI * r * r * rho;
                dot[1] = -Constants.G * y[0] * rho / (r * r);
            }
        };
    }

    /** Stops the integration where a state variable (0: mass, 1: pressure; -1: pressure = 0) crosses a value. */
    private static final class Event implements EventHandler {
        private final int variable;
        private final double value;
        boolean fired;

        Event(final int variable, final double value) {
            this.variable = variable;
            this.value = value;
        }

        @Override
        public void init(final double t0, final double[] y0, final double t) {
            fired = false;
        }

        @Override
        public double g(final double t, final double[] y) {
            switch (variable) {
                case -1:
                    return y[1];
                case 0:
                    return value - y[0];
                default:
                    return y[1] - value;
            }
        }

        @Override
        public Action eventOccurred(final double t, final double[] y, final boolean increasing) {
            fired = true;
            return Action.STOP;
        }

        @Override
        public void resetState(final double t, final double[] y) {
        }
    }
}
