package dev.sigmawalk.reports.html;

import java.time.Instant;
import java.time.LocalDate;
import java.util.List;
import java.util.Objects;

/**
 * Facts about a run that the results themselves do not carry. The out-of-sample period, the
 * windows, the cost and the failed solves are taken from the study and the run result, so they
 * cannot disagree with the numbers in the report.
 *
 * @param toolVersion the tool's version string
 * @param inputs every input file with its fingerprint, in the order read
 * @param dataFirst first date of the asset data
 * @param dataLast last date of the asset data, not before {@code dataFirst}
 * @param assets number of assets in the data, >= 1
 * @param started when the run started
 * @param finished when the run finished, not before {@code started}
 * @param warnings warnings raised while reading the data or running, as plain text
 */
public record RunRecord(String toolVersion, List<InputFile> inputs, LocalDate dataFirst, LocalDate dataLast,
                        int assets, Instant started, Instant finished, List<String> warnings) {
    public RunRecord {
        Objects.requireNonNull(toolVersion, "toolVersion");
        inputs = List.copyOf(inputs);
        Objects.requireNonNull(dataFirst, "dataFirst");
        Objects.requireNonNull(dataLast, "dataLast");
        Objects.requireNonNull(started, "started");
        Objects.requireNonNull(finished, "finished");
        warnings = List.copyOf(warnings);
        if (dataLast.isBefore(dataFirst)) {
            throw new IllegalArgumentException("data range " + dataFirst + " to " + dataLast + " must not end before it starts");
        }
        if (!(assets >= 1)) {
            throw new IllegalArgumentException("assets (" + assets + ") must be >= 1");
        }
        if (finished.isBefore(started)) {
            throw new IllegalArgumentException("run finished (" + finished + ") before it started (" + started + ")");
        }
    }
}
