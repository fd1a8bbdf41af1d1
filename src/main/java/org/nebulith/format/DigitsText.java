package org.nebulith.format;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;

/**
 * Writes {@link DecimalDigits} as {@link Decimal#format} lays them out: plain notation (the text
 * {@link java.math.BigDecimal#toPlainString} gives) or {@code d.ddde-N}.
 */
final class DigitsText {

    /** A number of b bits (b up to 63) has floor(b * 1233 / 4096) digits or one more (common practice). */
    private static final int LOG10_2_TIMES_4096 = 1233;
    private static final int LOG10_2_SHIFT = 12;
    /** (n * 0xCCCCCCCD) >>> 35 is n / 10 for every n below 2^32 (common practice). */
    private static final long DIVIDE_BY_TEN = 0xCCCCCCCDL;
    private static final int DIVIDE_BY_TEN_SHIFT = 35;
    private static final long EIGHT_DIGITS = 100_000_000L;
    /** 10^0 to 10^18; not to be written to. */
    static final long[] TEN_TO_THE = powers(10, 19);

    private DigitsText() {
    }

    /**
     * @param digits the number
     * @return its plain text ({@code 1500}, {@code 2.5}, {@code 0.00012})
     */
    static String plain(final DecimalDigits digits) {
        byte[] figures = figures(Math.abs(digits.unscaled()));
        int count = figures.length;
        int scale = digits.scale();
        int sign = digits.unscaled() < 0 ? 1 : 0;
        byte[] text;
        if (scale <= 0) {
            text = new byte[sign + count - scale];
            System.arraycopy(figures, 0, text, sign, count);
            Arrays.fill(text, sign + count, text.length, (byte) '0');
        } else if (count > scale) {
            text = new byte[sign + count + 1];
            int whole = count - scale;
            System.arraycopy(figures, 0, text, sign, whole);
            text[sign + whole] = '.';
            System.arraycopy(figures, whole, text, sign + whole + 1, scale);
        } else {
            text = new byte[sign + 2 + scale];
            Arrays.fill(text, sign, text.length - count, (byte) '0');
            text[sign + 1] = '.';
            System.arraycopy(figures, 0, text, text.length - count, count);
        }
        return ascii(text, sign);
    }

    /**
     * @param digits   the number
     * @param exponent its decimal exponent ({@link DecimalDigits#exponent})
     * @return {@code d.ddde-N} or {@code d.dddeN}
     */
    static String scientific(final DecimalDigits digits, final int exponent) {
        byte[] figures = figures(Math.abs(digits.unscaled()));
        int count = figures.length;
        byte[] power = figures(Math.abs(exponent));
        int sign = digits.unscaled() < 0 ? 1 : 0;
        int mantissa = count > 1 ? count + 1 : 1;
        int powerSign = exponent < 0 ? 1 : 0;
        byte[] text = new byte[sign + mantissa + 1 + powerSign + power.length];
        text[sign] = figures[0];
        if (count > 1) {
            text[sign + 1] = '.';
            System.arraycopy(figures, 1, text, sign + 2, count - 1);
        }
        text[sign + mantissa] = 'e';
        if (powerSign == 1) {
            text[sign + mantissa + 1] = '-';
        }
        System.arraycopy(power, 0, text, text.length - power.length, power.length);
        return ascii(text, sign);
    }

    private static String ascii(final byte[] text, final int sign) {
        if (sign == 1) {
            text[0] = '-';
        }
        return new String(text, StandardCharsets.ISO_8859_1);
    }

    /**
     * @param magnitude a number from 0 to Long.MAX_VALUE
     * @return its decimal digits as ASCII
     */
    private static byte[] figures(final long magnitude) {
        byte[] figures = new byte[digitCount(magnitude)];
        int at = figures.length;
        long rest = magnitude;
        while (rest >= EIGHT_DIGITS) {
            long high = rest / EIGHT_DIGITS;
            at = digitsOf((int) (rest - high * EIGHT_DIGITS), figures, at, at - 8);
            rest = high;
        }
        digitsOf((int) rest, figures, at, 0);
        return figures;
    }

    /** Writes the digits of value, right to left, into figures[from, end), zero-padded; returns from. */
    private static int digitsOf(final int value, final byte[] figures, final int end, final int from) {
        int rest = value;
        for (int at = end - 1; at >= from; at--) {
            int tenth = (int) ((rest * DIVIDE_BY_TEN) >>> DIVIDE_BY_TEN_SHIFT);
            figures[at] = (byte) ('0' + rest - tenth * 10);
            rest = tenth;
        }
        return from;
    }

    /**
     * @param magnitude a number from 0 to Long.MAX_VALUE
     * @return how many decimal digits it has (1 for 0)
     */
    static int digitCount(final long magnitude) {
        long odd = magnitude | 1; // as many digits as magnitude, and at least one
        int bits = Long.SIZE - Long.numberOfLeadingZeros(odd);
        int atMost = (bits * LOG10_2_TIMES_4096) >>> LOG10_2_SHIFT;
        return odd >= TEN_TO_THE[atMost] ? atMost + 1 : atMost;
    }

    /**
     * @param base  the base
     * @param count how many powers (they must stay below 2^63)
     * @return base^0 to base^(count - 1)
     */
    static long[] powers(final long base, final int count) {
        long[] powers = new long[count];
        powers[0] = 1;
        for (int i = 1; i < powers.length; i++) {
            powers[i] = powers[i - 1] * base;
        }
        return powers;
    }
}
