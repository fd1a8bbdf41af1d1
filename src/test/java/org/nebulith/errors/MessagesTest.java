package org.nebulith.errors;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.api.Test;

/** Every template of the catalogue formats with exactly its declared number of parameters. */
class MessagesTest {

    private static final Pattern PLACEHOLDER = Pattern.compile("\\{(\\d+)}");

    @ParameterizedTest
    @EnumSource(Messages.class)
    void templateUsesExactlyItsDeclaredParameters(final Messages message) {
        TreeSet<Integer> used = new TreeSet<>();
        Matcher m = PLACEHOLDER.matcher(message.template());
        while (m.find()) {
            used.add(Integer.parseInt(m.group(1)));
        }
        assertEquals(message.parameterCount(), used.size(), "distinct placeholders");
        if (!used.isEmpty()) {
            assertEquals(0, used.first());
            assertEquals(message.parameterCount() - 1, used.last());
        }
    }

    @ParameterizedTest
    @EnumSource(Messages.class)
    void formatsWithDeclaredCountAndLosesNoLiteralText(final Messages message) {
        Object[] parts = new Object[message.parameterCount()];
        String expected = message.template();
        for (int i = 0; i < parts.length; i++) {
            parts[i] = "<p" + i + ">";
            expected = expected.replace("{" + i + "}", "<p" + i + ">");
        }
        // a stray apostrophe or brace in a template would make MessageFormat drop text
        assertEquals(expected, message.format(parts));
    }

    @ParameterizedTest
    @EnumSource(Messages.class)
    void wrongParameterCountIsRefused(final Messages message) {
        Object[] tooMany = new Object[message.parameterCount() + 1];
        assertThrows(IllegalArgumentException.class, () -> message.format(tooMany));
    }

    @Test
    void numbersAreLocaleIndependentAndRoundTrip() {
        String text = NumericalException.noConvergence(1234.5, 1e-4, "H=1,O=4.9e-4", 200, 3.25e-9).getMessage();
        assertEquals("equilibrium did not converge at T = 1234.5 K, P = 0.0001 bar, composition H=1,O=4.9e-4"
                + " after 200 iterations (residual 3.25e-9)", text);
    }

    @Test
    void inputMessageNamesFileLineFieldProblemAndAccepted() {
        InputException e = InputException.atField("zones.csv", 7, "half_width_AU", -0.1, "negative width",
                "a number > 0");
        assertEquals("zones.csv: line 7: field \"half_width_AU\": value \"-0.1\": negative width; accepted: a number > 0",
                e.getMessage());
        assertEquals(Messages.BAD_INPUT_FIELD, e.key());
    }

    @Test
    void longValuesAreCutTo80CharactersOnOneLine() {
        String shown = InputException.shown("x".repeat(200) + "\nnext");
        assertEquals("x".repeat(InputException.VALUE_SHOWN) + "... (205 characters)", shown);
        assertEquals("a b", InputException.shown(" a\r\nb "));
    }
}
