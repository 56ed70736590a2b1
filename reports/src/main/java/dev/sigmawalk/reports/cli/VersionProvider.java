package dev.sigmawalk.reports.cli;

import picocli.CommandLine;

/** Reads the version from the jar manifest; "development" when run from classes. */
public final class VersionProvider implements CommandLine.IVersionProvider {
    /** The tool's version, as written into manifests. */
    public static String version() {
        String v = SigmawalkCommand.class.getPackage().getImplementationVersion();
        return v == null ? "development" : v;
    }

    @Override
    public String[] getVersion() {
        return new String[] {"sigmawalk " + version()};
    }
}
