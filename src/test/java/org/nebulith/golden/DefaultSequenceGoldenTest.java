package org.nebulith.golden;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Tag;
import org.nebulith.api.Nebulith;
import org.nebulith.api.Sequence;
import org.nebulith.condensation.ElementCondensation;
import org.nebulith.condensation.PhaseEvent;

/**
 * The default condensation sequence (protosolar Lodders 2003, 1e-4 bar, 2000 to 300 K in 1 K
 * steps, bundled data with every solution): 50 % condensation temperatures and phase appearance and
 * disappearance temperatures, to 0.05 K (the refinement bracket).
 */
@Tag("slow")
class DefaultSequenceGoldenTest extends GoldenFileTest {

    @Override
    protected String fileName() {
        return "default-sequence-temperatures.csv";
    }

    @Override
    protected List<String> header() {
        return List.of("source: nebulith sequence with its defaults (protosolar-lodders2003, 1e-4 bar, 2000-300 K,"
                        + " 1 K steps, data set default, all solutions)",
                "validated against: the published 50% condensation temperatures and the reference sequence"
                        + " (PublishedTemperaturesTest, ReferenceSequenceTest) when frozen",
                "units: K; keys T50_<element>, appear_<phase>, gone_<phase>; tolerance 0.05 K (refinement bracket)");
    }

    @Override
    protected Map<String, Double> compute() {
        Sequence s = Nebulith.sequence().run();
        Map<String, Double> out = new LinkedHashMap<>();
        for (ElementCondensation c : s.result().condensationTemperatures()) {
            c.t50K().ifPresent(t -> out.put("T50_" + c.element().symbol(), t));
        }
        for (PhaseEvent e : s.phaseEvents()) {
            out.put("appear_" + e.phase(), e.appearK());
            e.disappearK().ifPresent(t -> out.put("gone_" + e.phase(), t));
        }
        return out;
    }

    @Override
    protected double tolerance(String key, double expected) {
        return 0.05;
    }
}
