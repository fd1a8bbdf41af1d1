package org.nebulith.files;

import org.nebulith.errors.Messages;
import org.nebulith.errors.NumericalException;
import org.nebulith.format.Decimal;

/**
 * Turns a table cell into text, the same way for CSV files and for report tables: doubles and
 * floats by {@link Decimal#format(double)} (shortest round-trip, {@code Locale.ROOT}), integers
 * as written, null as an empty cell. A NaN or an infinity is refused with a
 * {@link NumericalException} naming the table, column and row: it means an upstream result was
 * unusable, and must not reach a file.
 */
public final class CellText {

    private CellText() {
    }

    /**
     * @param value  the cell
     * @param table  table name, for the message
     * @param column column name, for the message
     * @param row    1-based data row, for the message
     * @return the cell's text
     */
    public static String of(final Object value, final String table, final String column, final long row) {
        if (value == null) {
            return "";
        }
        if (value instanceof Double || value instanceof Float) {
            double x = ((Number) value).doubleValue();
            if (!Double.isFinite(x)) {
                throw new NumericalException(Messages.NON_FINITE_OUTPUT, null, table, column, row, value);
            }
            return Decimal.format(x);
        }
        if (value instanceof Number || value instanceof Boolean || value instanceof CharSequence
                || value instanceof Enum<?>) {
            return value.toString();
        }
        throw new IllegalArgumentException(table + ": column " + column + ": unsupported cell type "
                + value.getClass().getName());
    }

    /**
     * The cell as people read it (report tables and summaries): temperatures (columns ending in
     * {@code _K}) to 0.1 K, other floating-point numbers to four significant figures, the rest as
     * {@link #of}.
     *
     * @param value  the cell
     * @param table  table name, for the message
     * @param column column name
     * @param row    1-based data row
     * @return the cell's text
     */
    public static String forPeople(final Object value, final String table, final String column, final long row) {
        if (value instanceof Double || value instanceof Float) {
            double x = ((Number) value).doubleValue();
            if (!Double.isFinite(x)) {
                throw new NumericalException(Messages.NON_FINITE_OUTPUT, null, table, column, row, value);
            }
            return column.endsWith("_K") ? Decimal.kelvin(x) : Decimal.forPeople(x);
        }
        return of(value, table, column, row);
    }
}
