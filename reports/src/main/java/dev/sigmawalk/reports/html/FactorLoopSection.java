package dev.sigmawalk.reports.html;

import java.util.List;
import java.util.Objects;

/**
 * The report section that closes the loop from the single-index diagnostics to the factor models
 * (Method §11): for each sector whose residuals the single index left co-moving, the residual
 * co-movement left under each factor model, and beside it what the strategies built on each
 * model did out of sample. Rendered by {@code section-factor-loop.mustache}.
 *
 * @param answer the one-paragraph answer
 * @param sectorHeaders headers of the sector table
 * @param sectorRows one row per co-moving sector (empty when the single index left none)
 * @param modelHeaders headers of the model table
 * @param modelRows one row per strategy under the single-index or a factor model
 * @param notes how to read the tables
 */
public record FactorLoopSection(String answer, List<String> sectorHeaders, List<ReportView.TextRow> sectorRows,
                                List<String> modelHeaders, List<ModelRow> modelRows, List<String> notes) {
    public FactorLoopSection {
        Objects.requireNonNull(answer, "answer");
        sectorHeaders = List.copyOf(sectorHeaders);
        sectorRows = List.copyOf(sectorRows);
        modelHeaders = List.copyOf(modelHeaders);
        modelRows = List.copyOf(modelRows);
        notes = List.copyOf(notes);
    }

    /** Whether the sector table has rows (the template shows it only then). */
    public boolean hasSectors() {
        return !sectorRows.isEmpty();
    }

    /**
     * One strategy's row: its model's residual diagnostics and its out-of-sample record.
     *
     * @param name the strategy
     * @param cssClass its family's class (colour swatch)
     * @param cells model, mean |ρ|, LM_adj rejections, volatility, turnover, bias, variance test
     */
    public record ModelRow(String name, String cssClass, List<String> cells) {
        public ModelRow {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(cssClass, "cssClass");
            cells = List.copyOf(cells);
        }
    }
}
