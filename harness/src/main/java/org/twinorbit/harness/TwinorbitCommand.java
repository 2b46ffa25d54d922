package org.twinorbit.harness;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The top-level command: only subcommands do work. */
@Command(name = "twinorbit",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Runs the same charged particles as full orbits and as guiding centers through the same "
                + "fields, and measures how well each integrator and each model keeps the physics.",
        subcommands = {FieldsCommand.class, ProbeCommand.class, IntegratorsCommand.class, RunCommand.class, SuiteCommand.class,
            org.twinorbit.harness.scan.ScanCommand.class, MergeCommand.class, BaselineCommand.class, CheckCommand.class,
            ExportCommand.class, ScoreCommand.class, PrecisionCommand.class, GridCommand.class, GridStudyCommand.class,
            GeqdskCommand.class,
            CommandLine.HelpCommand.class})
public final class TwinorbitCommand implements Runnable {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(), "name a command (see --help)");
    }

    /** The configured command line; tests run commands through this, in-process. */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new TwinorbitCommand());
        cl.setExecutionExceptionHandler(new UserErrorHandler());
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.setHelpFactory(WordWrapHelp::new);
        // everything after the baseline's COMMAND belongs to that command, options included
        cl.getSubcommands().get("baseline").setStopAtPositional(true);
        // help goes to stdout, usage errors to stderr: colours only when both are terminals
        boolean colour = Terminal.isTerminal(Terminal.STDOUT) && Terminal.isTerminal(Terminal.STDERR);
        cl.setColorScheme(CommandLine.Help.defaultColorScheme(colour ? CommandLine.Help.Ansi.AUTO
                : CommandLine.Help.Ansi.OFF));
        return cl;
    }
}
