package org.nebulith.api;

import org.nebulith.composition.ElementAbundances;

/**
 * The library's entry point: one builder per job, with the command line's defaults.
 *
 * <pre>{@code
 * State s = Nebulith.state().temperatureK(1400).solve();
 * s.moles("forsterite");
 * Sequence seq = Nebulith.sequence().range(2000, 1000, 5).run();
 * seq.t50K("Al");
 * Planets p = Nebulith.planet().run();
 * p.list().get(0).ratio("Mg", "Si");
 * Survey survey = Nebulith.survey().catalogue(Path.of("presets/demo-catalogue.csv")).draws(100).run();
 * }</pre>
 *
 * Bad input raises {@link org.nebulith.errors.InputException} (file, line, field, value, what is
 * accepted); a state without a checked equilibrium raises
 * {@link org.nebulith.equilibrium.ConvergenceException} (T, P, composition, phases, residuals).
 */
public final class Nebulith {
    private Nebulith() {
    }

    /** @return a builder for one equilibrium state */
    public static StateBuilder state() {
        return new StateBuilder();
    }

    /** @return a builder for a condensation sequence */
    public static SequenceBuilder sequence() {
        return new SequenceBuilder();
    }

    /** @return a builder for the planets of a disk */
    public static PlanetBuilder planet() {
        return new PlanetBuilder();
    }

    /** @return a builder for a survey of a star catalogue */
    public static SurveyBuilder survey() {
        return new SurveyBuilder();
    }

    /**
     * @param presetOrFileOrInline a preset name, an abundance file or {@code H=1,O=4.9e-4}
     * @return the composition [mol]
     */
    public static ElementAbundances composition(String presetOrFileOrInline) {
        return Compositions.resolve(presetOrFileOrInline);
    }
}
