package org.twinorbit.harness;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import picocli.CommandLine;

/**
 * Every command's --help wraps between words only: a file name such as scan.json, a number such
 * as 1e-3 or a list such as mass,charge is never split across two lines.
 */
class HelpWrapTest {

    /** A width at which nothing wraps, so every word shows whole. */
    private static final int UNWRAPPED = 1000;

    @ParameterizedTest
    @ValueSource(ints = {80, 120})
    void noWordIsSplitAcrossLines(int width) {
        List<String> problems = new ArrayList<>();
        for (String command : commands()) {
            Set<String> words = words(help(command, UNWRAPPED));
            for (String w : words(help(command, width))) {
                if (!words.contains(w)) {
                    problems.add(command + ": '" + w + "'");
                }
            }
            for (String line : help(command, width).split("\n")) {
                if (line.length() > width) {
                    problems.add(command + ": line longer than " + width + ": " + line);
                }
            }
        }
        assertTrue(problems.isEmpty(), "pieces of split words at width " + width + ": " + problems);
    }

    /** The top-level command and each subcommand (help's own help included). */
    private static List<String> commands() {
        List<String> names = new ArrayList<>();
        names.add("");
        names.addAll(TwinorbitCommand.commandLine().getSubcommands().keySet());
        return names;
    }

    private static String help(String command, int width) {
        CommandLine root = TwinorbitCommand.commandLine();
        root.setUsageHelpWidth(width);
        CommandLine cl = command.isEmpty() ? root : root.getSubcommands().get(command);
        return cl.getUsageMessage(CommandLine.Help.Ansi.OFF);
    }

    private static Set<String> words(String text) {
        return new HashSet<>(Arrays.asList(text.trim().split("\\s+")));
    }
}
