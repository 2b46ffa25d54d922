package org.twinorbit.harness;

import picocli.CommandLine;

/**
 * Turns a user's mistake found while a command runs (an unknown field parameter, a value out of
 * range) into a one-line message and exit code 2, never a stack trace. Anything else is a bug
 * and keeps its stack trace.
 */
final class UserErrorHandler implements CommandLine.IExecutionExceptionHandler {

    /** Exit code for bad input (docs/design.md "Command line"). */
    static final int BAD_INPUT = 2;

    @Override
    public int handleExecutionException(Exception ex, CommandLine cl, CommandLine.ParseResult parsed)
            throws Exception {
        if (ex instanceof IllegalArgumentException || ex instanceof BadInputException) {
            cl.getErr().println("twinorbit: " + ex.getMessage());
            return BAD_INPUT;
        }
        throw ex;
    }
}
