package org.nebulith.equilibrium;

import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;

/**
 * States on which the phase selection of the active-set method alone once failed (a nearly singular
 * Newton system when a phase depended on present solution end-members, or a stall when several
 * trace phases changed at once): each must now converge from a cold start and from a warm start at
 * a state 2 K hotter, and both results must pass the {@link IndependentCheck}. Compositions in mol
 * as printed by the failing runs; all are invented scenarios of this project (random states, a
 * survey draw of an invented near-solar star, the demo catalogue's star "NDC Birch", the three cold
 * failures of the first 100,000-state stress run, all below 225 K with every element condensed).
 */
class ReportedStatesTest {
    private static final String RANDOM_1 = "H=1,He=0.0146358,C=0.000140636,N=1.22022e-05,O=0.000174828,Na=7.77452e-07,"
            + "Mg=5.78164e-05,Al=2.05833e-05,Si=0.000129876,P=2.30494e-07,S=1.23096e-05,Cl=2.40787e-07,K=8.61407e-08,"
            + "Ca=1.22762e-06,Ti=1.32589e-08,Cr=1.89884e-07,Mn=3.24983e-06,Fe=6.1547e-06,Co=9.70635e-08,Ni=3.57188e-06";
    private static final String RANDOM_2 = "H=1,He=0.0587453,C=0.000976316,N=1.40942e-05,O=0.0054112,Na=1.21592e-06,"
            + "Mg=5.44568e-06,Al=1.22384e-06,Si=2.59169e-05,P=3.66195e-08,S=1.25789e-05,Cl=1.49414e-07,K=3.78427e-07,"
            + "Ca=1.30891e-06,Ti=3.37835e-08,Cr=1.487e-07,Mn=1.14665e-06,Fe=0.00026141,Co=1.08247e-07,Ni=5.38852e-07";
    private static final String RANDOM_3 = "H=1,He=0.951197,C=0.00016303,N=1.30763e-05,O=0.00107113,Na=8.88492e-06,"
            + "Mg=8.61242e-06,Al=5.41297e-06,Si=2.01399e-05,P=3.76712e-07,S=2.01195e-06,Cl=2.51452e-08,K=1.45307e-06,"
            + "Ca=1.3958e-05,Ti=9.35449e-08,Cr=7.20815e-07,Mn=1.25801e-07,Fe=0.000124693,Co=6.79461e-08,Ni=1.53689e-05";
    private static final String WHITLOCKITE = "H=0.726394,He=0.0618262,C=0.000373739,N=8.68578e-05,O=0.000578897,"
            + "Na=2.52876e-06,Mg=4.97459e-05,Al=3.37384e-06,Si=2.90553e-05,P=3.30224e-07,S=1.62576e-05,Cl=4.06264e-07,"
            + "K=1.37660e-07,Ca=3.34546e-06,Ti=1.11836e-07,Cr=5.60801e-07,Mn=3.45787e-07,Fe=4.06264e-05,Co=1.25548e-07,"
            + "Ni=2.94071e-06";
    private static final String BIRCH = "H=0.737654,He=0.0627845,C=8.11693e-05,N=2.03888e-05,O=0.000147704,"
            + "Na=6.23374e-07,Mg=1.84965e-05,Al=7.94898e-07,Si=1.03820e-05,P=7.75161e-08,S=3.97550e-06,Cl=9.53656e-08,"
            + "K=3.23141e-08,Ca=7.15679e-07,Ti=3.84142e-08,Cr=1.07620e-07,Mn=8.11693e-08,Fe=9.53656e-06,Co=2.94708e-08,"
            + "Ni=5.71361e-07";

    /** Stress state 47593 of seed 2026 (the 100,000-state run), all solutions, cold. */
    private static final String STRESS_47593 = "H=1.0,He=0.022092851744539115,C=1.9609900823711098E-4,"
            + "N=3.3633195053202244E-4,O=4.69007044965411E-4,Na=6.270858559993189E-6,Mg=3.727848812484619E-5,"
            + "Al=2.228542757703982E-6,Si=2.4279700329094117E-5,P=1.9941089901489596E-7,S=3.89614856633211E-5,"
            + "Cl=2.9610161603981166E-7,K=1.2453974572022156E-7,Ca=2.568882117072529E-6,Ti=3.2552223642260954E-7,"
            + "Cr=2.1841966477792974E-6,Mn=1.0934742115801334E-6,Fe=3.0422693040037245E-5,Co=6.58806845570722E-8,"
            + "Ni=5.100191399824546E-6";
    /** Stress state 73688 of seed 2026, all solutions, cold. */
    private static final String STRESS_73688 = "H=0.9999999999999999,He=0.04201326490518861,C=0.0014307988622575727,"
            + "N=1.3210869175098427E-4,O=7.309741494673385E-4,Na=2.7004061772365685E-6,Mg=9.064735984235627E-5,"
            + "Al=2.5646549738567004E-6,Si=3.14384957793339E-5,P=4.4387457336166E-7,S=3.463244812023194E-5,"
            + "Cl=1.7049162079088698E-7,K=6.016184603898179E-7,Ca=2.2434831174806576E-6,Ti=3.5145799410617116E-7,"
            + "Cr=1.0899641999221565E-6,Mn=8.97669036734424E-7,Fe=2.9436703592822226E-5,Co=1.3580057256662652E-7,"
            + "Ni=4.216488728757328E-6";

    /** Stress state 78772 of seed 2026, all solutions, cold. */
    private static final String STRESS_78772 = "H=1.0,He=0.027786096908296875,C=4.595566331018323E-4,"
            + "N=2.1838886830528179E-4,O=7.169397238379689E-4,Na=3.535946728500287E-6,Mg=6.1572289042389E-5,"
            + "Al=3.4341166382500465E-6,Si=4.524102897326977E-5,P=1.5805690806278401E-6,S=1.0658428837614383E-4,"
            + "Cl=2.2622982959441492E-7,K=1.9106457601818878E-7,Ca=1.4866544185586365E-5,Ti=1.4551979007854807E-7,"
            + "Cr=8.220001012936086E-7,Mn=1.547711975922555E-6,Fe=5.0493231360266644E-5,Co=3.3093224508647884E-7,"
            + "Ni=2.2379305022562127E-6";

    static Stream<Arguments> states() {
        String solar = AbundancePresets.preset(AbundancePresets.PROTOSOLAR_LODDERS2003).abundances().perH().toInline();
        return Stream.of(
                Arguments.of("random state at 607.1 K", 607.1, 3.46e-07, RANDOM_1),
                Arguments.of("random state at 762.2 K", 762.2, 0.00298, RANDOM_2),
                Arguments.of("random state at 627.8 K", 627.8, 2.27e-08, RANDOM_3),
                Arguments.of("whitlockite state of a survey draw", 674.662, 5.51816e-06, WHITLOCKITE),
                Arguments.of("wollastonite state of NDC Birch", 300, 1.85149e-05, BIRCH),
                Arguments.of("NDC Birch at 398 K", 398, 1.85149e-05, BIRCH),
                Arguments.of("proto-solar gas at the 200 K lower limit", 200, 1e-4, solar),
                Arguments.of("stress state 47593 (nearly all condensed, 221 K)", 220.845190422005, 1.476721552140562E-8,
                        STRESS_47593),
                Arguments.of("stress state 73688 (C/O 1.96, 207 K)", 207.465999339999, 2.3765847716682495E-4,
                        STRESS_73688),
                Arguments.of("stress state 78772 (212 K)", 212.18255078339985, 2.6088092135906566E-6, STRESS_78772));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("states")
    void convergesColdAndWarmAndPassesTheIndependentCheck(String what, double tK, double pBar, String elements) {
        ElementAbundances comp = ElementAbundances.parseInline(elements);
        SystemSpec spec = SystemSpec.defaults();
        ChemicalSystem sys = spec.build(comp.elements());
        IndependentCheck check = new IndependentCheck(spec);
        EquilibriumSolver solver = new EquilibriumSolver();
        EquilibriumProblem problem = EquilibriumProblem.of(sys, tK, pBar, comp.asMap());
        EquilibriumResult cold = solver.solve(problem);
        assertNull(check.check(cold).failure(), what + ", cold");
        EquilibriumResult hotter = solver.solve(problem.at(tK + 2, pBar));
        EquilibriumResult warm = solver.solve(problem, WarmStart.of(hotter));
        assertNull(check.check(warm).failure(), what + ", warm from 2 K hotter");
        EquilibriumSolver pureSolver = solver;
        SystemSpec pure = spec.withSolutions(java.util.List.of());
        EquilibriumResult p = pureSolver.solve(EquilibriumProblem.of(pure.build(comp.elements()), tK, pBar, comp.asMap()));
        assertNull(new IndependentCheck(pure).check(p).failure(), what + ", pure phases");
    }
}
