package dev.sigmawalk.engine.study;

import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * A study file as read and validated.
 *
 * @param file the study file itself (absolute)
 * @param title free text shown in the report
 * @param data where the data are
 * @param walkForward windows, rebalance rule, dates, costs
 * @param strategies at least one, names unique
 * @param evidence settings of the significance tests
 * @param output output folder, resolved against the study file's folder
 * @param report how the report is laid out
 */
public record Study(Path file, String title, DataSpec data, WalkForwardSpec walkForward,
                    List<StrategySpec> strategies, EvidenceSpec evidence, Path output, ReportSpec report) {
    public Study {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(data, "data");
        Objects.requireNonNull(walkForward, "walkForward");
        strategies = List.copyOf(strategies);
        Objects.requireNonNull(evidence, "evidence");
        Objects.requireNonNull(output, "output");
        Objects.requireNonNull(report, "report");
        if (strategies.isEmpty()) {
            throw new IllegalArgumentException("strategies must list at least one strategy");
        }
        Set<String> names = new HashSet<>();
        for (StrategySpec s : strategies) {
            if (!names.add(s.name())) {
                throw new IllegalArgumentException("strategy name '" + s.name() + "' is used twice");
            }
            if ("market".equals(s.name())) {
                throw new IllegalArgumentException("strategy name 'market' is reserved for the benchmark");
            }
        }
    }

    /** A study whose report takes the default layout. */
    public Study(Path file, String title, DataSpec data, WalkForwardSpec walkForward, List<StrategySpec> strategies,
                 EvidenceSpec evidence, Path output) {
        this(file, title, data, walkForward, strategies, evidence, output, ReportSpec.defaults());
    }
}
