package dev.sigmawalk.strategies;

import dev.sigmawalk.engine.data.StudyData;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.run.WindowProbe;
import dev.sigmawalk.engine.study.StrategySpec;
import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.strategies.risk.FactorDiagnostics;
import dev.sigmawalk.strategies.risk.FactorResiduals;
import dev.sigmawalk.strategies.risk.RiskModel;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The residual diagnostics of every factor model a study uses (Method §11), at every window the
 * engine builds: one {@link FactorDiagnostics} per distinct model (by its name with setting, in
 * study order) that the window supports. Stateless, so windows of different lengths may share it.
 */
public final class FactorDiagnosticsProbe implements WindowProbe<List<FactorDiagnostics>> {
    private final Map<String, RiskModel> models;
    private final Map<String, String> sectors;

    private FactorDiagnosticsProbe(Map<String, RiskModel> models, Map<String, String> sectors) {
        this.models = models;
        this.sectors = Map.copyOf(sectors);
    }

    /** The study's multi-index and principal-components models, once each. */
    public static FactorDiagnosticsProbe of(Study study, StudyData data) {
        Map<String, RiskModel> models = new LinkedHashMap<>();
        for (StrategySpec s : study.strategies()) {
            RiskModel model = RiskModel.of(s, data.sectors(), data::factorsFor);
            if (FactorResiduals.applies(model)) {
                models.putIfAbsent(s.riskModelName(), model);
            }
        }
        return new FactorDiagnosticsProbe(models, data.sectors());
    }

    /** Whether the study has any factor model to diagnose. */
    public boolean isEmpty() {
        return models.isEmpty();
    }

    /** The model names, in study order. */
    public List<String> modelNames() {
        return List.copyOf(models.keySet());
    }

    /** When there is a factor model to diagnose: its residual covariances start from the dense S. */
    @Override
    public boolean needsDenseMoments(int window, int assets) {
        return !models.isEmpty();
    }

    @Override
    public List<FactorDiagnostics> probe(EstimationWindow window) {
        List<FactorDiagnostics> out = new ArrayList<>();
        if (window.assetCount() < 2) {
            return out;
        }
        for (Map.Entry<String, RiskModel> e : models.entrySet()) {
            Optional<FactorDiagnostics> d = FactorResiduals.diagnose(e.getKey(), e.getValue(), window, sectors);
            d.ifPresent(out::add);
        }
        return List.copyOf(out);
    }
}
