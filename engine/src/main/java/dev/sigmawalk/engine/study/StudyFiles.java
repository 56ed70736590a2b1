package dev.sigmawalk.engine.study;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/** Every file a study names: the files a run of it reads, whether or not they exist yet. */
public final class StudyFiles {
    private StudyFiles() {
    }

    /**
     * The study file, the assets file, the market and risk-free files (when they are files), the
     * sectors file, then each strategy's factor and alphas files, in study order, each once.
     */
    public static List<Path> of(Study study) {
        Set<Path> out = new LinkedHashSet<>();
        out.add(study.file());
        DataSpec data = study.data();
        out.add(data.assets());
        if (data.market() instanceof SeriesSource.File f) {
            out.add(f.path());
        }
        if (data.riskFree() instanceof SeriesSource.File f) {
            out.add(f.path());
        }
        data.sectors().ifPresent(out::add);
        for (StrategySpec s : study.strategies()) {
            if (s.riskSettings().factors().orElse(null) instanceof FactorSource.File f) {
                out.add(f.path());
            }
            s.alphas().ifPresent(out::add);
        }
        return new ArrayList<>(out);
    }
}
