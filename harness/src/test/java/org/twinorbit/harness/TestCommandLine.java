package org.twinorbit.harness;

import java.io.PrintWriter;
import java.io.StringWriter;
import picocli.CommandLine;

/** Runs the command line in-process for tests, capturing the exit code and both streams. */
public final class TestCommandLine {

    private TestCommandLine() {}

    /** Exit code, stdout and stderr of one invocation. */
    public record Outcome(int code, String out, String err) {}

    public static Outcome exec(String... args) {
        CommandLine cl = TwinorbitCommand.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new Outcome(code, out.toString(), err.toString());
    }

    /** Stdout of an invocation that must succeed (exit 0), its stderr in the failure message. */
    public static String succeeded(String... args) {
        Outcome o = exec(args);
        if (o.code() != 0) {
            throw new AssertionError("exit " + o.code() + " from " + String.join(" ", args) + ": " + o.err());
        }
        return o.out();
    }
}
