package org.nebulith.cli;

import java.nio.file.Path;

/** Where a command writes, as its options say: --out, --run-name, --force (each may be absent). */
interface OutputTarget {

    /** A command that writes no file (bench): no output options. */
    OutputTarget NONE = new OutputTarget() {
    };

    /** @return the --out value, or null */
    default Path out() {
        return null;
    }

    /** @return the --run-name value, or null */
    default String runName() {
        return null;
    }

    /** @return whether existing outputs may be replaced */
    default boolean force() {
        return false;
    }
}
