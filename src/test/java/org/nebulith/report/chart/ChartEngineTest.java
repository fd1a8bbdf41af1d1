package org.nebulith.report.chart;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.geom.Path2D;
import java.awt.geom.PathIterator;

import org.junit.jupiter.api.Test;

/** The chart engine's geometry: line reduction, label spreading, tick labels. */
class ChartEngineTest {

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
    void tickLabelsArePlainDecimalsAndPowers() {
        assertEquals("0.6", TickLabels.linear(0.6000000000000001));
        assertEquals("0", TickLabels.linear(-1e-17));
        assertEquals("\u22120.2", TickLabels.linear(-0.2));
        assertEquals("0.3", TickLabels.log(0.3, 1.2));
        assertEquals("0.7", TickLabels.log(0.7, 1.5));
        assertEquals("", TickLabels.log(0.4, 1.5), "some minor ticks of a short log axis are unlabelled");
        assertEquals("", TickLabels.log(0.9, 1.1));
        assertEquals("10\u207b\u2074", TickLabels.log(1e-4, 4));
        assertEquals("", TickLabels.log(2e-4, 4), "a long log axis labels its decades only");
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
