package org.twinorbit.harness.scan;

import java.io.PrintWriter;
import java.nio.file.Path;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code twinorbit merge}: joins the shards of a scan or safe-use map ({@code scan --shard I/K})
 * into the files a single run writes (ShardMerge).
 */
@Command(name = "merge", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Join the K shards of a scan or safe-use map (each run with 'scan ... --shard I/K --out DIR') "
                + "into exactly the files one run of the same command writes into DIR: scan.md/.csv/.json/.png or "
                + "safe-use.md/.csv/.json/.png. Refuses, writing nothing, shards of different options or builds, and "
                + "names missing, unfinished or duplicated shards.")
public final class MergeCommand implements Runnable {

    @Option(names = "--out", required = true, paramLabel = "DIR",
            description = "The directory the shards were given as --out (it holds shard-I-of-K folders).")
    Path out;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        if (out.toString().isBlank()) {
            throw new IllegalArgumentException("--out: give the directory the shards wrote into");
        }
        ShardMerge.Merged m = ShardMerge.merge(out);
        PrintWriter w = spec.commandLine().getOut();
        if (m.scan() != null) {
            ScanCommand.printSummary(w, m.scan());
        }
        w.printf("merged %d shards: wrote %s/%s%n", m.shards(), out, String.join(", ", m.files()));
        w.flush();
    }
}
