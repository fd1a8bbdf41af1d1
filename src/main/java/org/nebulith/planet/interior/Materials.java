package org.nebulith.planet.interior;

/**
 * The published cold equations of state of the interior model, parameters beside their sources.
 * Values marked "from memory" were recalled and could not be checked against the paper here.
 *
 * <p>Mantle phases: Stixrude &amp; Lithgow-Bertelloni 2011 (Geophys. J. Int. 184, 1180), Table A1,
 * end-member reference volumes V0, K0 and K0' (their third-order finite-strain cold part, i.e.
 * {@link BirchMurnaghan3}); iron: Seager et al. 2007 (ApJ 669, 1279), Table 3, Vinet fit of
 * epsilon-iron (from Anderson et al. 2001), from memory; ice VII: Seager et al. 2007, Table 3,
 * third-order Birch-Murnaghan fit, from memory.
 */
public final class Materials {
    private static final double CM3 = 1e-6;
    private static final double GPA = 1e9;

    /** Molar masses [kg/mol] from IUPAC atomic weights (common practice). */
    static final double M_MGSIO3 = 0.100389;
    static final double M_MG2SIO4 = 0.140693;
    static final double M_MGO = 0.040304;
    static final double M_SIO2 = 0.060084;
    static final double M_FEO = 0.071844;
    static final double M_FE = 0.055845;
    static final double M_SI = 0.028086;
    static final double M_O = 0.015999;
    static final double M_FESI = M_FE + M_SI;
    /** Molar mass difference Fe - Mg [kg/mol]. */
    static final double DM_FE_MG = 0.055845 - 0.024305;

    /** epsilon-iron, Vinet: rho0 8300 kg/m3, K0 156.2 GPa, K0' 6.08 (Seager et al. 2007, Table 3; from memory). */
    public static final Vinet IRON = new Vinet("epsilon-Fe", 8300, 156.2 * GPA, 6.08);
    /** Wuestite FeO: V0 12.26 cm3/mol, K0 179 GPa, K0' 4.9 (Stixrude &amp; Lithgow-Bertelloni 2011). */
    public static final BirchMurnaghan3 WUESTITE = BirchMurnaghan3.ofMolarVolume("FeO", M_FEO, 12.26 * CM3,
            179 * GPA, 4.9);
    /** FeSi (B20): V0 13.6 cm3/mol, K0 185 GPa, K0' 4.0 (from memory; a stand-in for Si dissolved in iron). */
    public static final BirchMurnaghan3 IRON_SILICIDE = BirchMurnaghan3.ofMolarVolume("FeSi", M_FESI, 13.6 * CM3,
            185 * GPA, 4.0);
    /** MgSiO3 bridgmanite: V0 24.45 cm3/mol, K0 251 GPa, K0' 4.1 (Stixrude &amp; Lithgow-Bertelloni 2011). */
    public static final BirchMurnaghan3 BRIDGMANITE = BirchMurnaghan3.ofMolarVolume("MgSiO3 bridgmanite", M_MGSIO3,
            24.45 * CM3, 251 * GPA, 4.1);
    /** MgSiO3 post-bridgmanite: V0 24.42 cm3/mol, K0 231 GPa, K0' 4.0 (Stixrude &amp; Lithgow-Bertelloni 2011). */
    public static final BirchMurnaghan3 POST_BRIDGMANITE = BirchMurnaghan3.ofMolarVolume("MgSiO3 post-bridgmanite",
            M_MGSIO3, 24.42 * CM3, 231 * GPA, 4.0);
    /** Mg2SiO4 forsterite: V0 43.60 cm3/mol, K0 128 GPa, K0' 4.2 (Stixrude &amp; Lithgow-Bertelloni 2011). */
    public static final BirchMurnaghan3 FORSTERITE = BirchMurnaghan3.ofMolarVolume("Mg2SiO4 olivine", M_MG2SIO4,
            43.60 * CM3, 128 * GPA, 4.2);
    /** MgSiO3 enstatite (per MgSiO3): V0 62.68/2 cm3/mol, K0 107 GPa, K0' 7.0 (Stixrude &amp; Lithgow-Bertelloni 2011). */
    public static final BirchMurnaghan3 ENSTATITE = BirchMurnaghan3.ofMolarVolume("MgSiO3 orthopyroxene", M_MGSIO3,
            62.68 / 2 * CM3, 107 * GPA, 7.0);
    /** MgO periclase: V0 11.24 cm3/mol, K0 161 GPa, K0' 3.8 (Stixrude &amp; Lithgow-Bertelloni 2011). */
    public static final BirchMurnaghan3 PERICLASE = BirchMurnaghan3.ofMolarVolume("MgO periclase", M_MGO,
            11.24 * CM3, 161 * GPA, 3.8);
    /** SiO2 stishovite: V0 14.02 cm3/mol, K0 314 GPa, K0' 3.8 (Stixrude &amp; Lithgow-Bertelloni 2011). */
    public static final BirchMurnaghan3 STISHOVITE = BirchMurnaghan3.ofMolarVolume("SiO2 stishovite", M_SIO2,
            14.02 * CM3, 314 * GPA, 3.8);
    /** H2O ice VII: rho0 1460 kg/m3, K0 23.7 GPa, K0' 4.15 (Seager et al. 2007, Table 3; from memory). */
    public static final BirchMurnaghan3 ICE_VII = new BirchMurnaghan3("H2O ice VII", 1460, 23.7 * GPA, 4.15);

    /**
     * Pressure of the olivine-pyroxene to bridgmanite(+ferropericlase) change [Pa]: 23 GPa, the pressure
     * of Earth's 660-km discontinuity (common practice); the transition zone (wadsleyite, ringwoodite,
     * majorite) is not modelled apart.
     */
    public static final double UPPER_TO_LOWER_MANTLE_PA = 23 * GPA;
    /** Pressure of the bridgmanite to post-bridgmanite transition [Pa]: 125 GPa (Murakami et al. 2004, Science 304, 855; from memory). */
    public static final double POST_BRIDGMANITE_PA = 125 * GPA;

    private Materials() {
    }
}
