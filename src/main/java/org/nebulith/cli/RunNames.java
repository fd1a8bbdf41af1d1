package org.nebulith.cli;

import java.util.Locale;

/** Pieces of default run-folder names. */
final class RunNames {
    private RunNames() {
    }

    /** @param x a number @return it as a name-safe text, e.g. {@code 1.5} to {@code 1.5}, {@code 1e-3} to {@code 0.001} */
    static String number(final double x) {
        String s = String.format(Locale.ROOT, "%.4f", x).replaceFirst("0+$", "").replaceFirst("\\.$", "");
        return s.replace('-', 'm');
    }
}
