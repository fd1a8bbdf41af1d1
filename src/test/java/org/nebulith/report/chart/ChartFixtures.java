package org.nebulith.report.chart;

import java.util.Map;

import org.knowm.xchart.XYChart;

/** Public access to the invented demo charts for tests in other packages. */
public final class ChartFixtures {

    private ChartFixtures() {
    }

    /** @return every chart kind with invented demo data, by base file name */
    public static Map<String, XYChart> all() {
        return ChartSamples.all();
    }
}
