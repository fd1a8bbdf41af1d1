package org.nebulith.report.interior;

import java.util.List;

import org.nebulith.measured.PlanetVerdict;
import org.nebulith.planet.interior.ProfilePoint;
import org.nebulith.planet.interior.Structure;
import org.nebulith.files.Table;

/** The CSV tables of the interior and measured-planet commands. */
public final class InteriorTables {
    /** Columns of a structure profile. */
    public static final List<String> PROFILE = List.of("r_km", "m_Mearth", "P_GPa", "rho_kg_m3", "g_m_s2", "layer");
    /** Columns of {@code planets.csv}. */
    public static final List<String> PLANETS = List.of("planet", "star", "quantity", "median", "p16", "p84", "unit");

    private InteriorTables() {
    }

    /** @param s a structure @return its profile, centre first */
    public static Table profile(final Structure s) {
        Table t = Table.withColumns("interior-profile.csv", PROFILE);
        for (ProfilePoint p : s.profile()) {
            t.row(p.rKm(), p.mMearth(), p.pGpa(), p.rhoKgM3(), p.gMs2(), p.layer().label());
        }
        return t;
    }

    /** @param s a structure @return quantity,value,unit */
    public static Table summary(final Structure s) {
        Table t = Table.withColumns("interior-structure.csv", "quantity", "value", "unit");
        t.row("mass", s.model().massMearth(), "M_earth");
        t.row("core_mass_fraction", s.model().coreMassFraction(), "mass fraction of rock");
        t.row("water_mass_fraction", s.model().waterMassFraction(), "mass fraction of planet");
        t.row("mantle_Mg_number", s.model().mantle().mgNumber(), "100 Mg/(Mg+Fe) molar");
        t.row("mantle_MgFe_Si_molar", s.model().mantle().cationsPerSi(), "mol/mol");
        t.row("core_Si_wt_pct", s.model().core().siWtPct(), "wt_pct");
        t.row("core_O_wt_pct", s.model().core().oWtPct(), "wt_pct");
        t.row("radius_km", s.radiusKm(), "km");
        t.row("radius_Rearth", s.radiusRearth(), "R_earth");
        t.row("core_radius_km", s.coreRadiusKm(), "km");
        t.row("central_pressure_GPa", s.centralGpa(), "GPa");
        t.row("cmb_pressure_GPa", s.cmbGpa(), "GPa");
        t.row("water_base_pressure_GPa", s.waterBaseGpa(), "GPa");
        t.row("mean_density_kg_m3", s.meanDensity(), "kg/m3");
        return t;
    }

    /** @param verdicts the planets' tests @return {@code planets.csv} */
    public static Table planets(final List<PlanetVerdict> verdicts) {
        Table t = Table.withColumns("planets.csv", PLANETS);
        for (PlanetVerdict v : verdicts) {
            String p = v.planet().planet();
            String s = v.planet().star();
            double m = v.planet().mass();
            double r = v.planet().radius();
            t.row(p, s, "mass", m, m - v.planet().massErr(), m + v.planet().massErr(), "M_earth");
            t.row(p, s, "radius", r, r - v.planet().radiusErr(), r + v.planet().radiusErr(), "R_earth");
            t.row(p, s, "core_mass_fraction_measured", v.measured().median(), v.measured().p16(), v.measured().p84(),
                    "mass fraction of rock");
            t.row(p, s, "core_mass_fraction_star", v.predicted()[0], v.predicted()[1], v.predicted()[2],
                    "mass fraction of rock");
            t.row(p, s, "core_mass_fraction_difference", v.differenceSigma(), null, null, "sigma");
            t.row(p, s, "agreement_probability", v.agreement(), null, null, "probability (two-sided)");
            t.row(p, s, "fraction_denser_than_iron", v.measured().denserThanIron(), null, null, "fraction of draws");
            t.row(p, s, "fraction_lighter_than_rock", v.measured().lighterThanRock(), null, null, "fraction of draws");
            t.row(p, s, "mantle_Mg_number_star", v.mantleMgNumber(), null, null, "100 Mg/(Mg+Fe) molar");
            t.row(p, s, "mantle_Mg_Si_star", v.mantleMgSi(), null, null, "mol/mol");
            t.row(p, s, "radius_star_prediction", v.radiusPredicted(), null, null, "R_earth");
            t.row(p, s, "radius_pure_rock", v.radiusPureRock(), null, null, "R_earth");
        }
        return t;
    }
}
