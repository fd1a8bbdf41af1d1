package org.nebulith.stress;

import java.util.EnumMap;
import java.util.Map;
import java.util.SplittableRandom;

import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.CarbonToOxygen;
import org.nebulith.composition.DustEnrichment;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.thermo.Element;

/**
 * The seeded generator of stress states. State i of seed s depends only on (s, i), so any state of
 * a long series can be rerun alone. Each state draws, independently:
 * <ul>
 * <li>T log-uniform in [{@value #T_MIN_K}, {@value #T_MAX_K}] K and P log-uniform in
 *     [{@value #P_MIN_BAR}, {@value #P_MAX_BAR}] bar;</li>
 * <li>every element of the proto-solar preset (Lodders 2003, preset
 *     {@value AbundancePresets#PROTOSOLAR_LODDERS2003}) scaled by 10^U(-0.7, 0.7);</li>
 * <li>a dust enrichment log-uniform in [1, 1000] with CI-chondrite dust
 *     ({@link DustEnrichment});</li>
 * <li>then C/O uniform in [0.1, 2] ({@link CarbonToOxygen}: carbon is set to C/O x O).</li>
 * </ul>
 * The neighbour of a state (the start of its warm solve) moves T by up to a factor 10^0.01 (about 2 %),
 * P by up to 10^0.2 and every element by up to 10^0.05, clamped to the same ranges.
 */
public final class StressStates {
    /** Lowest temperature of the series [K] (the documented lower limit of the mineral data). */
    public static final double T_MIN_K = 200;
    /** Highest temperature of the series [K]. */
    public static final double T_MAX_K = 2500;
    /** Lowest pressure [bar]. */
    public static final double P_MIN_BAR = 1e-10;
    /** Highest pressure [bar]. */
    public static final double P_MAX_BAR = 1;
    /** Half-width of the element scatter [dex]. */
    public static final double ELEMENT_SCATTER_DEX = 0.7;

    private static final double NEIGHBOUR_T_DEX = 0.01;
    private static final double NEIGHBOUR_P_DEX = 0.2;
    private static final double NEIGHBOUR_ELEMENT_DEX = 0.05;

    private final long seed;
    private final ElementAbundances base;
    private final ElementAbundances ci;

    /** @param seed the seed of the series */
    public StressStates(long seed) {
        this.seed = seed;
        this.base = AbundancePresets.preset(AbundancePresets.PROTOSOLAR_LODDERS2003).abundances().perH();
        this.ci = AbundancePresets.preset(AbundancePresets.CI_CHONDRITE).abundances();
    }

    /** @return the seed */
    public long seed() {
        return seed;
    }

    /** @param index position in the series @return state {@code index} */
    public StressState state(long index) {
        SplittableRandom r = random(index, 0);
        double t = logUniform(r, T_MIN_K, T_MAX_K);
        double p = logUniform(r, P_MIN_BAR, P_MAX_BAR);
        Map<Element, Double> scaled = new EnumMap<>(Element.class);
        for (Map.Entry<Element, Double> e : base.asMap().entrySet()) {
            scaled.put(e.getKey(), e.getValue() * Math.pow(10, ELEMENT_SCATTER_DEX * (2 * r.nextDouble() - 1)));
        }
        double dust = logUniform(r, 1, 1000);
        double co = 0.1 + 1.9 * r.nextDouble();
        ElementAbundances enriched = DustEnrichment.enrich(ElementAbundances.of(scaled), ci, dust);
        ElementAbundances comp = CarbonToOxygen.withCarbonToOxygen(enriched, co).perH();
        return new StressState(index, t, p, comp, co, dust);
    }

    /**
     * @param s a state of this series
     * @return a random state close to it (same elements), drawn from (seed, index)
     */
    public StressState neighbour(StressState s) {
        SplittableRandom r = random(s.index(), 1);
        double t = clamp(s.tK() * Math.pow(10, NEIGHBOUR_T_DEX * (2 * r.nextDouble() - 1)), T_MIN_K, T_MAX_K);
        double p = clamp(s.pBar() * Math.pow(10, NEIGHBOUR_P_DEX * (2 * r.nextDouble() - 1)), P_MIN_BAR, P_MAX_BAR);
        Map<Element, Double> moved = new EnumMap<>(Element.class);
        for (Map.Entry<Element, Double> e : s.composition().asMap().entrySet()) {
            moved.put(e.getKey(), e.getValue() * Math.pow(10, NEIGHBOUR_ELEMENT_DEX * (2 * r.nextDouble() - 1)));
        }
        ElementAbundances comp = ElementAbundances.of(moved).perH();
        return new StressState(s.index(), t, p, comp, CarbonToOxygen.of(comp), s.dust());
    }

    private SplittableRandom random(long index, int stream) {
        long mixed = new SplittableRandom(seed ^ (0x9E3779B97F4A7C15L * (2 * index + stream + 1))).nextLong();
        return new SplittableRandom(mixed);
    }

    private static double logUniform(SplittableRandom r, double lo, double hi) {
        return Math.exp(Math.log(lo) + (Math.log(hi) - Math.log(lo)) * r.nextDouble());
    }

    private static double clamp(double v, double lo, double hi) {
        return Math.max(lo, Math.min(hi, v));
    }
}
