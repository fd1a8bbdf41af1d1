package org.nebulith.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.nebulith.composition.SolarReference;
import org.nebulith.survey.Measurement;
import org.nebulith.survey.StarRow;
import org.nebulith.survey.SurveySettings;
import org.nebulith.thermo.Element;

/** The grid, the default partitioning and the option checks, without Spark. */
class SurveyGridTest {

    private static StarRow star(String name, String disk) {
        Map<Element, Measurement> m = new EnumMap<>(Element.class);
        m.put(Element.Fe, new Measurement(0.1, 0.05));
        return new StarRow(name, 3, m, disk, null, 0);
    }

    @Test
    void oneValueIsTheRunSettingAndTheStarsOwnDiskStillWins() {
        SurveyGrid grid = new SurveyGrid(List.of("hot-early-disk"), List.of());
        assertFalse(grid.isGrid());
        SurveySettings run = grid.settings(10, 5, SolarReference.ASPLUND2009);
        assertEquals("hot-early-disk", run.disk());
        assertNull(run.zones());
        List<GridTask> tasks = grid.tasks(List.of(star("A", null), star("B", "mmsn-hayashi1981")));
        assertEquals(2, tasks.size());
        assertEquals("hot-early-disk", run.forStar(tasks.get(0).row()).disk());
        assertEquals("mmsn-hayashi1981", run.forStar(tasks.get(1).row()).disk());
    }

    @Test
    void aGridSetsEachCellOnEveryStarCellByCellInCatalogueOrder() {
        SurveyGrid grid = new SurveyGrid(List.of("d1", "d2"), List.of("z1", "z2", "z3"));
        assertTrue(grid.isGrid());
        assertEquals(6, grid.cells());
        SurveySettings run = grid.settings(10, 5, SolarReference.ASPLUND2009);
        assertNull(run.disk());
        List<GridTask> tasks = grid.tasks(List.of(star("A", "own"), star("B", null)));
        assertEquals(12, tasks.size());
        StringBuilder order = new StringBuilder();
        for (int i = 0; i < tasks.size(); i++) {
            GridTask t = tasks.get(i);
            assertEquals(i, t.index());
            SurveySettings own = run.forStar(t.row());
            order.append(t.row().star()).append(':').append(own.disk()).append('/').append(own.zones()).append(' ');
            assertEquals(3, t.row().line(), "the catalogue line is kept for messages");
        }
        assertEquals("A:d1/z1 B:d1/z1 A:d1/z2 B:d1/z2 A:d1/z3 B:d1/z3 A:d2/z1 B:d2/z1 A:d2/z2 B:d2/z2 A:d2/z3 B:d2/z3 ",
                order.toString());
    }

    @Test
    void defaultPartitionsAreTwoPerCoreOrAboutFiveThousandDrawsEachNeverMoreThanTheTasks() {
        assertEquals(200, SparkSurvey.defaultPartitions(100_000, 10, 100));
        assertEquals(20_000, SparkSurvey.defaultPartitions(100_000, 1_000, 100));
        assertEquals(3, SparkSurvey.defaultPartitions(3, 8, 2));
        assertEquals(4, SparkSurvey.defaultPartitions(60, 50, 2));
        assertEquals(1, SparkSurvey.defaultPartitions(1, 1, 1));
    }

    @Test
    void badOptionsExitTwoBeforeSparkStarts() {
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        PrintStream p = new PrintStream(err, true, StandardCharsets.UTF_8);
        assertEquals(2, SparkSurveyMain.run(new String[] {"--catalogue", "c.csv", "--out", "o", "--draws", "0"}, p));
        assertEquals(2, SparkSurveyMain.run(new String[] {"--catalogue", "c.csv", "--out", "o", "--solar-reference", "x"}, p));
        assertEquals(2, SparkSurveyMain.run(new String[] {"--catalogue", "c.csv"}, p));
        String text = err.toString(StandardCharsets.UTF_8);
        assertTrue(text.contains("option --draws: value \"0\": must be at least 1"), text);
        assertTrue(text.contains("asplund2009, lodders2003"), text);
        assertTrue(text.contains("--out"), text);
        assertFalse(text.contains("\tat "), "no stack trace");
    }
}
