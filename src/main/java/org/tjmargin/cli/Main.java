package org.tjmargin.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code tjmargin} command and its entry point. */
@Command(name = "tjmargin", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Junction temperature, derating and surge margins of Zener and TVS diodes on boards in hot "
            + "enclosures.", "",
            "Exit status: 0 every position passes its policy; 1 a position violates it; 2 invalid input; "
                + "3 the solver could not reach an answer it can stand behind."},
        subcommands = {AnalyseCommand.class, ProfilesCommand.class, CheckProfileCommand.class,
            CommandLine.HelpCommand.class})
public final class Main implements Runnable {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** Builds the command line with its exit-code handling; used by {@link #main} and by tests. */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new Main());
        cl.setExecutionExceptionHandler((ex, line, parsed) -> {
            line.getErr().println("tjmargin: internal error: " + ex);
            return ExitCodes.UNRESOLVED;
        });
        return cl;
    }

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Runs the command and exits with its status. */
    public static void main(String[] args) {
        System.setProperty("java.awt.headless", "true");
        System.exit(commandLine().execute(args));
    }
}
