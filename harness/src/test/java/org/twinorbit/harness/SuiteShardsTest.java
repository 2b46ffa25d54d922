package org.twinorbit.harness;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code suite --quick} cut into 3 shards (in-process) and merged: the same bytes as one run, the
 * same exit code (1: the explicit-Euler test pusher fails its stability verdicts), a shard that
 * lost a case resumes, and merge refuses what does not fit before writing anything.
 */
class SuiteShardsTest {

    // boris, and explicit Euler, which gains energy every step (common practice): a failing verdict
    private static final String[] SUITE = {"suite", "--quick", "--pushers", "boris,test-euler", "-q", "--threads", "2"};

    private static String[] with(String... more) {
        String[] all = java.util.Arrays.copyOf(SUITE, SUITE.length + more.length);
        System.arraycopy(more, 0, all, SUITE.length, more.length);
        return all;
    }

    private static List<String> files(Path dir) throws IOException {
        try (Stream<Path> s = Files.walk(dir)) {
            return s.filter(Files::isRegularFile).map(p -> dir.relativize(p).toString())
                    .filter(n -> !n.startsWith("shard-") && !n.equals("timings.md")).sorted().toList();
        }
    }

    private static void sameFiles(Path one, Path merged) throws IOException {
        List<String> names = files(one);
        assertEquals(names, files(merged));
        assertTrue(names.contains("validation.json") && names.stream().anyMatch(n -> n.endsWith(".png")), names.toString());
        for (String f : names) {
            assertArrayEquals(Files.readAllBytes(one.resolve(f)), Files.readAllBytes(merged.resolve(f)), f);
        }
    }

    private static void copyTree(Path from, Path to) throws IOException {
        try (Stream<Path> s = Files.walk(from)) {
            for (Path p : s.toList()) {
                Path t = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(t);
                } else {
                    Files.copy(p, t, StandardCopyOption.REPLACE_EXISTING);
                }
            }
        }
    }

    private static void refused(Path out, String... says) {
        TestCommandLine.Outcome o = TestCommandLine.exec("merge", "--out", out.toString());
        assertEquals(2, o.code(), o.out() + o.err());
        for (String s : says) {
            assertTrue(o.err().contains(s), "says '" + s + "': " + o.err());
        }
        assertFalse(Files.exists(out.resolve("validation.json")), "wrote a result");
        assertFalse(Files.exists(out.resolve("plots")), "wrote plots");
    }

    private static Path someCase(Path shard) throws IOException {
        try (Stream<Path> s = Files.list(shard.resolve("cases"))) {
            return s.sorted().findFirst().orElseThrow();
        }
    }

    @Test
    void threeShardsMergeIntoTheSingleRunResumeAndRefuseWhatDoesNotFit(@TempDir Path dir) throws IOException {
        Path one = dir.resolve("one");
        TestCommandLine.Outcome single = TestCommandLine.exec(with("--out", one.toString()));
        assertEquals(1, single.code(), single.err());

        Path sharded = dir.resolve("sharded");
        List<String> said = new ArrayList<>();
        for (int i = 0; i < 3; i++) {
            said.add(TestCommandLine.succeeded(with("--shard", i + "/3", "--out", sharded.toString())));
        }
        assertTrue(said.get(0).contains("when every shard is done: twinorbit merge"), said.get(0));
        Path[] shards = new Path[3];
        int cases = 0;
        for (int i = 0; i < 3; i++) {
            shards[i] = sharded.resolve("shard-" + i + "-of-3");
            try (Stream<Path> s = Files.list(shards[i].resolve("cases"))) {
                long n = s.count();
                assertTrue(n >= 1, "every shard has a case");
                cases += (int) n;
            }
        }
        // as many as the quick suite has (13 since solovev joined the suite), each in exactly one shard
        int quickCases = org.twinorbit.harness.suite.ValidationSuite.cases(true).size();
        assertEquals(quickCases, cases, "the quick suite's cases, each in one shard");
        assertFalse(Files.exists(sharded.resolve("validation.json")), "a shard writes only into its folder");

        // the refusals, on copies, before the merge: nothing written
        Path missing = dir.resolve("missing");
        copyTree(shards[0], missing.resolve("shard-0-of-3"));
        copyTree(shards[2], missing.resolve("shard-2-of-3"));
        refused(missing, "missing shard(s) 1");

        Path unfinished = dir.resolve("unfinished");
        copyTree(sharded, unfinished);
        Files.delete(unfinished.resolve("shard-1-of-3").resolve("shard.json"));
        refused(unfinished, "unfinished shard(s) 1", "--resume");

        Path twice = dir.resolve("twice");
        copyTree(sharded, twice);
        Path c = someCase(shards[0]);
        Files.copy(c, twice.resolve("shard-1-of-3").resolve("cases").resolve(c.getFileName()));
        refused(twice, "shards 0 and 1 both hold case " + c.getFileName().toString().replace(".json", ""));

        Path lost = dir.resolve("lost");
        copyTree(sharded, lost);
        Files.delete(lost.resolve("shard-2-of-3").resolve("cases").resolve(someCase(shards[2]).getFileName()));
        refused(lost, "no shard holds case", "(shard 2 by the cut)");

        Path damaged = dir.resolve("damaged");
        copyTree(sharded, damaged);
        Path d = damaged.resolve("shard-1-of-3").resolve("cases").resolve(someCase(shards[1]).getFileName());
        Files.writeString(d, Files.readString(d).replace("\"csv\"", "\"cvs\""));
        refused(damaged, "merge: the case", "'csv' is missing");

        Path other = dir.resolve("other");
        copyTree(sharded, other);
        Path s1 = other.resolve("shard-1-of-3").resolve("shard.json");
        Files.writeString(s1, Files.readString(s1).replace("boris,test-euler", "boris"));
        refused(other, "different settings", "shard 1: suite --pushers boris");

        // the merge: one run's bytes and exit code, the verdicts printed as suite prints them
        TestCommandLine.Outcome merged = TestCommandLine.exec("merge", "--out", sharded.toString());
        assertEquals(1, merged.code(), merged.err());
        assertTrue(merged.out().contains("merged 3 shards: " + quickCases + " cases") && merged.out().contains("rows FAIL"), merged.out());
        sameFiles(one, sharded);

        // a shard that lost a case (killed before it was saved) resumes with it alone
        Path resumed = dir.resolve("resumed");
        copyTree(sharded, resumed);
        Files.delete(resumed.resolve("shard-2-of-3").resolve("shard.json"));
        Files.delete(resumed.resolve("shard-2-of-3").resolve("cases").resolve(someCase(shards[2]).getFileName()));
        for (String f : List.of("validation.json", "validation.csv", "validation.md")) {
            Files.delete(resumed.resolve(f));
        }
        org.twinorbit.harness.scan.SafeUseMap.deleteTree(resumed.resolve("plots"));
        String again = TestCommandLine.succeeded(with("--shard", "2/3", "--resume", "--out", resumed.toString()));
        assertTrue(again.contains("resumed)"), again);
        String done = TestCommandLine.succeeded(with("--shard", "0/3", "--resume", "--out", resumed.toString()));
        assertTrue(done.contains("nothing to resume"), done);
        assertEquals(1, TestCommandLine.exec("merge", "--out", resumed.toString()).code());
        sameFiles(one, resumed);

        TestCommandLine.Outcome alone = TestCommandLine.exec(with("--resume", "--out", dir.resolve("x").toString()));
        assertEquals(2, alone.code());
        assertTrue(alone.err().contains("--resume: only with --shard"), alone.err());
    }
}
