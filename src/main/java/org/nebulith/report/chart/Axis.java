package org.nebulith.report.chart;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.DoubleFunction;

/**
 * One axis of a panel: range, linear or logarithmic scale, direction, title with unit, and the
 * ticks. Linear ticks step by 1, 2, 2.5 or 5 times a power of ten (about {@code targetTicks}
 * of them); logarithmic ticks are the decades, with 2 and 5 added when the axis spans fewer than
 * three decades. Tick labels are plain decimals (no exponent notation between 1e-3 and 1e5, no
 * trailing zeros, no rounding noise).
 */
public final class Axis {

    private final double min;
    private final double max;
    private final boolean log;
    private final boolean reversed;
    private final String title;
    private final int targetTicks;
    private DoubleFunction<String> labels;

    private Axis(final double min, final double max, final boolean log, final boolean reversed, final String title,
                 final int targetTicks) {
        if (!(Double.isFinite(min) && Double.isFinite(max) && max > min)) {
            throw new IllegalArgumentException("axis " + title + ": need finite min < max, got " + min + ", " + max);
        }
        if (log && !(min > 0)) {
            throw new IllegalArgumentException("log axis " + title + ": min must be > 0, got " + min);
        }
        this.min = min;
        this.max = max;
        this.log = log;
        this.reversed = reversed;
        this.title = Objects.requireNonNull(title);
        this.targetTicks = targetTicks;
    }

    /**
     * @param min   low end
     * @param max   high end
     * @param title title with unit
     * @return a linear axis, low end at the left or bottom
     */
    public static Axis linear(final double min, final double max, final String title) {
        return new Axis(min, max, false, false, title, 6);
    }

    /**
     * @param min   low end, &gt; 0
     * @param max   high end
     * @param title title with unit
     * @return a logarithmic axis
     */
    public static Axis log(final double min, final double max, final String title) {
        return new Axis(min, max, true, false, title, 6);
    }

    /** @return this axis with its direction reversed (high values at the left or bottom) */
    public Axis reversed() {
        Axis a = new Axis(min, max, log, !reversed, title, targetTicks);
        a.labels = labels;
        return a;
    }

    /** @param n about how many ticks @return this axis with that tick density */
    public Axis ticks(final int n) {
        Axis a = new Axis(min, max, log, reversed, title, n);
        a.labels = labels;
        return a;
    }

    /** @param format tick-label text for a value @return this */
    public Axis labels(final DoubleFunction<String> format) {
        this.labels = format;
        return this;
    }

    /** @return low end */
    public double min() {
        return min;
    }

    /** @return high end */
    public double max() {
        return max;
    }

    /** @return whether the scale is logarithmic */
    public boolean isLog() {
        return log;
    }

    /** @return the title */
    public String title() {
        return title;
    }

    /**
     * @param v a value
     * @return its position along the axis, 0 at the start (left or bottom), 1 at the end
     */
    public double fraction(final double v) {
        double f = log ? Math.log(v / min) / Math.log(max / min) : (v - min) / (max - min);
        return reversed ? 1 - f : f;
    }

    /** @return whether v lies within the range (with 1e-9 relative slack) */
    public boolean contains(final double v) {
        double slack = 1e-9 * (max - min);
        return v >= min - slack && v <= max + slack;
    }

    /** @return the labelled tick values */
    public List<Double> ticks() {
        return log ? logTicks() : linearTicks();
    }

    /** @return unlabelled minor tick values (log axes: 2 to 9 of each decade) */
    public List<Double> minorTicks() {
        List<Double> out = new ArrayList<>();
        if (!log) {
            return out;
        }
        for (int e = (int) Math.floor(Math.log10(min)); e <= Math.ceil(Math.log10(max)); e++) {
            for (int m = 2; m <= 9; m++) {
                double v = Double.parseDouble(m + "e" + e);
                if (contains(v)) {
                    out.add(v);
                }
            }
        }
        return out;
    }

    /**
     * @param v a tick value
     * @return its label
     */
    public String label(final double v) {
        if (labels != null) {
            return labels.apply(v);
        }
        if (log && (min < 1e-3 || max > 1e5)) {
            return superscriptPower(v);
        }
        return plain(v, log ? v / 10 : linearStep());
    }

    private List<Double> linearTicks() {
        double step = linearStep();
        List<Double> out = new ArrayList<>();
        for (double k = Math.ceil(min / step - 1e-9); k * step <= max + 1e-9 * step; k++) {
            out.add(k * step + 0.0); // + 0.0 turns -0.0 into 0.0
        }
        return out;
    }

    /** @return the step between linear ticks */
    public double linearStep() {
        double raw = (max - min) / Math.max(1, targetTicks);
        double decade = Math.pow(10, Math.floor(Math.log10(raw)));
        double[] nice = {1, 2, 2.5, 5, 10};
        for (double n : nice) {
            if (n * decade >= raw * 0.999) {
                return n * decade;
            }
        }
        return 10 * decade;
    }

    private List<Double> logTicks() {
        List<Double> out = new ArrayList<>();
        double decades = Math.log10(max / min);
        double[] mantissas = decades < 1.2 ? new double[] {1, 1.5, 2, 3, 4, 5, 7} : decades < 3
                ? new double[] {1, 2, 5} : new double[] {1};
        for (int e = (int) Math.floor(Math.log10(min)); e <= Math.ceil(Math.log10(max)); e++) {
            for (double m : mantissas) {
                double v = Double.parseDouble(m + "e" + e); // exact decimal, not 3 * 0.1
                if (contains(v)) {
                    out.add(v);
                }
            }
        }
        return out;
    }

    /**
     * @param v    a value
     * @param step the resolution to show
     * @return v as a plain decimal to the resolution of step, e.g. 0.3 not 0.30000000000000004
     */
    static String plain(final double v, final double step) {
        if (v == 0) {
            return "0";
        }
        double mag = Math.abs(step);
        int decimals = Math.max(0, (int) Math.ceil(-Math.log10(mag) - 1e-9) + (isQuarter(mag) ? 1 : 0));
        if (Math.abs(v) >= 1e5 || Math.abs(v) < 1e-3) {
            return superscriptPower(v);
        }
        return BigDecimal.valueOf(v).setScale(Math.min(decimals, 6), RoundingMode.HALF_EVEN).stripTrailingZeros()
                .toPlainString();
    }

    private static boolean isQuarter(final double step) {
        double m = step / Math.pow(10, Math.floor(Math.log10(step)));
        return Math.abs(m - 2.5) < 1e-9;
    }

    /** @param v a value @return it as m×10ⁿ (or 10ⁿ) with superscript digits */
    static String superscriptPower(final double v) {
        int e = (int) Math.floor(Math.log10(Math.abs(v)) + 1e-9);
        double m = v / Math.pow(10, e);
        String sup = "\u2070\u00b9\u00b2\u00b3\u2074\u2075\u2076\u2077\u2078\u2079";
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
            t.append(sup.charAt(c - '0'));
        }
        return t.toString();
    }
}
