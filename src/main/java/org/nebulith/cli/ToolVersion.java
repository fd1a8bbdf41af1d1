package org.nebulith.cli;

import picocli.CommandLine;

/** The tool version: {@code Implementation-Version} of the jar manifest, or {@code dev} when run from classes. */
public final class ToolVersion implements CommandLine.IVersionProvider {

    /** @return the version text, e.g. {@code 0.1.0} or {@code dev} */
    public static String get() {
        String version = ToolVersion.class.getPackage().getImplementationVersion();
        return version == null || version.isBlank() ? "dev" : version;
    }

    @Override
    public String[] getVersion() {
        return new String[] {
            "nebulith " + get(),
            "Java " + System.getProperty("java.version") + " (" + System.getProperty("java.vendor") + ")",
        };
    }
}
