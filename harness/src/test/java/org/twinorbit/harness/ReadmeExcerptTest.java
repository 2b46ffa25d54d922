package org.twinorbit.harness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.twinorbit.harness.report.ResultTables;
import org.twinorbit.harness.suite.ValidationReport;
import picocli.CommandLine;

/**
 * The README's excerpts stay in step with the code: every command line it shows parses with the
 * current options (nothing renamed or removed behind its back), and the headings of the tables it
 * shows are the headings the code prints (derived: the README shows real output).
 */
class ReadmeExcerptTest {

    private static final String PROMPT = "$ java -jar harness/target/twinorbit.jar ";

    private static List<String> readme() throws IOException {
        return Files.readAllLines(Path.of("..", "README.md"));
    }

    /** The README's command lines, continuation lines joined, pipes and "..." cut off. */
    static List<String[]> commands(List<String> lines) {
        List<String[]> out = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            String l = lines.get(i).trim();
            if (!l.startsWith(PROMPT)) {
                continue;
            }
            StringBuilder cmd = new StringBuilder(l.substring(PROMPT.length()));
            while (cmd.toString().endsWith("\\") && i + 1 < lines.size()) {
                cmd.setLength(cmd.length() - 1);
                cmd.append(' ').append(lines.get(++i).trim());
            }
            String c = cmd.toString();
            for (String cut : new String[] {" |", " ...", "; echo"}) {
                int k = c.indexOf(cut);
                if (k >= 0) {
                    c = c.substring(0, k);
                }
            }
            out.add(c.trim().split("\\s+"));
        }
        return out;
    }

    @Test
    void everyCommandLineShownParses() throws IOException {
        List<String[]> cmds = commands(readme());
        assertTrue(cmds.size() >= 10, "found " + cmds.size() + " command lines");
        for (String[] args : cmds) {
            CommandLine cl = TwinorbitCommand.commandLine();
            try {
                cl.parseArgs(args);
            } catch (CommandLine.ParameterException e) {
                throw new AssertionError("README command no longer parses: " + String.join(" ", args) + ": "
                        + e.getMessage(), e);
            }
        }
    }

    @Test
    void theRunTableHeadingIsTheOneTheCodePrints() throws IOException {
        List<String> heading = new ArrayList<>(ResultTables.HEADER);
        String shown = readme().stream().map(String::trim).filter(l -> l.startsWith("integrator ") && l.contains("error kind"))
                .findFirst().orElseThrow();
        for (String column : heading) {
            assertTrue(shown.contains(column), "README run table lacks the column '" + column + "': " + shown);
        }
        assertFalse(Arrays.asList(shown.split("\\s{2,}")).contains("not ok"), shown);
        assertEquals(heading.get(0), shown.split("\\s+")[0]);
    }

    @Test
    void theGridStudyHeadingsAreTheOnesTheCodePrints() throws IOException {
        List<String> lines = readme().stream().map(String::trim).toList();
        for (List<String> heading : List.of(org.twinorbit.harness.gridstudy.GridStudyTables.HEADER,
                org.twinorbit.harness.gridstudy.GridStudyTables.ANSWER_HEADER,
                org.twinorbit.harness.gridstudy.GridStudyTables.EPS_HEADER)) {
            String shown = lines.stream().filter(l -> l.startsWith("metric ") && l.contains(heading.get(1)))
                    .findFirst().orElseThrow(() -> new AssertionError("README shows no table headed " + heading));
            assertEquals(heading, Arrays.asList(shown.split("\\s{2,}")), shown);
        }
    }

    @Test
    void theSuiteOverviewHeadingIsTheOneTheCodePrints() throws IOException {
        String shown = readme().stream().map(String::trim).filter(l -> l.startsWith("case ") && l.contains("species"))
                .findFirst().orElseThrow();
        List<String> columns = Arrays.asList(shown.split("\\s{2,}"));
        assertEquals(ValidationReport.OVERVIEW_HEADER, columns, "README suite overview heading");
    }
}
