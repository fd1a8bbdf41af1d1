package org.nebulith.report.chart;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.geom.Path2D;
import java.awt.geom.PathIterator;
import java.util.List;

import org.junit.jupiter.api.Test;

/** The chart kit's geometry: line reduction, label spreading, axis ticks and labels, SVG text. */
class ChartKitTest {

    @Test
    void reductionKeepsEveryPointFartherThanTheToleranceAndDropsCollinearOnes() {
        int n = 2001;
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = i * 0.1;
            y[i] = i < 1000 ? 50 : 50 + (i - 1000) * 0.05; // two straight pieces
        }
        Path2D.Double p = Polylines.path(x, y);
        assertEquals(3, vertices(p), "a polyline of two straight pieces keeps its three corners");
        // every original point lies within the tolerance of the reduced line (exact identity: it is on it)
        y[500] += 1.0;
        assertTrue(vertices(Polylines.path(x, y)) > 3, "a 1 pt spike (10 x the tolerance) is kept");
    }

    @Test
    void nanBreaksALineIntoSubpathsOfOnePath() {
        double[] x = {0, 1, 2, 3, 4};
        double[] y = {0, 1, Double.NaN, 3, 4};
        Path2D.Double p = Polylines.path(x, y);
        int moves = 0;
        double[] c = new double[6];
        for (PathIterator it = p.getPathIterator(null); !it.isDone(); it.next()) {
            moves += it.currentSegment(c) == PathIterator.SEG_MOVETO ? 1 : 0;
        }
        assertEquals(2, moves);
    }

    @Test
    void spreadKeepsOrderAndGapsAndMovesAsLittleAsNeeded() {
        double[] at = Spread.apart(new double[] {10, 11, 12, 50}, new double[] {4, 4, 4}, 0, 100);
        assertArrayEquals(new double[] {7, 11, 15, 50}, at, 1e-12, "a crowded block is centred on its mean");
        double[] edge = Spread.apart(new double[] {0, 0}, new double[] {10}, 2, 100);
        assertTrue(edge[0] >= 2 && edge[1] - edge[0] >= 10 - 1e-12);
    }

    @Test
    void ticksAreRoundAndLabelsPlain() {
        Axis a = Axis.linear(0, 1, "f");
        assertEquals(List.of(0.0, 0.2, 0.4, 0.6000000000000001, 0.8, 1.0), a.ticks());
        assertEquals("0.6", a.label(a.ticks().get(3)));
        Axis log = Axis.log(0.2, 3, "r [AU]");
        assertTrue(log.ticks().contains(1.5) && log.ticks().contains(0.3), log.ticks().toString());
        assertEquals("1.5", log.label(1.5));
        assertEquals("10\u207b\u2074", Axis.log(1e-7, 1e-3, "P").label(1e-4));
        Axis t = Axis.linear(300, 2000, "T").reversed();
        assertTrue(t.fraction(2000) < t.fraction(300));
    }

    @Test
    void svgTextIsLiveAndEscaped() {
        Drawing d = new Drawing(100, 50).text("Mg/Si < 1 & \"x\"", 10, 20, 7, Drawing.Align.LEFT, Palette.AXIS);
        String svg = SvgWriter.write(d);
        assertTrue(svg.contains(">Mg/Si &lt; 1 &amp; &quot;x&quot;</text>"), svg);
    }

    private static int vertices(final Path2D.Double p) {
        int n = 0;
        double[] c = new double[6];
        for (PathIterator it = p.getPathIterator(null); !it.isDone(); it.next()) {
            it.currentSegment(c);
            n++;
        }
        return n;
    }
}
