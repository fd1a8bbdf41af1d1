package org.nebulith.planet.interior;

import java.util.List;

/**
 * Ideal mixing of volumes at equal pressure (common practice for planetary assemblages):
 * 1 / rho(P) = sum_i w_i / rho_i(P), with w_i the mass fractions (summing to 1).
 *
 * @param name       the mixture's name
 * @param components the components with their mass fractions
 */
public record IdealVolumeMix(String name, List<Component> components) implements EquationOfState {

    /**
     * @param massFraction mass fraction, &gt; 0
     * @param eos          the component's equation of state
     */
    public record Component(double massFraction, EquationOfState eos) {
        public Component {
            if (!(massFraction > 0) || massFraction > 1 + 1e-12) {
                throw new IllegalArgumentException("mass fraction must be in (0, 1], got " + massFraction);
            }
        }
    }

    public IdealVolumeMix {
        components = List.copyOf(components);
        double sum = 0;
        for (Component c : components) {
            sum += c.massFraction();
        }
        if (components.isEmpty() || Math.abs(sum - 1) > 1e-9) {
            throw new IllegalArgumentException(name + ": mass fractions must sum to 1, got " + sum);
        }
    }

    @Override
    public double density(final double pressurePa) {
        double specificVolume = 0;
        for (Component c : components) {
            specificVolume += c.massFraction() / c.eos().density(pressurePa);
        }
        return 1 / specificVolume;
    }
}
