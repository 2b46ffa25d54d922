package org.twinorbit.harness.scan;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.harness.TestCommandLine;

/** Sharded scans in-process: the cut, a merge equal to one run, and every refusal of merge. */
class ShardMergeTest {

    private static final String[] SCAN = {"scan", "--field", "gradient", "--points", "4", "--phases", "1",
        "--duration", "5", "-q", "--threads", "1"};

    private static String[] args(String[] base, String... more) {
        String[] all = Arrays.copyOf(base, base.length + more.length);
        System.arraycopy(more, 0, all, base.length, more.length);
        return all;
    }

    private static void shard(Path out, int i, int k, String... more) {
        TestCommandLine.succeeded(args(args(SCAN, "--shard", i + "/" + k, "--out", out.toString()), more));
    }

    private static TestCommandLine.Outcome merge(Path out) {
        return TestCommandLine.exec("merge", "--out", out.toString());
    }

    private static void refused(Path out, String... says) {
        TestCommandLine.Outcome o = merge(out);
        assertEquals(2, o.code(), o.out() + o.err());
        for (String s : says) {
            assertTrue(o.err().contains(s), "says '" + s + "': " + o.err());
        }
        assertFalse(Files.exists(out.resolve("scan.json")), "wrote a result");
    }

    /**
     * Longest-processing-time-first (Graham 1969): the largest part stays within 4/3 of the best
     * possible, here bounded below by max(total/K, largest unit); costs that differ by 100× (1/ε over
     * an ε range of 100, as bounce-counted points do) are split far better than by counts.
     */
    @Test
    void theCutBalancesEstimatedCost() {
        double[] eps = EpsilonGrid.logSpaced(3e-3, 0.3, 16);
        double[] cost = Arrays.stream(eps).map(e -> 1 / e).toArray();
        for (int k : new int[] {2, 3, 5}) {
            int[] part = Shard.cut(cost, k);
            assertArrayEquals(part, Shard.cut(cost.clone(), k), "deterministic");
            double[] load = new double[k];
            double[] byCount = new double[k];
            for (int i = 0; i < cost.length; i++) {
                load[part[i]] += cost[i];
                byCount[i * k / cost.length] += cost[i]; // consecutive blocks of equal counts
            }
            double total = Arrays.stream(cost).sum();
            double bound = Math.max(total / k, Arrays.stream(cost).max().orElseThrow());
            double largest = Arrays.stream(load).max().orElseThrow();
            assertTrue(largest <= 4.0 / 3 * bound, k + " parts: " + Arrays.toString(load));
            assertTrue(largest < Arrays.stream(byCount).max().orElseThrow(), "better than equal counts");
        }
    }

    @Test
    void badShardOptionIsRefused(@TempDir Path dir) {
        for (String bad : new String[] {"3/3", "1", "-1/2", "a/b", "0/0"}) {
            TestCommandLine.Outcome o = TestCommandLine.exec(args(SCAN, "--shard", bad, "--out", dir.toString()));
            assertEquals(2, o.code(), bad + ": " + o.err());
            assertTrue(o.err().contains("--shard"), o.err());
        }
    }

    @Test
    void mergedShardsEqualOneRunAndRefuseWhatDoesNotFit(@TempDir Path dir) throws IOException {
        Path one = dir.resolve("one");
        TestCommandLine.succeeded(args(SCAN, "--out", one.toString()));
        Path out = dir.resolve("sharded");
        refused(out, "is not a directory holding shard folders");

        shard(out, 0, 3);
        shard(out, 2, 3);
        refused(out, "missing shard(s) 1");

        Files.createDirectories(out.resolve("shard-1-of-3"));
        refused(out, "unfinished shard(s) 1", "--resume --shard I/3");
        Files.delete(out.resolve("shard-1-of-3"));

        // shard 1 with other options: named with its options beside shard 0's
        shard(out, 1, 3, "--pitch", "80");
        refused(out, "different settings", "shard 0: scan --duration 5 --field gradient --phases 1 --points 4",
                "shard 1: scan --duration 5 --field gradient --phases 1 --pitch 80 --points 4");
        deleteTree(out.resolve("shard-1-of-3"));
        // options in another order, and threads, do not matter
        TestCommandLine.succeeded("scan", "--threads", "2", "--out", out.toString(), "--shard", "1/3", "--phases", "1",
                "--points", "4", "--field", "gradient", "--duration", "5", "-q");

        copyTree(out.resolve("shard-0-of-3"), out.resolve("shard-00-of-3"));
        refused(out, "shard 0 given twice (shard-0-of-3, shard-00-of-3)");
        deleteTree(out.resolve("shard-00-of-3"));

        Files.createDirectories(out.resolve("shard-0-of-2"));
        refused(out, "cut 2 and 3 ways");
        Files.delete(out.resolve("shard-0-of-2"));

        Path file2 = out.resolve("shard-2-of-3").resolve(ShardFile.FILE_NAME);
        String good = Files.readString(file2);
        ObjectNode root = (ObjectNode) ScanJson.MAPPER.readTree(good);
        ((ObjectNode) root.get("tool")).put("version", "0.0.9");
        Files.writeString(file2, ScanJson.write(root));
        refused(out, "different builds", "shard 2: twinorbit 0.0.9");
        Files.writeString(file2, good);

        // a finished scan of other settings in --out is not replaced
        Path other = dir.resolve("other");
        TestCommandLine.succeeded(args(SCAN, "--out", other.toString(), "--pitch", "80"));
        Files.copy(other.resolve("scan.json"), out.resolve("scan.json"));
        TestCommandLine.Outcome o = merge(out);
        assertEquals(2, o.code(), o.err());
        assertTrue(o.err().contains("already holds a finished scan of other settings"), o.err());
        Files.delete(out.resolve("scan.json"));

        TestCommandLine.Outcome ok = merge(out);
        assertEquals(0, ok.code(), ok.err());
        assertTrue(ok.out().contains("merged 3 shards"), ok.out());
        for (String f : new String[] {"scan.json", "scan.csv", "scan.md", "scan.png"}) {
            assertArrayEquals(Files.readAllBytes(one.resolve(f)), Files.readAllBytes(out.resolve(f)), f);
        }
        // --resume on a finished shard does nothing
        TestCommandLine.Outcome again = TestCommandLine.exec(args(SCAN, "--shard", "0/3", "--out", out.toString(),
                "--resume"));
        assertEquals(0, again.code(), again.err());
        assertTrue(again.out().contains("is finished"), again.out());
    }

    static void deleteTree(Path dir) {
        SafeUseMap.deleteTree(dir);
    }

    static void copyTree(Path from, Path to) throws IOException {
        try (Stream<Path> walk = Files.walk(from)) {
            for (Path p : walk.toList()) {
                Files.copy(p, to.resolve(from.relativize(p).toString()));
            }
        }
    }
}
