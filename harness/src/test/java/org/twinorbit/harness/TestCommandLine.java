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
}
