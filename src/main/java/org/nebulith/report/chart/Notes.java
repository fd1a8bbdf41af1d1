package org.nebulith.report.chart;

import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;

/** Small text notes placed in data coordinates. */
final class Notes {

    private Notes() {
    }

    /**
     * Puts a note near the top-left corner of the plot.
     *
     * @param chart the chart
     * @param text  the note; nothing is drawn when empty
     * @param x     the plotted x values
     * @param yTop  the top of the y axis in data units
     */
    static void corner(final XYChart chart, final String text, final double[] x, final double yTop) {
        if (text == null || text.isBlank()) {
            return;
        }
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double v : x) {
            min = Math.min(min, v);
            max = Math.max(max, v);
        }
        // the text is centred on its anchor: about 1.1 % of a column-wide plot per character
        double halfWidth = 0.0055 * text.length() * (max - min);
        chart.addAnnotation(new AnnotationText(text, min + 0.03 * (max - min) + halfWidth, yTop * 0.55, false));
    }
}
