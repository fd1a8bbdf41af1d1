/** Locale-independent, deterministic text for numbers, shared by messages, CSV files and reports. */
package org.nebulith.format;
