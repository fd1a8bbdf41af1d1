/**
 * The redrawn terminal progress bar (me.tongfei progressbar) and the choice of display for a mode:
 * command-line only, left out of the library jar.
 */
package org.nebulith.progress.terminal;
