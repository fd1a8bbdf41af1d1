package org.nebulith.report.chart;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Tick labels for people: plain decimals without rounding noise (0.6, not 0.6000000000000001; no
 * "-0"), powers of ten with superscript digits (10⁻⁴) outside 0.001 to 100000, and on logarithmic
 * axes only the decades and, on short axes, some of their multiples (2 and 5; 3 and 7 too under
 * 1.8 decades; all but 9 under 1.2).
 */
final class TickLabels {

    private static final String SUPERSCRIPTS = "\u2070\u00b9\u00b2\u00b3\u2074\u2075\u2076\u2077\u2078\u2079";

    private TickLabels() {
    }

    /** @param v a linear tick value @return its label */
    static String linear(final double v) {
        if (Math.abs(v) < 1e-12) {
            return "0";
        }
        if (Math.abs(v) >= 1e5 || Math.abs(v) < 1e-3) {
            return power(v);
        }
        String s = new BigDecimal(v).round(new MathContext(9, RoundingMode.HALF_EVEN)).stripTrailingZeros()
                .toPlainString();
        return s.startsWith("-") ? "\u2212" + s.substring(1) : s;
    }

    /**
     * @param v        a logarithmic tick value
     * @param decades  how many decades the axis spans
     * @return its label, empty for the unlabelled minor ticks
     */
    static String log(final double v, final double decades) {
        double e = Math.floor(Math.log10(v) + 1e-9);
        double m = v / Math.pow(10, e);
        boolean decade = Math.abs(m - 1) < 1e-6;
        boolean labelled = decade || decades < 1.2 && !near(m, 9)
                || decades < 1.8 && (near(m, 2) || near(m, 3) || near(m, 5) || near(m, 7))
                || decades < 3 && (near(m, 2) || near(m, 5));
        if (!labelled) {
            return "";
        }
        return decades > 3 && decade || v >= 1e5 || v < 1e-3 ? power(v) : linear(v);
    }

    private static boolean near(final double a, final double b) {
        return Math.abs(a - b) < 1e-6;
    }

    /** @param v a value @return it as m×10ⁿ (or 10ⁿ) with superscript digits */
    static String power(final double v) {
        int e = (int) Math.floor(Math.log10(Math.abs(v)) + 1e-9);
        double m = v / Math.pow(10, e);
        StringBuilder t = new StringBuilder();
        if (Math.abs(Math.abs(m) - 1) > 1e-6) {
            t.append(BigDecimal.valueOf(m).setScale(2, RoundingMode.HALF_EVEN).stripTrailingZeros().toPlainString())
                    .append('\u00d7');
        } else if (m < 0) {
            t.append('\u2212');
        }
        t.append("10");
        if (e < 0) {
            t.append('\u207b');
        }
        for (char c : Integer.toString(Math.abs(e)).toCharArray()) {
            t.append(SUPERSCRIPTS.charAt(c - '0'));
        }
        return t.toString();
    }
}
