package org.nebulith.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.nebulith.thermo.mineral.MineralModel;
import org.nebulith.thermo.mineral.TransitionTerm;

/**
 * Exact thermodynamic identities for every species of the database (common practice): g = h - T s and
 * cp = dh/dT (central difference), at 20 temperatures of its data range, away from interval boundaries
 * and transition temperatures.
 */
class ThermoIdentitiesTest {
    private static final int POINTS = 20;
    private static final double STEP_K = 0.01;
    private static final double KEEP_AWAY_K = 5;

    private static List<Double> singular(Species s) {
        List<Double> out = new ArrayList<>();
        if (s.thermo() instanceof Nasa9Model) {
            ((Nasa9Model) s.thermo()).intervals().forEach(iv -> out.add(iv.tLowK()));
        } else if (s.thermo() instanceof MineralModel) {
            for (TransitionTerm t : ((MineralModel) s.thermo()).terms()) {
                for (double x : t.singularTemperaturesK()) {
                    out.add(x);
                }
            }
        }
        return out;
    }

    @Test
    void gEqualsHMinusTsAndCpIsDhDtForEverySpecies() {
        List<Species> all = SpeciesDatabase.bundled().species();
        List<String> bad = new ArrayList<>();
        int checks = 0;
        for (Species s : all) {
            ThermoModel m = s.thermo();
            double lo = m.tMinK() + 1;
            double hi = m.tMaxK() - 1;
            List<Double> avoid = singular(s);
            for (int i = 0; i < POINTS; i++) {
                double t = lo + (hi - lo) * (i + 0.5) / POINTS;
                if (avoid.stream().anyMatch(x -> Math.abs(x - t) < KEEP_AWAY_K)) {
                    continue;
                }
                double g = m.gJPerMol(t);
                double hts = m.hJPerMol(t) - t * m.sJPerMolK(t);
                if (!(Math.abs(g - hts) <= 1e-9 * Math.max(1, Math.abs(g)) + 1e-6)) {
                    bad.add(s.id() + " g != h - Ts at " + t + ": " + g + " vs " + hts);
                }
                if (Math.abs(m.gOverRT(t) - (m.hOverRT(t) - m.sOverR(t))) > 1e-9 * Math.max(1, Math.abs(m.gOverRT(t)))) {
                    bad.add(s.id() + " g/RT != h/RT - s/R at " + t);
                }
                double dhdt = (m.hJPerMol(t + STEP_K) - m.hJPerMol(t - STEP_K)) / (2 * STEP_K);
                double cp = m.cpJPerMolK(t);
                if (!(Math.abs(dhdt - cp) <= 1e-4 * Math.abs(cp) + 0.02)) {
                    bad.add(s.id() + " cp != dh/dT at " + t + ": " + cp + " vs " + dhdt);
                }
                double dgdt = (m.gJPerMol(t + STEP_K) - m.gJPerMol(t - STEP_K)) / (2 * STEP_K);
                if (!(Math.abs(dgdt + m.sJPerMolK(t)) <= 1e-4 * Math.abs(m.sJPerMolK(t)) + 0.02)) {
                    bad.add(s.id() + " s != -dg/dT at " + t + ": " + m.sJPerMolK(t) + " vs " + (-dgdt));
                }
                checks++;
            }
        }
        assertTrue(checks > 15 * all.size(), "checks made: " + checks);
        assertEquals(List.of(), bad.subList(0, Math.min(bad.size(), 20)));
    }

    @Test
    void validityPolicy() {
        SpeciesDatabase db = SpeciesDatabase.bundled();
        Species fo = db.get("forsterite");
        assertTrue(fo.isValidAt(2000) && fo.isExtrapolatedAt(2000), "flagged beyond 1800 K");
        assertTrue(!fo.isValidAt(2600), "refused beyond 2500 K");
        assertTrue(fo.isValidAt(250) && fo.isExtrapolatedAt(250));
        assertTrue(!fo.isExtrapolatedAt(1000));
        Species chromite = db.get("chromite");
        assertTrue(chromite.isValidAt(1800) && !chromite.isValidAt(1801), "stated T_max is a hard limit");
        Species feA = db.get("Fe(a)");
        assertTrue(feA.isValidAt(1184) && !feA.isValidAt(1185), "NASA entry absent outside its interval");
        Species feC = db.get("Fe(c)");
        assertTrue(!feC.isValidAt(1184) && feC.isValidAt(1185));
    }
}
