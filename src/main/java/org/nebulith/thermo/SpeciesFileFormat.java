package org.nebulith.thermo;

import java.util.List;

/**
 * The project's species file: RFC-4180 CSV with {@code #} comment lines at the top. A comment line
 * {@code # source KEY: citation} declares a publication; every row's {@code source} must be a
 * declared key. Columns, in this order:
 * <pre>
 * id,state,formula,source,source_row,role,variant,form,T_min_K,T_max_K,params
 * </pre>
 * <ul>
 * <li>{@code id}: unique; a {@code nasa9} species spans consecutive rows with the same id, one per
 *     temperature interval, lowest first;</li>
 * <li>{@code state}: {@code gas|solid|liquid}; {@code formula}: {@code Mg:2 Si:1 O:4};</li>
 * <li>{@code source_row}: where the row is in the source (file and line);</li>
 * <li>{@code role}: {@code primary|alternative|extra}; {@code variant}: tag of an alternative row
 *     (empty for primary rows);</li>
 * <li>{@code form}: {@code nasa9} (params = a1..a7 b1 b2, space-separated, NASA TP-2002-211556
 *     eqs. 1-3) or a mineral form {@code hp|berman|rh95|maier-kelley} (params = {@code key=value;...},
 *     see {@link org.nebulith.thermo.mineral.MineralParameters});</li>
 * <li>{@code T_min_K}, {@code T_max_K}: data range of the row [K]; {@code T_max_K} may be empty for
 *     mineral rows whose source states no upper limit.</li>
 * </ul>
 */
public final class SpeciesFileFormat {
    /** The header columns in order. */
    public static final List<String> COLUMNS = List.of("id", "state", "formula", "source", "source_row", "role",
            "variant", "form", "T_min_K", "T_max_K", "params");
    /** Form code of NASA 9-coefficient rows. */
    public static final String NASA9 = "nasa9";
    /** Prefix of a comment line declaring a source key. */
    public static final String SOURCE_DECLARATION = "# source ";
    /** Accepted roles. */
    public static final List<String> ROLES = List.of("primary", "alternative", "extra");

    private SpeciesFileFormat() {
    }
}
