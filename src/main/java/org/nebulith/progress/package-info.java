/**
 * Progress reporting for long tasks, independent of how it is shown: a terminal bar with ETA
 * (only when a person watches a terminal), plain lines for logs, or nothing.
 */
package org.nebulith.progress;
