package dev.sigmawalk.reports.cli;

import dev.sigmawalk.engine.data.InputException;
import java.nio.file.Path;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code sigmawalk} command. Exit codes: 0 success; 2 bad command line, study file or input
 * data, or an environment fault (an output folder that cannot be written, a failed read or
 * write), each as one located line; 1 any other failure, as one line pointing at a log file
 * with the trace ({@link CrashLog}).
 */
@Command(name = "sigmawalk",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Walk-forward comparison of covariance estimates for portfolio construction.",
        subcommands = {RunCommand.class, WatchCommand.class, DemoCommand.class, CheckCommand.class, SweepCommand.class})
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

    /** Builds the configured command line (used by {@link #main} and by tests), logging failures in the standard place. */
    public static CommandLine commandLine() {
        return commandLine(CrashLog.standard(System.getenv()));
    }

    /** Builds the command line with failure traces written to the given log. */
    static CommandLine commandLine(CrashLog log) {
        CommandLine cl = new CommandLine(new SigmawalkCommand());
        cl.registerConverter(Path.class, SigmawalkCommand::path);
        cl.addSubcommand("help", new CommandLine.HelpCommand());
        CommandHelp.addToEverySubcommand(cl);
        cl.setExitCodeExceptionMapper(SigmawalkCommand::exitCodeFor);
        cl.setExecutionExceptionHandler(new FailureHandler(log));
        return cl;
    }

    /**
     * An empty argument would name the working folder, so {@code --out "$OUT"} with the variable
     * unset (and {@code --force}) would write there; it is refused instead.
     */
    private static Path path(String text) {
        if (text.isBlank()) {
            throw new CommandLine.TypeConversionException("'" + text + "' is an empty path; expected the name of a file"
                    + " or folder (is a variable in the command empty?)");
        }
        return Path.of(text);
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
        CrashLog log = CrashLog.standard(System.getenv());
        int code;
        try {
            code = commandLine(log).execute(args);
        } catch (Throwable t) {
            // An Error (out of memory, a missing class) passes picocli's handler: still one line and a log file.
            String where = log.write(t, java.util.List.of(args), java.time.Instant.now())
                    .map(p -> "; the details are in " + p).orElse("");
            System.err.println("sigmawalk: failed: " + t + where);
            code = EXIT_FAILURE;
        }
        System.exit(code);
    }
}
