package dev.sigmawalk.reports.cli;

import dev.sigmawalk.engine.data.InputException;
import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code sigmawalk} command. Exit codes (CONTRACT): 0 success; 2 bad command line, study file
 * or input data; 1 any other failure.
 */
@Command(name = "sigmawalk",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Walk-forward comparison of covariance estimates for portfolio construction.",
        subcommands = {RunCommand.class, DemoCommand.class, CheckCommand.class, SweepCommand.class})
public final class SigmawalkCommand implements Runnable {

    /** Exit code for bad input of any kind. */
    public static final int EXIT_BAD_INPUT = 2;
    /** Exit code for any other failure. */
    public static final int EXIT_FAILURE = 1;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Builds the configured command line (used by {@link #main} and by tests). */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new SigmawalkCommand());
        cl.addSubcommand("help", new CommandLine.HelpCommand());
        CommandHelp.addToEverySubcommand(cl);
        cl.setExitCodeExceptionMapper(SigmawalkCommand::exitCodeFor);
        cl.setExecutionExceptionHandler((ex, cmd, parseResult) -> {
            PrintWriter err = cmd.getErr();
            if (ex instanceof InputException) {
                err.println("sigmawalk: " + ex.getMessage());
            } else {
                err.println("sigmawalk: failed: " + ex);
                ex.printStackTrace(err);
            }
            err.flush();
            return exitCodeFor(ex);
        });
        return cl;
    }

    private static int exitCodeFor(Throwable ex) {
        if (ex instanceof InputException || ex instanceof CommandLine.ParameterException) {
            return EXIT_BAD_INPUT;
        }
        return EXIT_FAILURE;
    }

    public static void main(String[] args) {
        // Charts are drawn off-screen; set before any AWT class loads so no display is needed.
        System.setProperty("java.awt.headless", "true");
        CommandLine cl = commandLine();
        int code = cl.execute(args);
        System.exit(code);
    }
}
