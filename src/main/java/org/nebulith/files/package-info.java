/**
 * File primitives of every output: atomic files and run folders ({@link org.nebulith.files.AtomicOutput},
 * {@link org.nebulith.files.RunFolder}), input checksums and protection ({@link org.nebulith.files.RunInputs},
 * {@link org.nebulith.files.PathIdentity}), in-memory tables and deterministic CSV
 * ({@link org.nebulith.files.Table}, {@link org.nebulith.files.CsvTableWriter},
 * {@link org.nebulith.files.CellText}). No physics here, and nothing above the message catalogue.
 */
package org.nebulith.files;
