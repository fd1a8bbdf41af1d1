package org.nebulith.files;

import java.io.Closeable;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;


import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * Writes CSV with a fixed column order: RFC 4180 quoting (commons-csv default), {@code \n} line
 * ends, a header row, numbers by {@link CellText} (shortest round-trip decimal, never NaN or
 * infinity). Rows can be streamed one at a time so that memory stays constant for long tables.
 * Every row is formatted completely before any of it is written.
 */
public final class CsvTableWriter implements Closeable {

    /** The CSV dialect of every Nebulith output. */
    public static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get();

    private final String table;
    private final List<String> columns;
    private final CSVPrinter printer;
    private long rowsWritten;

    private CsvTableWriter(final Writer out, final String table, final List<String> columns) throws IOException {
        this.table = table;
        this.columns = List.copyOf(columns);
        this.printer = new CSVPrinter(out, FORMAT);
        printer.printRecord(this.columns);
    }

    /**
     * Starts a table and writes its header.
     *
     * @param out     destination (closed by {@link #close()})
     * @param table   table name for messages, normally the file name
     * @param columns column names in order
     * @return the writer
     */
    public static CsvTableWriter open(final Writer out, final String table, final String... columns) {
        try {
            return new CsvTableWriter(out, table, Arrays.asList(columns));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Writes one row.
     *
     * @param cells one value per column
     * @return this
     */
    public CsvTableWriter row(final Object... cells) {
        return row(Arrays.asList(cells));
    }

    /**
     * Writes one row.
     *
     * @param cells one value per column
     * @return this
     */
    public CsvTableWriter row(final List<?> cells) {
        if (cells.size() != columns.size()) {
            throw new IllegalArgumentException(table + ": row " + (rowsWritten + 1) + " has " + cells.size()
                    + " cells for " + columns.size() + " columns " + columns);
        }
        List<String> text = new ArrayList<>(cells.size());
        for (int i = 0; i < cells.size(); i++) {
            text.add(CellText.of(cells.get(i), table, columns.get(i), rowsWritten + 1));
        }
        try {
            printer.printRecord(text);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        rowsWritten++;
        return this;
    }

    /** @return the number of data rows written */
    public long rowsWritten() {
        return rowsWritten;
    }

    @Override
    public void close() {
        try {
            printer.close(true);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * @param table a table
     * @return its CSV text
     */
    public static String toCsv(final Table table) {
        StringWriter text = new StringWriter();
        write(table, text);
        return text.toString();
    }

    /**
     * Writes a whole table.
     *
     * @param table the table
     * @param out   destination (closed)
     */
    public static void write(final Table table, final Writer out) {
        try (CsvTableWriter writer = open(out, table.name(), table.columns().toArray(String[]::new))) {
            for (List<Object> row : table.rows()) {
                writer.row(row);
            }
        }
    }
}
