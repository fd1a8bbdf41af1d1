package org.nebulith.cli;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * Lists every named input: compositions, disks, feeding-zone files, catalogues and run settings,
 * one line each (kind, name, where it comes from, description). Working-folder copies hide the
 * built-in ones of the same name.
 */
@Command(mixinStandardHelpOptions = true, versionProvider = ToolVersion.class, name = "presets",
        description = {
            "List the named inputs: compositions, disks, zone files, catalogues, planets,",
            "settings.",
            "One line each: kind, name, source (built-in or the file), description. A name is",
            "read from the working folder (presets/, feeding-zones/) first, then from the",
            "copy built into the program; settings also from the folders of NEBULITH_PRESETS.",
            "Use them as --composition NAME, --disk NAME, --zones NAME, --preset NAME.",
        })
final class PresetsCommand implements Callable<Integer> {
    /** Longest description shown [characters]. */
    private static final int DESCRIPTION_WIDTH = 80;

    @Spec
    private CommandSpec spec;

    private int sourceWidth = 8;
    private int nameWidth = 23;

    @Override
    public Integer call() {
        NebulithCommand root = (NebulithCommand) spec.root().userObject();
        PrintStream out = root.out();
        List<PresetCatalogue.Entry> all = PresetCatalogue.here().all();
        nameWidth = all.stream().mapToInt(e -> e.name().length()).max().orElse(23);
        sourceWidth = all.stream().mapToInt(e -> e.builtIn() ? 8 : e.shown().length()).max().orElse(8);
        for (Map.Entry<String, Path> extra : PresetLocator.available(PresetLocator.environmentFolders()).entrySet()) {
            print(out, PresetCatalogue.Kind.SETTINGS.label(), extra.getKey(), extra.getValue().toString(),
                    settingsText(PresetFile.read(extra.getValue())));
        }
        for (PresetCatalogue.Entry e : all) {
            String text = e.description();
            if (e.kind() == PresetCatalogue.Kind.SETTINGS) {
                PresetFile p = e.builtIn() ? PresetFile.builtIn(e) : PresetFile.read(e.file());
                text = settingsText(p);
            }
            print(out, e.kind().label(), e.name(), e.builtIn() ? "built-in" : e.shown(), text);
        }
        out.flush();
        return ExitCodes.OK;
    }

    private static String settingsText(final PresetFile p) {
        String command = p.get(PresetFile.COMMAND).map(PresetFile.Entry::value).orElse("any command");
        return "[" + command + "] " + p.description();
    }

    private void print(final PrintStream out, final String kind, final String name, final String from,
                              final String text) {
        String shortText = text.length() > DESCRIPTION_WIDTH ? text.substring(0, DESCRIPTION_WIDTH - 3) + "..." : text;
        out.println(String.format(Locale.ROOT, "%-11s  %-" + Math.max(nameWidth, name.length()) + "s  %-" + Math.max(sourceWidth, from.length()) + "s  %s", kind,
                name, from, shortText).stripTrailing());
    }
}
