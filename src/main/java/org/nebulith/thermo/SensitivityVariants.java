package org.nebulith.thermo;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * Sensitivity variants that are not a family of alternative rows (those are the {@code name/TAG} rows of
 * {@link DataSet#withVariant}), each keeping a documented alternative of the data so that a result can be
 * checked against it (thermodynamic sources README, section 9):
 * <ul>
 * <li>{@value #TROILITE_DS62}: the ds62 troilite row (Holland &amp; Powell 2011) instead of the NASA FeS
 *     entries FeS(a), FeS(b), FeS(c), FeS(L) (S T50 656 K instead of 634 K at 1e-4 bar);</li>
 * <li>{@value #ALOH_JANAF}: the AlOH gas with the enthalpy of formation usually quoted from the JANAF
 *     tables, {@value #ALOH_JANAF_HF_J_PER_MOL} J/mol, instead of the NASA (Gurvich) value of about -193
 *     kJ/mol; heat capacity and entropy unchanged. The value is from memory (README 9), not read in the
 *     tables: use it as a sensitivity bound, not as a correction.</li>
 * </ul>
 */
public final class SensitivityVariants {
    /** ds62 troilite instead of the NASA FeS entries. */
    public static final String TROILITE_DS62 = "troilite-ds62";
    /** JANAF-like AlOH gas. */
    public static final String ALOH_JANAF = "AlOH-JANAF";
    /** Enthalpy of formation of AlOH gas in that variant [J/mol] (from memory, thermo-sources README 9). */
    public static final double ALOH_JANAF_HF_J_PER_MOL = -180000;
    /** The variant names. */
    public static final Set<String> NAMES = Set.of(TROILITE_DS62, ALOH_JANAF);

    private static final List<String> NASA_FES = List.of("FeS(a)", "FeS(b)", "FeS(c)", "FeS(L)");
    private static final double T_REF = 298.15;

    private SensitivityVariants() {
    }

    /**
     * @param selected the species of a data set
     * @param database the database they come from
     * @param name     a name of {@link #NAMES}
     * @return the species with the variant applied
     * @throws IllegalArgumentException if the variant does not apply to the selection
     */
    static List<Species> apply(List<Species> selected, SpeciesDatabase database, String name) {
        List<Species> out = new ArrayList<>();
        boolean applied = false;
        for (Species s : selected) {
            if (name.equals(TROILITE_DS62) && NASA_FES.contains(s.id())) {
                applied = true;
            } else if (name.equals(ALOH_JANAF) && s.isGas() && s.id().equals("ALOH")) {
                out.add(shifted(s, ALOH_JANAF_HF_J_PER_MOL - s.thermo().hJPerMol(T_REF), name));
                applied = true;
            } else {
                out.add(s);
            }
        }
        if (name.equals(TROILITE_DS62) && applied) {
            out.add(database.get("troilite"));
        }
        if (!applied) {
            throw new IllegalArgumentException("variant '" + name + "' does not apply: the selection has no "
                    + (name.equals(ALOH_JANAF) ? "ALOH gas" : "NASA FeS entries"));
        }
        return out;
    }

    private static Species shifted(Species s, double dH, String variant) {
        ThermoModel m = s.thermo();
        ThermoModel shiftedModel = new ThermoModel() {
            @Override public double tMinK() { return m.tMinK(); }
            @Override public double tMaxK() { return m.tMaxK(); }
            @Override public double usableMinK() { return m.usableMinK(); }
            @Override public double usableMaxK() { return m.usableMaxK(); }
            @Override public double cpOverR(double t) { return m.cpOverR(t); }
            @Override public double hOverRT(double t) { return m.hOverRT(t) + dH / (R * t); }
            @Override public double sOverR(double t) { return m.sOverR(t); }
        };
        return new Species(s.id(), s.state(), s.formula(), s.source(), s.sourceRow() + " shifted by "
                + Math.round(dH) + " J/mol (variant " + variant + ")", s.role(), shiftedModel, s.variant());
    }
}
