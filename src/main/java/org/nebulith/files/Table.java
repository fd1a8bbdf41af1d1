package org.nebulith.files;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;

/**
 * A small in-memory table with a fixed column order: what a report shows and what
 * {@link CsvTableWriter} writes. Cells are {@link Number}s, strings, booleans or null (an empty
 * cell). Column names carry their unit ({@code T_K}, {@code P_bar}, {@code r_AU}).
 */
public final class Table {

    private final String name;
    private final List<String> columns;
    private final List<List<Object>> rows = new ArrayList<>();

    private Table(final String name, final List<String> columns) {
        if (columns.isEmpty()) {
            throw new IllegalArgumentException("a table needs at least one column");
        }
        if (columns.size() != columns.stream().distinct().count()) {
            throw new IllegalArgumentException("duplicate column names in " + columns);
        }
        this.name = name;
        this.columns = List.copyOf(columns);
    }

    /**
     * @param name    the table's name, used in messages (e.g. the CSV file name)
     * @param columns the column names, in output order
     * @return an empty table
     */
    public static Table withColumns(final String name, final String... columns) {
        return new Table(name, Arrays.asList(columns));
    }

    /**
     * @param name    the table's name
     * @param columns the column names, in output order
     * @return an empty table
     */
    public static Table withColumns(final String name, final List<String> columns) {
        return new Table(name, columns);
    }

    /**
     * Appends a row.
     *
     * @param cells one value per column
     * @return this
     * @throws IllegalArgumentException if the number of cells differs from the number of columns
     */
    public Table row(final Object... cells) {
        return row(Arrays.asList(cells));
    }

    /**
     * Appends a row.
     *
     * @param cells one value per column
     * @return this
     */
    public Table row(final List<?> cells) {
        if (cells.size() != columns.size()) {
            throw new IllegalArgumentException(name + ": row " + (rows.size() + 1) + " has " + cells.size()
                    + " cells for " + columns.size() + " columns " + columns);
        }
        rows.add(Collections.unmodifiableList(new ArrayList<>(cells)));
        return this;
    }

    /** @return the table's name */
    public String name() {
        return name;
    }

    /** @return the column names in order */
    public List<String> columns() {
        return columns;
    }

    /** @return the rows (unmodifiable) */
    public List<List<Object>> rows() {
        return Collections.unmodifiableList(rows);
    }
}
