package org.nebulith.report.chart;

import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

/**
 * Free-space bookkeeping for direct labels and notes: the boxes already taken and the drawn lines
 * (device coordinates) a new box must not cross.
 */
final class Placement {

    private final Rectangle2D bounds;
    private final List<Rectangle2D> taken = new ArrayList<>();
    private final List<double[][]> lines = new ArrayList<>();

    /** @param bounds the region labels must stay inside [pt] */
    Placement(final Rectangle2D bounds) {
        this.bounds = bounds;
    }

    /** @param device x and y device coordinates of a drawn line (NaN = break) */
    void line(final double[][] device) {
        lines.add(device);
    }

    /** @param box a box now taken */
    void take(final Rectangle2D box) {
        taken.add(box);
    }

    /**
     * @param box    a candidate box
     * @param except index of a line allowed to touch the box (its own curve), or -1
     * @return whether the box is inside the bounds and free of other boxes and lines
     */
    boolean free(final Rectangle2D box, final int except) {
        if (!bounds.contains(box)) {
            return false;
        }
        for (Rectangle2D r : taken) {
            if (r.intersects(box)) {
                return false;
            }
        }
        for (int k = 0; k < lines.size(); k++) {
            if (k != except && crosses(lines.get(k), box)) {
                return false;
            }
        }
        return true;
    }

    /** @param box a box @return how many line vertices and segments touch it (0 = free of lines) */
    int hits(final Rectangle2D box) {
        int n = 0;
        for (double[][] l : lines) {
            n += crosses(l, box) ? 1 : 0;
        }
        for (Rectangle2D r : taken) {
            n += r.intersects(box) ? 1 : 0;
        }
        return n;
    }

    private static boolean crosses(final double[][] l, final Rectangle2D box) {
        double[] x = l[0];
        double[] y = l[1];
        for (int i = 1; i < x.length; i++) {
            if (Double.isFinite(x[i]) && Double.isFinite(x[i - 1])
                    && box.intersectsLine(x[i - 1], y[i - 1], x[i], y[i])) {
                return true;
            }
        }
        return x.length == 1 && Double.isFinite(x[0]) && box.contains(x[0], y[0]);
    }
}
