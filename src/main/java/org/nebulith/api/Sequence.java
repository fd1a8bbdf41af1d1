package org.nebulith.api;

import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.nebulith.condensation.CondensationSequence;
import org.nebulith.condensation.ElementCondensation;
import org.nebulith.condensation.PhaseEvent;
import org.nebulith.thermo.Element;

/**
 * A condensation sequence read by name: {@code t50K("Al")} (the 50 % condensation temperature of an
 * element), {@code appearanceK("forsterite")} (where a phase first appears on cooling).
 */
public final class Sequence {
    private final CondensationSequence sequence;

    Sequence(CondensationSequence sequence) {
        this.sequence = sequence;
    }

    /**
     * @param symbol an element symbol
     * @return its 50 % condensation temperature [K], empty if it stays below 50 % over the range
     */
    public OptionalDouble t50K(String symbol) {
        Element e = Compositions.element(symbol);
        for (ElementCondensation c : sequence.condensationTemperatures()) {
            if (c.element() == e) {
                return c.t50K();
            }
        }
        return OptionalDouble.empty();
    }

    /**
     * @param phase a phase name
     * @return the temperature where it first appears on cooling [K], empty if it never does
     */
    public OptionalDouble appearanceK(String phase) {
        for (PhaseEvent e : sequence.phaseEvents()) {
            if (e.phase().equals(phase)) {
                return OptionalDouble.of(e.appearK());
            }
        }
        return OptionalDouble.empty();
    }

    /** @return the phases in order of appearance */
    public List<PhaseEvent> phaseEvents() {
        return sequence.phaseEvents();
    }

    /** @return the full sequence (every step, every element) */
    public CondensationSequence result() {
        return sequence;
    }

    /** @return one line per phase (appearance, disappearance) and per element (T50) */
    public String summary() {
        StringBuilder b = new StringBuilder("condensation sequence, " + sequence.steps().size() + " steps");
        for (PhaseEvent e : sequence.phaseEvents()) {
            b.append(String.format(Locale.ROOT, "%n  %-24s appears %7.1f K", e.phase(), e.appearK()));
            e.disappearK().ifPresent(d -> b.append(String.format(Locale.ROOT, ", gone %7.1f K", d)));
        }
        for (ElementCondensation c : sequence.condensationTemperatures()) {
            if (c.t50K().isPresent()) {
                b.append(String.format(Locale.ROOT, "%n  T50(%s) = %.1f K in %s", c.element().symbol(),
                        c.t50K().getAsDouble(), c.hostPhase()));
            }
        }
        return b.toString();
    }

    @Override
    public String toString() {
        return summary();
    }
}
