package dev.sigmawalk.reports.cli;

import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;

/**
 * Gives every subcommand {@code -h/--help} and {@code -V/--version} (usage on standard output,
 * exit 0) and a footer that points at the study format, so a first-time user is never left with
 * an "unknown option" for asking for help.
 */
final class CommandHelp {
    /** Where the study file's keys are written out; printed under every subcommand's usage. */
    static final String STUDY_FORMAT = "%nStudy file format: the README's section \"A study file\" lists every key "
            + "with its allowed values; paths are relative to the study file. `sigmawalk check STUDY.yaml` "
            + "validates a study and prints every default it applied, without running it.%n"
            + "Exit codes: 0 success; 2 bad command line, study file or data file; 1 anything else.";

    private CommandHelp() {
    }

    /** Adds the help options and the footer to every subcommand registered so far. */
    static void addToEverySubcommand(CommandLine top) {
        top.getCommandSpec().usageMessage().footer(STUDY_FORMAT);
        for (CommandLine sub : top.getSubcommands().values()) {
            CommandSpec spec = sub.getCommandSpec();
            if (spec.userObject() instanceof CommandLine.HelpCommand) {
                continue;
            }
            spec.mixinStandardHelpOptions(true);
            spec.versionProvider(new VersionProvider());
            spec.usageMessage().footer(STUDY_FORMAT);
        }
    }
}
