package org.nebulith.report.chart;

import java.util.Map;


/** Public access to the invented demo charts for tests in other packages. */
public final class ChartFixtures {

    private ChartFixtures() {
    }

    /** @return every chart kind with invented demo data, by base file name */
    public static Map<String, Figure> all() {
        return ChartSamples.all();
    }
}
