package org.twinorbit.harness;

import picocli.CommandLine;

/** Entry point of the {@code twinorbit} command line. */
public final class Main {

    private Main() {}

    public static void main(String[] args) {
        System.exit(TwinorbitCommand.commandLine().execute(args));
    }
}
