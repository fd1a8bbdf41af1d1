/**
 * The {@code nebulith} command line (picocli): the top-level command, global options, exit codes,
 * presets, progress and the plumbing every sub-command shares ({@link org.nebulith.cli.RunCommand},
 * {@link org.nebulith.cli.RunContext}). Depends on every other package; nothing depends on it.
 */
package org.nebulith.cli;
