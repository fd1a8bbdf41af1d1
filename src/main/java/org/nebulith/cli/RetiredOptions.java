package org.nebulith.cli;

import java.util.List;
import java.util.Optional;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;

/**
 * Options that were renamed. No alias is kept: an old name is refused before any work, with a
 * one-line hint naming the option to use instead (exit code 2).
 */
final class RetiredOptions {

    /**
     * One renamed option.
     *
     * @param old     the old long name, with dashes
     * @param now     the option to use, with its parameter label
     * @param meaning what the new option means, in a few words
     */
    record Renamed(String old, String now, String meaning) {
        /** @return the preset key of the old name (no dashes) */
        String key() {
            return old.substring(2);
        }
    }

    /** Every renamed option. */
    static final List<Renamed> ALL = List.of(
            new Renamed("--isolation", "--removal-fraction F",
                    "fraction of each step's new condensate withdrawn from further reaction; 0 = equilibrium, "
                            + "1 = fractional"));

    private RetiredOptions() {
    }

    /**
     * @param args the command-line arguments
     * @return the failure for the first old option name among them, if any
     */
    static Optional<InputException> check(final List<String> args) {
        for (String arg : args) {
            if (arg.equals("--")) {
                break;
            }
            for (Renamed r : ALL) {
                if (arg.equals(r.old()) || arg.startsWith(r.old() + "=")) {
                    return Optional.of(failure(r));
                }
            }
        }
        return Optional.empty();
    }

    /**
     * @param key a preset key (an option name without dashes)
     * @return the renamed option with that old key, if any
     */
    static Optional<Renamed> byKey(final String key) {
        return ALL.stream().filter(r -> r.key().equals(key)).findFirst();
    }

    /** @param r the renamed option @return the one-line failure */
    static InputException failure(final Renamed r) {
        return new InputException(Messages.RENAMED_OPTION, null, r.old(), r.now(), r.meaning());
    }
}
