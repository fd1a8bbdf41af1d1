package org.nebulith.spark;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import org.nebulith.survey.PlanetSurveyEstimator;
import org.nebulith.survey.StarRow;
import org.nebulith.survey.SurveySettings;

/**
 * The parameter grid of a distributed survey: stars x disk models x zone files.
 *
 * <p>A dimension given with one value (or none) is not a grid dimension: the value is the run's
 * setting and a star's own {@code disk}/{@code zones} cell still wins, exactly as in
 * {@code nebulith survey --disk/--zones}. A dimension with two or more values is swept: each cell
 * of the grid sets its value on every star, replacing the star's own. Tasks come cell by cell, each
 * cell in catalogue order, so that neighbouring tasks (one partition) share one estimator.
 *
 * @param disks disk presets or files of the grid (empty: the run's default)
 * @param zones feeding-zone files of the grid (empty: the run's default)
 */
public record SurveyGrid(List<String> disks, List<String> zones) {

    public SurveyGrid {
        disks = List.copyOf(disks);
        zones = List.copyOf(zones);
    }

    /** @return whether more than one disk model or zone file is swept */
    public boolean isGrid() {
        return disks.size() > 1 || zones.size() > 1;
    }

    /** @return the number of grid cells */
    public int cells() {
        return Math.max(1, disks.size()) * Math.max(1, zones.size());
    }

    /**
     * @param draws the draws per star
     * @param seed  the seed
     * @param solar the solar reference
     * @return the run's settings: the single disk and zone file where a dimension is not swept
     */
    public SurveySettings settings(int draws, long seed, org.nebulith.composition.SolarReference solar) {
        return new SurveySettings(draws, seed, solar, disks.size() == 1 ? disks.get(0) : null,
                zones.size() == 1 ? zones.get(0) : null);
    }

    /**
     * @param stars the catalogue's good rows, in catalogue order
     * @return one task per star and cell, cell-major
     */
    public List<GridTask> tasks(List<StarRow> stars) {
        List<String> diskCells = disks.size() > 1 ? disks : Collections.singletonList(null);
        List<String> zoneCells = zones.size() > 1 ? zones : Collections.singletonList(null);
        List<GridTask> tasks = new ArrayList<>(stars.size() * diskCells.size() * zoneCells.size());
        long index = 0;
        for (String d : diskCells) {
            for (String z : zoneCells) {
                for (StarRow r : stars) {
                    tasks.add(new GridTask(index++, new StarRow(r.star(), r.line(), r.abundances(),
                            d == null ? r.disk() : d, z == null ? r.zones() : z, r.errorCorrelation())));
                }
            }
        }
        return tasks;
    }

    /**
     * @param effective a star's effective settings
     * @return the disk as written in the output (the default's name where none is set)
     */
    public static String diskLabel(SurveySettings effective) {
        return effective.disk() == null ? PlanetSurveyEstimator.DEFAULT_DISK : effective.disk();
    }

    /**
     * @param effective a star's effective settings
     * @return the zone file as written in the output (the default's name where none is set)
     */
    public static String zonesLabel(SurveySettings effective) {
        return effective.zones() == null ? PlanetSurveyEstimator.DEFAULT_ZONES : effective.zones();
    }

    /** @return a readable description, e.g. {@code disks [a, b] x zones (run default)} */
    @Override
    public String toString() {
        return "disks " + (disks.isEmpty() ? "(run default)" : disks) + " x zones "
                + (zones.isEmpty() ? "(run default)" : zones);
    }
}
