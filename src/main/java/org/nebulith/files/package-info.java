/**
 * File primitives of every output: atomic files and run folders ({@link org.nebulith.files.AtomicOutput},
 * {@link org.nebulith.files.RunFolder}), their checks before computing ({@code OutputChecks}), one writer
 * per output ({@link org.nebulith.files.OutputLock}), the marker of a finished run that {@code --force} may
 * replace ({@link org.nebulith.files.RunMarker}), write failures named by the final path
 * ({@link org.nebulith.files.OutputWriteException}), input checksums, UTF-8 check and protection
 * ({@link org.nebulith.files.RunInputs}, {@link org.nebulith.files.PathIdentity}), in-memory tables and
 * deterministic CSV ({@link org.nebulith.files.Table}, {@link org.nebulith.files.CsvTableWriter},
 * {@link org.nebulith.files.CellText}). No physics here, and nothing above the message catalogue.
 */
package org.nebulith.files;
