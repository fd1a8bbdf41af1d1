package org.nebulith.survey;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** Test helpers: the demo catalogue and its rows. */
public final class SurveyTestData {

    /** The demo catalogue of invented stars (repository file). */
    public static final Path DEMO = Path.of("presets", "demo-catalogue.csv");

    private SurveyTestData() {
    }

    public static List<StarRow> demoRows() throws IOException {
        List<StarRow> rows = new ArrayList<>();
        try (CatalogueReader r = CatalogueReader.open(DEMO)) {
            for (CatalogueReader.Parsed p = r.next(); p != null; p = r.next()) {
                if (p.row() == null) {
                    throw new AssertionError("demo catalogue row has problems: " + p.problems());
                }
                rows.add(p.row());
            }
        }
        return rows;
    }

    public static SurveyRow find(List<SurveyRow> rows, String zone, String quantity) {
        return rows.stream().filter(r -> r.zone().equals(zone) && r.quantity().equals(quantity)).findFirst()
                .orElseThrow(() -> new AssertionError("no " + zone + "/" + quantity + " in " + rows));
    }
}
