package org.twinorbit.harness.scan;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;

/**
 * The options of a sharded command as its shards record them ({@link ShardFile}): those that can
 * change a result, as given, sorted by option name (a repeated option keeps its order), so that
 * shards run with the same options in another order agree, and {@code merge} can parse them again.
 */
public final class RecordedOptions {

    /** Options that do not change any result: left out of what shards record and compare. */
    private static final Set<String> NOT_RECORDED = Set.of("--shard", "--out", "--resume", "--threads", "--quiet",
            "--help", "--version");

    private RecordedOptions() {}

    /** The recorded options of the command line {@code spec} parsed. */
    public static List<String> of(CommandSpec spec) {
        List<OptionSpec> matched = new ArrayList<>(spec.commandLine().getParseResult().matchedOptions());
        matched.sort(Comparator.comparing(OptionSpec::longestName));
        List<String> args = new ArrayList<>();
        for (OptionSpec o : matched) {
            if (NOT_RECORDED.contains(o.longestName())) {
                continue;
            }
            if (o.arity().max() == 0) {
                args.add(o.longestName());
                continue;
            }
            for (String v : o.originalStringValues()) {
                args.add(o.longestName());
                args.add(v);
            }
        }
        return args;
    }
}
