package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.Consumer;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A damaged partial-results file is refused on {@code --resume} with a message that names the file
 * and the defect (exit 2 at the command line), never taken up with gaps or a stack trace.
 */
class DamagedCheckpointTest {

    @TempDir
    Path dir;
    private Path file;

    /** A valid checkpoint of the synthetic scan, with three points. */
    @BeforeEach
    void saveThreePoints() {
        BreakdownScan s = BreakdownScanResumeTest.scan();
        ScanCheckpoint cp = ScanCheckpoint.open(dir, s, false);
        for (int i = 0; i < 3; i++) {
            double e = s.eps()[i];
            double p = s.pitches().get(0);
            cp.add(new ScanPoint(e, 1.0, p, BreakdownScanResumeTest.synthetic(e, 1.0, p)));
        }
        file = dir.resolve(ScanCheckpoint.FILE_NAME);
        assertEquals(3, ScanCheckpoint.open(dir, s, true).size(), "the undamaged file resumes");
    }

    private void edit(Consumer<ObjectNode> change) throws IOException {
        ObjectNode root = (ObjectNode) ScanJson.MAPPER.readTree(file.toFile());
        change.accept(root);
        Files.writeString(file, ScanJson.write(root));
    }

    private static ObjectNode point(ObjectNode root, int i) {
        return (ObjectNode) root.get("points").get(i);
    }

    /** Resuming must fail with a message naming the file and containing {@code defect}. */
    private void refused(String defect) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ScanCheckpoint.open(dir, BreakdownScanResumeTest.scan(), true));
        assertTrue(e.getMessage().startsWith("--resume"), e.getMessage());
        assertTrue(e.getMessage().contains(file.toString()), "names the file: " + e.getMessage());
        assertTrue(e.getMessage().contains(defect), "says '" + defect + "': " + e.getMessage());
        assertFalse(e.getMessage().contains("saved: null"), e.getMessage());
    }

    @Test
    void pointsAsAnObject() throws IOException {
        edit(root -> root.set("points", root.get("points").get(0)));
        refused("'points' is an object, not an array");
    }

    @Test
    void pointsMissing() throws IOException {
        edit(root -> root.remove("points"));
        refused("'points' is missing");
    }

    @Test
    void pointWithoutEps() throws IOException {
        edit(root -> point(root, 1).remove("eps"));
        refused("point 2 of 3 has no 'eps'");
    }

    @Test
    void pointWithoutTheMetricTheThresholdsRead() throws IOException {
        edit(root -> point(root, 2).remove(ScanMetric.MU_JUMP.worstKey()));
        refused("has no 'mu_jump_worst'");
    }

    @Test
    void pointMissingAMetricTheOthersHave() throws IOException {
        edit(root -> point(root, 1).remove(ScanMetric.MU_JUMP.meanKey()));
        refused("point 2 of 3 has the metrics");
    }

    @Test
    void wrongTypes() throws IOException {
        edit(root -> point(root, 0).put("eps", "0.001"));
        refused("has 'eps' = \"0.001\", not a finite number");
        saveThreePoints();
        edit(root -> point(root, 0).put(ScanMetric.DRIFT_ERROR.worstKey(), "large"));
        refused("'drift_error_worst' = \"large\": not a number");
        saveThreePoints();
        edit(root -> ((ArrayNode) root.get("points")).set(1, ScanJson.MAPPER.getNodeFactory().textNode("x")));
        refused("point 2 of 3 is a string, not an object");
    }

    @Test
    void pointOffTheGridOrRepeated() throws IOException {
        edit(root -> point(root, 0).put("eps", 0.5));
        refused("not on the scan's grid");
        saveThreePoints();
        edit(root -> ((ArrayNode) root.get("points")).add(point(root, 0).deepCopy()));
        refused("point 4 of 4 repeats");
    }

    @Test
    void emptyFile() throws IOException {
        Files.writeString(file, "");
        refused("empty file");
        Files.writeString(file, "{}");
        refused("no 'scan' object");
    }

    @Test
    void truncatedJson() throws IOException {
        String text = Files.readString(file);
        Files.writeString(file, text.substring(0, text.length() / 2));
        refused("not valid JSON at line");
    }

    @Test
    void notAnObject() throws IOException {
        Files.writeString(file, "[1, 2]\n");
        refused("holds an array, not a JSON object");
    }

    @Test
    void nullAndInfinityAreValidValues() throws IOException {
        edit(root -> {
            point(root, 0).putNull(ScanMetric.DRIFT_ERROR.meanKey());
            point(root, 1).put(ScanMetric.POSITION_ERROR.worstKey(), "inf");
        });
        JsonNode unchanged = ScanJson.MAPPER.readTree(file.toFile());
        assertEquals(3, ScanCheckpoint.open(dir, BreakdownScanResumeTest.scan(), true).size(), unchanged.toString());
    }
}
