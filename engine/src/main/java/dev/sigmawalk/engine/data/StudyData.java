package dev.sigmawalk.engine.data;

import dev.sigmawalk.engine.study.FactorSource;
import dev.sigmawalk.engine.study.StrategySpec;
import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.engine.timeline.Schedule;
import java.nio.file.Path;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * Everything a study reads from disk, validated (Method §1, CONTRACT "Study file").
 *
 * @param panel the returns, first row = first return row, cut at {@code walkforward.end}
 * @param schedule the rebalance rows planned on {@code panel} (Method §2)
 * @param periodsPerYearInferred whether periods per year came from the dates' spacing
 * @param sectors asset to sector for assets of the panel that the sectors file lists (empty map
 *        without {@code data.sectors}), in panel order
 * @param alphas one table per alpha file named by a strategy, keyed by its resolved path
 * @param factors one table per factor file named by a multi-index strategy, keyed by its resolved
 *        path, aligned to the panel's rows (Method §11)
 * @param fingerprints every input file read, in reading order, for the run manifest
 * @param warnings problems that did not stop the load, in the order found
 * @param coverage per asset of the panel: first and last dates with a return, missing rows
 */
public record StudyData(ReturnPanel panel, Schedule schedule, boolean periodsPerYearInferred,
                        Map<String, String> sectors, Map<Path, AlphaTable> alphas, Map<Path, FactorTable> factors,
                        List<FileFingerprint> fingerprints, List<String> warnings, List<AssetCoverage> coverage) {
    public StudyData {
        Objects.requireNonNull(panel, "panel");
        Objects.requireNonNull(schedule, "schedule");
        sectors = Collections.unmodifiableMap(new LinkedHashMap<>(sectors));
        alphas = Map.copyOf(alphas);
        factors = Map.copyOf(factors);
        fingerprints = List.copyOf(fingerprints);
        warnings = List.copyOf(warnings);
        coverage = List.copyOf(coverage);
    }

    /**
     * Reads and validates the study's data files.
     *
     * @throws InputException naming file, line, column and value of the first problem found
     */
    public static StudyData load(Study study) {
        return new StudyDataLoader(study).load();
    }

    /**
     * The factor table of a strategy's {@code factors: FILE}.
     *
     * @throws IllegalArgumentException when the file was not read with this study
     */
    public FactorTable factorsFor(FactorSource.File source) {
        FactorTable t = factors.get(source.path());
        if (t == null) {
            throw new IllegalArgumentException("factor file " + source.path() + " was not read with this study");
        }
        return t;
    }

    /** The alphas of a strategy's {@code alphas:} file, or the empty table (0 everywhere) without one. */
    public AlphaTable alphasFor(StrategySpec strategy) {
        return strategy.alphas().map(alphas::get).orElse(AlphaTable.empty());
    }
}
