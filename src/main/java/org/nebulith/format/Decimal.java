package org.nebulith.format;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * The one way Nebulith writes a floating-point number in its outputs (CSV cells, messages,
 * report tables): the <em>shortest round-trip decimal</em>.
 *
 * <p>Rule: take the fewest significant digits p (1 to 17) such that the exact decimal value of
 * the double, rounded half-even to p digits, parses back to the same double. That p is found by
 * bisection over 1 to 17 (if p digits round-trip, so do p + 1, except at eight powers of two such as
 * 2^149, where the bisection still lands on the fewest). The digits are written in plain notation when
 * the decimal exponent is in [-4, 7) ({@code 1500}, {@code 0.00012}, {@code 2.5}) and otherwise as
 * {@code d.ddde-N} / {@code d.dddeN} ({@code 1.5e-7}, {@code 6.02214076e23}). Negative zero is
 * written {@code 0}. The result depends only on the double, not on the JDK version or the
 * default locale, so identical numbers give byte-identical files. NaN and infinities are
 * refused: callers must not write them.
 */
public final class Decimal {

    private static final int PLAIN_MIN_EXPONENT = -4;
    private static final int PLAIN_MAX_EXPONENT = 7;

    private Decimal() {
    }

    /**
     * @param value a finite double
     * @return its shortest round-trip decimal text (see class rule)
     * @throws IllegalArgumentException for NaN or infinite values
     */
    public static String format(final double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("not a finite number: " + value);
        }
        if (value == 0.0) {
            return "0";
        }
        DecimalDigits shortest = ShortestDigits.of(value);
        int exponent = shortest.exponent();
        if (exponent >= PLAIN_MIN_EXPONENT && exponent < PLAIN_MAX_EXPONENT) {
            return DigitsText.plain(shortest);
        }
        return DigitsText.scientific(shortest, exponent);
    }

    /**
     * The text {@link #format} writes for given shortest digits, laid out by BigDecimal (the definition
     * that the direct writing in {@link #format} follows).
     *
     * @param shortest the shortest round-trip digits of a non-zero double, trailing zeros stripped
     * @return its text
     */
    static String textOf(final BigDecimal shortest) {
        int exponent = shortest.precision() - shortest.scale() - 1;
        if (exponent >= PLAIN_MIN_EXPONENT && exponent < PLAIN_MAX_EXPONENT) {
            return shortest.toPlainString();
        }
        return scientific(shortest, exponent);
    }

    private static BigDecimal round(final BigDecimal exact, final int digits) {
        return exact.round(new MathContext(digits, RoundingMode.HALF_EVEN));
    }

    private static String scientific(final BigDecimal digits, final int exponent) {
        String unscaled = digits.unscaledValue().abs().toString();
        StringBuilder text = new StringBuilder(unscaled.length() + 8);
        if (digits.signum() < 0) {
            text.append('-');
        }
        text.append(unscaled.charAt(0));
        if (unscaled.length() > 1) {
            text.append('.').append(unscaled, 1, unscaled.length());
        }
        return text.append('e').append(exponent).toString();
    }

    /**
     * A number for people (report tables, summaries, the terminal): four significant figures,
     * trailing zeros kept (1.150), plain between 1e-4 and 1e7, otherwise {@code d.ddde-N}.
     *
     * @param value a finite double
     * @return its text
     */
    public static String forPeople(final double value) {
        return significant(value, 4);
    }

    /**
     * @param value  a finite double
     * @param digits significant figures (1 to 17)
     * @return value rounded half-even to that many significant figures, trailing zeros kept
     */
    public static String significant(final double value, final int digits) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("not a finite number: " + value);
        }
        if (value == 0.0) {
            return "0";
        }
        BigDecimal rounded = round(new BigDecimal(value), digits);
        int exponent = rounded.precision() - rounded.scale() - 1;
        rounded = rounded.setScale(Math.max(rounded.scale(), digits - 1 - exponent), RoundingMode.UNNECESSARY);
        if (exponent >= PLAIN_MIN_EXPONENT && exponent < PLAIN_MAX_EXPONENT) {
            return rounded.scale() < 0 ? rounded.setScale(0).toPlainString() : rounded.toPlainString();
        }
        return scientific(rounded, exponent);
    }

    /**
     * @param kelvin a temperature [K]
     * @return it to 0.1 K, e.g. {@code 1352.4}
     */
    public static String kelvin(final double kelvin) {
        if (!Double.isFinite(kelvin)) {
            throw new IllegalArgumentException("not a finite temperature: " + kelvin);
        }
        return new BigDecimal(kelvin).setScale(1, RoundingMode.HALF_EVEN).toPlainString();
    }

    /**
     * A value known only to a given resolution (a temperature bisected to a bracket), written with the
     * decimals of that resolution: {@code toResolution(992.484375, 0.05)} is {@code 992.48}.
     *
     * @param value      a finite double
     * @param resolution the resolution, &gt; 0
     * @return the shortest decimal text of the value rounded to the resolution's decimals
     */
    public static String toResolution(final double value, final double resolution) {
        int decimals = Math.max(0, (int) Math.ceil(-Math.log10(resolution) - 1e-9));
        return format(new BigDecimal(value).setScale(decimals, RoundingMode.HALF_EVEN).doubleValue());
    }

    /**
     * The shortest text of a setting: the round-trip digits of {@link #format}, in plain notation from
     * 0.001 to below a million, otherwise in whichever of plain or exponent notation is shorter
     * ({@code 1e-4}, {@code 2000}, {@code 0.05}, {@code 1.5e6}).
     *
     * @param value a finite double
     * @return its shortest text
     */
    public static String shortest(final double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("not a finite number: " + value);
        }
        if (value == 0.0) {
            return "0";
        }
        BigDecimal digits = ShortestDigits.of(value).toBigDecimal();
        int exponent = digits.precision() - digits.scale() - 1;
        String plain = digits.toPlainString();
        String sci = scientific(digits, exponent);
        boolean everyday = exponent >= -3 && exponent < 6;
        return !everyday && sci.length() < plain.length() ? sci : plain;
    }
}
