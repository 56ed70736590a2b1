package dev.sigmawalk.reports.files;

import java.util.Set;

/**
 * The names {@code sigmawalk run} writes into an output folder: the files of the output
 * contract, the marker, and everything under its {@code charts/} folder. An input file with one
 * of these names must never be where a run writes.
 */
public final class OutputNames {
    private static final Set<String> FILES = Set.of("returns.csv", "rebalances.csv", "weights.csv", "summary.csv",
            "diagnostics.csv", "factor_diagnostics.csv", "sector_correlations.csv", "estimates.csv", "tests.csv", "manifest.json", "report.html",
            "report.pdf", OutputFolder.MARKER);
    private static final Set<String> FOLDERS = Set.of("charts");

    private OutputNames() {
    }

    /** Every file name sigmawalk writes at the top of its folder, the marker included. */
    static Set<String> files() {
        return FILES;
    }

    /** Every folder name sigmawalk writes into. */
    static Set<String> folders() {
        return FOLDERS;
    }

    /** Whether a file of this name (no folder part) is one sigmawalk writes at the top of its folder. */
    public static boolean isOutputFile(String name) {
        return FILES.contains(name);
    }

    /** Whether a folder of this name is one sigmawalk writes into. */
    public static boolean isOutputFolder(String name) {
        return FOLDERS.contains(name);
    }
}
