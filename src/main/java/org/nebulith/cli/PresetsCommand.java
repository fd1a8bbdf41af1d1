package org.nebulith.cli;

import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** Lists the run-settings presets found in the preset folders. */
@Command(mixinStandardHelpOptions = true, versionProvider = ToolVersion.class, name = "presets",
        description = {
            "List the run-settings presets: name, command, description.",
            "Files NAME" + PresetLocator.EXTENSION + " in presets/ or in the folders of NEBULITH_PRESETS;",
            "use one with '--preset NAME'.",
        })
final class PresetsCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Override
    public Integer call() {
        NebulithCommand root = (NebulithCommand) spec.root().userObject();
        Map<String, Path> found = PresetLocator.available(PresetLocator.defaultFolders());
        if (found.isEmpty()) {
            root.err().println("no presets found in " + PresetLocator.defaultFolders());
        }
        for (Map.Entry<String, Path> entry : found.entrySet()) {
            PresetFile preset = PresetFile.read(entry.getValue());
            String command = preset.get(PresetFile.COMMAND).map(PresetFile.Entry::value).orElse("any");
            root.out().println(entry.getKey() + "  [" + command + "]  " + preset.description());
        }
        root.out().flush();
        return ExitCodes.OK;
    }
}
