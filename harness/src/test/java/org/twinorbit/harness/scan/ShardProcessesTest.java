package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.harness.TestCommandLine;

/**
 * A scan run the way a job array runs it: three separate JVM processes sharing only the output
 * folder, then merged; the merged files are byte for byte those of one run. One shard is killed
 * after its first saved point and resumed before the merge.
 */
class ShardProcessesTest {

    private static final List<String> SCAN = List.of("scan", "--field", "gradient", "--points", "9", "--phases", "2",
            "--duration", "40", "-q", "--threads", "1");

    /** {@code java -cp <this test's class path> org.twinorbit.harness.Main ARGS}, output to a log file. */
    private static Process start(Path log, List<String> args) throws IOException {
        List<String> cmd = new ArrayList<>();
        cmd.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        cmd.add("-cp");
        cmd.add(System.getProperty("java.class.path"));
        cmd.add("org.twinorbit.harness.Main");
        cmd.addAll(args);
        return new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(log.toFile()).start();
    }

    private static List<String> shardArgs(Path out, int i, String... more) {
        List<String> a = new ArrayList<>(SCAN);
        a.addAll(List.of("--shard", i + "/3", "--out", out.toString()));
        a.addAll(List.of(more));
        return a;
    }

    private static void finish(Process p, Path log) throws Exception {
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "shard did not finish");
        assertEquals(0, p.exitValue(), Files.readString(log, StandardCharsets.UTF_8));
    }

    private static void sameFiles(Path one, Path merged) throws IOException {
        for (String f : List.of("scan.json", "scan.csv", "scan.md", "scan.png")) {
            assertArrayEquals(Files.readAllBytes(one.resolve(f)), Files.readAllBytes(merged.resolve(f)), f);
        }
    }

    @Test
    void threeProcessesMergeIntoTheSingleRunAndAKilledShardResumes(@TempDir Path dir) throws Exception {
        Path sharded = dir.resolve("sharded");
        Path killed = dir.resolve("killed");
        // first the one to kill: shard 1 of the same scan in its own --out
        Path partial = killed.resolve("shard-1-of-3").resolve(ScanCheckpoint.FILE_NAME);
        Process victim = start(dir.resolve("victim"), shardArgs(killed, 1));
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
        while (!Files.exists(partial) && victim.isAlive() && System.nanoTime() < deadline) {
            Thread.sleep(5);
        }
        victim.destroyForcibly().waitFor();
        assertTrue(Files.exists(partial), "killed before its first saved point: " + Files.readString(dir.resolve("victim")));
        assertFalse(Files.exists(killed.resolve("shard-1-of-3").resolve(ShardFile.FILE_NAME)),
                "the shard finished before it was killed");
        int saved = ScanJson.MAPPER.readTree(partial.toFile()).get("points").size();
        assertTrue(saved >= 1 && saved < 3, saved + " points saved");

        List<Process> shards = new ArrayList<>();
        for (int i = 0; i < 3; i++) {
            shards.add(start(dir.resolve("log" + i), shardArgs(sharded, i)));
        }
        Path one = dir.resolve("one");
        List<String> single = new ArrayList<>(SCAN);
        single.addAll(List.of("--out", one.toString()));
        TestCommandLine.succeeded(single.toArray(String[]::new));

        for (int i = 0; i < 3; i++) {
            finish(shards.get(i), dir.resolve("log" + i));
        }
        TestCommandLine.succeeded("merge", "--out", sharded.toString());
        sameFiles(one, sharded);

        // the killed shard beside the two finished ones of the first run: refused until resumed
        for (int i : new int[] {0, 2}) {
            ShardMergeTest.copyTree(sharded.resolve("shard-" + i + "-of-3"), killed.resolve("shard-" + i + "-of-3"));
        }
        TestCommandLine.Outcome early = TestCommandLine.exec("merge", "--out", killed.toString());
        assertEquals(2, early.code(), early.err());
        assertTrue(early.err().contains("unfinished shard(s) 1"), early.err());
        Process resumed = start(dir.resolve("resumed"), shardArgs(killed, 1, "--resume"));
        finish(resumed, dir.resolve("resumed"));
        TestCommandLine.succeeded("merge", "--out", killed.toString());
        sameFiles(one, killed);
    }
}
