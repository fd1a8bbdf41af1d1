/**
 * Nebulith's few unchecked exception types and their one message catalogue, {@link org.nebulith.errors.Messages}.
 * {@link org.nebulith.errors.InputException} is bad user input (exit code 2),
 * {@link org.nebulith.errors.NumericalException} a numerical failure naming T, P and composition (exit code 3),
 * {@link org.nebulith.errors.InternalException} a bug (exit code 1). The mapping to exit codes lives in the
 * command line, not here.
 */
package org.nebulith.errors;
