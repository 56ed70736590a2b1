package dev.sigmawalk.engine.data;

import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.engine.study.DataLayout;
import dev.sigmawalk.engine.study.DataSpec;
import dev.sigmawalk.engine.study.EvidenceSpec;
import dev.sigmawalk.engine.study.FactorSource;
import dev.sigmawalk.engine.study.SeriesSource;
import dev.sigmawalk.engine.study.StrategySpec;
import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.engine.study.ValueKind;
import dev.sigmawalk.engine.timeline.Schedule;
import dev.sigmawalk.engine.timeline.Timeline;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/** The steps of {@link StudyData#load}: read, align, convert, cut, plan, check. One use per study. */
final class StudyDataLoader {
    private static final String MARKET = "market";
    private static final String RISK_FREE = "risk-free";
    /** Unknown alpha assets named in the warning before "...". */
    private static final int UNKNOWN_SHOWN = 10;
    /** Fewer bootstrap resamples draw a warning (see {@link #warnFewResamples}). */
    private static final int FEW_RESAMPLES = 1000;

    private final Study study;
    private final DataSpec spec;
    private final List<String> warnings = new ArrayList<>();
    private final List<FileFingerprint> fingerprints = new ArrayList<>();

    StudyDataLoader(Study study) {
        this.study = study;
        this.spec = study.data();
    }

    StudyData load() {
        // A risk-free column beside prices holds rates, which may be zero or negative.
        String rates = spec.riskFree() instanceof SeriesSource.Column c ? c.name() : null;
        WideTable table = readAssets(rates);
        SeriesColumn market = series(MARKET, spec.market(), table, spec.values());
        Optional<SeriesColumn> riskFreeColumn = spec.riskFree() instanceof SeriesSource.AnnualRate
                ? Optional.empty()
                : Optional.of(series(RISK_FREE, spec.riskFree(), table, ValueKind.RETURNS));
        boolean inferred = spec.periodsPerYear().isEmpty();
        int periods = inferred ? inferPeriods(table) : spec.periodsPerYear().getAsInt();
        if (!inferred && table.rows() >= 2) {
            warnPeriodsAgainstDates(table, periods);
        }

        int offset = ValueConversion.offset(spec.values());
        int panelRows = table.rows() - offset;
        if (panelRows < 1) {
            throw new InputException(new InputException.Location(table.file(), table.lines()[0], null),
                    "one row of prices gives no return; expected at least two dated rows");
        }
        List<Integer> assetCols = assetColumns(table, market, riskFreeColumn);
        double[] returns = assetReturns(table, assetCols, panelRows);
        if (spec.values() == ValueKind.PRICES) {
            PriceJumps.requireBounded(table, assetCols, returns, panelRows);
        }
        List<Integer> kept = dropEmpty(table, assetCols, returns, panelRows);
        if (kept.isEmpty()) {
            throw new InputException(new InputException.Location(table.file(), 1, null),
                    "no asset column has a return; expected at least one asset with data");
        }
        double[] panelReturns = keepColumns(returns, assetCols.size(), kept, panelRows);
        List<String> assets = new ArrayList<>();
        for (int k : kept) {
            assets.add(table.columns().get(assetCols.get(k)));
        }
        double[] marketReturns = ValueConversion.convert(spec.values(), market.values());
        if (spec.values() == ValueKind.PRICES) {
            PriceJumps.requireBounded(market, marketReturns);
        }
        double[] riskFree = riskFreeColumn
                .map(rf -> Arrays.copyOfRange(rf.values(), offset, rf.values().length))
                .orElseGet(() -> annualToPeriod(((SeriesSource.AnnualRate) spec.riskFree()).rate(), periods, panelRows));
        LocalDate[] dates = Arrays.copyOfRange(table.dates(), offset, table.rows());
        ReturnPanel panel = cutAtEnd(ReturnPanel.owning(dates, assets, panelReturns, marketReturns, riskFree,
                market.column(), periods));
        Schedule schedule = plan(panel);

        IntakeChecks checks = new IntakeChecks(panel, spec.values(), offset, warnings);
        int firstNeeded = Math.max(0, schedule.firstRebalance() - study.walkForward().longestWindow() + 1);
        checks.requireComplete(market, spec.values(), marketReturns, firstNeeded, schedule.firstRebalance());
        riskFreeColumn.ifPresent(rf -> checks.requireComplete(rf, ValueKind.RETURNS, riskFree, firstNeeded,
                schedule.firstRebalance()));
        checks.requireDecimalScale(table, assetCols, kept);
        checks.requireMarketDecimalScale(market);
        checks.warnManyReturnsBeyondOne(table, assetCols, kept);
        checks.warnImplausibleReturns(table, assetCols, kept);
        checks.warnCollapsedReturns(table, assetCols, kept);
        checks.warnRepeatedColumns(table, assetCols, kept);
        checks.warnStaleRuns(table, assetCols, kept, IntakeChecks.staleRun(study.walkForward().windows()));
        checks.warnMarketOutliers(market);
        riskFreeColumn.ifPresent(checks::warnImplausibleRiskFree);
        checks.warnMarketIsAssetMean();
        checks.warnMarketScale();
        requireFeasibleBounds(panel.assetCount());

        warnFewResamples();
        Map<Path, FactorTable> factors = factorFiles(table, offset, panel, firstNeeded, schedule.firstRebalance());
        return new StudyData(panel, schedule, inferred, sectors(panel), alphas(panel, schedule), factors, fingerprints, warnings,
                AssetCoverage.of(panel, checks.stats()));
    }

    private WideTable readAssets(String ratesColumn) {
        if (spec.layout() == DataLayout.WIDE) {
            return readWide(spec.assets(), spec.values(), ratesColumn);
        }
        WideTable t = LongAssetsReader.read(spec.assets(), spec.values(), ratesColumn);
        fingerprints.add(FileFingerprint.of(spec.assets()));
        return t;
    }

    private WideTable readWide(Path file, ValueKind kind, String ratesColumn) {
        WideCsvReader.Read read = WideCsvReader.read(file, kind, ratesColumn);
        fingerprints.add(read.fingerprint());
        return read.table();
    }

    private SeriesColumn series(String role, SeriesSource source, WideTable assets, ValueKind kind) {
        if (source instanceof SeriesSource.Column c) {
            int col = assets.columnIndex(c.name());
            if (col < 0) {
                throw new InputException(new InputException.Location(assets.file(), 1, null),
                        "no column named '" + c.name() + "' for the " + role + "; the header's columns are "
                                + String.join(", ", assets.columns()));
            }
            return SeriesColumn.fromColumn(role, assets, col);
        }
        Path file = ((SeriesSource.File) source).path();
        return SeriesColumn.join(role, readWide(file, kind, null), assets, kind == ValueKind.RETURNS, warnings);
    }

    private int inferPeriods(WideTable table) {
        if (table.rows() < 2) {
            throw new InputException(new InputException.Location(table.file(), table.lines()[0], "date"),
                    "one date cannot show how far apart the periods are; set data.periods_per_year");
        }
        return PeriodsPerYear.infer(table.dates());
    }

    /**
     * A given {@code periods_per_year} that is more than twice, or less than half, what the dates'
     * spacing gives (Method §1) scales every annualised figure by the wrong factor (volatility by
     * its square root, a CAGR through its exponent) and converts an annual risk-free rate with it,
     * silently: most often a daily figure kept from another study. A value near the inferred one
     * (260 against 252, 13 against 12) is a user's deliberate choice and draws nothing.
     */
    private void warnPeriodsAgainstDates(WideTable table, int given) {
        double days = PeriodsPerYear.medianSpacingDays(table.dates());
        int implied = PeriodsPerYear.fromMedianSpacing(days);
        if (given > 2 * implied || 2 * given < implied) {
            warnings.add(String.format(Locale.ROOT, "data.periods_per_year: %d is given, but the dates of %s are a"
                    + " median %s days apart, which is %d periods a year; every annualised figure (mean return,"
                    + " volatility, Sharpe ratio, CAGR, tracking error) and the conversion of an annual risk-free"
                    + " rate use the given %d: check the value, or leave the key out to infer it",
                    given, table.file().getFileName(), days == Math.rint(days) ? String.valueOf((long) days)
                            : String.valueOf(days), implied, given));
        }
    }

    /** The columns that are assets: all but the market's and risk-free's own columns. */
    private static List<Integer> assetColumns(WideTable table, SeriesColumn market, Optional<SeriesColumn> riskFree) {
        List<Integer> cols = new ArrayList<>();
        for (int j = 0; j < table.columnCount(); j++) {
            String name = table.columns().get(j);
            boolean isMarket = market.file().equals(table.file()) && market.column().equals(name);
            boolean isRiskFree = riskFree.isPresent() && riskFree.get().file().equals(table.file())
                    && riskFree.get().column().equals(name);
            if (!isMarket && !isRiskFree) {
                cols.add(j);
            }
        }
        return cols;
    }

    /**
     * The assets' returns, row-major. When the file holds returns and every column is an asset,
     * that is the table's own array, used as it is (no copy of a large file's values).
     */
    private double[] assetReturns(WideTable table, List<Integer> assetCols, int panelRows) {
        if (spec.values() == ValueKind.RETURNS && assetCols.size() == table.columnCount()) {
            return table.values();
        }
        double[] out = new double[panelRows * assetCols.size()];
        for (int k = 0; k < assetCols.size(); k++) {
            ValueConversion.convert(spec.values(), table.values(), table.columnCount(), assetCols.get(k), out,
                    assetCols.size(), k);
        }
        return out;
    }

    /** Indexes (into assetCols) of assets with at least one return; warns about the rest. Row by row, as stored. */
    private List<Integer> dropEmpty(WideTable table, List<Integer> assetCols, double[] returns, int panelRows) {
        int cols = assetCols.size();
        boolean[] any = new boolean[cols];
        for (int t = 0; t < panelRows; t++) {
            for (int k = 0; k < cols; k++) {
                any[k] |= !Double.isNaN(returns[t * cols + k]);
            }
        }
        List<Integer> kept = new ArrayList<>();
        for (int k = 0; k < cols; k++) {
            if (any[k]) {
                kept.add(k);
            } else {
                String name = table.columns().get(assetCols.get(k));
                warnings.add(table.file().getFileName() + " column '" + name + "' has no "
                        + (spec.values() == ValueKind.PRICES ? "two consecutive prices, so no return" : "value")
                        + "; the asset is left out");
            }
        }
        return kept;
    }

    private static double[] keepColumns(double[] returns, int cols, List<Integer> kept, int rows) {
        if (kept.size() == cols) {
            return returns;
        }
        double[] out = new double[rows * kept.size()];
        for (int t = 0; t < rows; t++) {
            for (int k = 0; k < kept.size(); k++) {
                out[t * kept.size() + k] = returns[t * cols + kept.get(k)];
            }
        }
        return out;
    }

    /** Method §1: an annual rate R is (1 + R)^(1/p) − 1 per period. */
    static double[] annualToPeriod(double annual, int periods, int rows) {
        double perPeriod = Math.pow(1.0 + annual, 1.0 / periods) - 1.0;
        double[] out = new double[rows];
        Arrays.fill(out, perPeriod);
        return out;
    }

    private ReturnPanel cutAtEnd(ReturnPanel panel) {
        if (study.walkForward().end().isEmpty()) {
            return panel;
        }
        LocalDate end = study.walkForward().end().get();
        int last = panel.firstRowOnOrAfter(end.plusDays(1)) - 1;
        if (last < 0) {
            throw new InputException(new InputException.Location(study.file(), 0, null),
                    "walkforward.end (" + end + ") is before the first return date " + panel.date(0));
        }
        return last == panel.rows() - 1 ? panel : panel.truncateAfter(last);
    }

    private Schedule plan(ReturnPanel panel) {
        try {
            return Timeline.plan(panel, study.walkForward());
        } catch (InputException e) {
            if (e.location() != null) {
                throw e;
            }
            throw new InputException(new InputException.Location(study.file(), 0, null), e.getMessage());
        }
    }

    /** Method §5: bounds that cannot sum to 1 over the universe are an input error. */
    private void requireFeasibleBounds(int n) {
        List<StrategySpec> strategies = study.strategies();
        for (int i = 0; i < strategies.size(); i++) {
            Optional<Bounds> bounds = strategies.get(i).bounds();
            if (bounds.isPresent() && !bounds.get().feasibleFor(n)) {
                Bounds b = bounds.get();
                throw new InputException(new InputException.Location(study.file(), 0, null),
                        "strategies[" + i + "].bounds [" + b.lower() + ", " + b.upper() + "] cannot make "
                                + n + " weights sum to 1; expected " + n + "·lower <= 1 <= " + n + "·upper");
            }
        }
    }

    private Map<String, String> sectors(ReturnPanel panel) {
        if (spec.sectors().isEmpty()) {
            return Map.of();
        }
        Path file = spec.sectors().get();
        Map<String, String> all = SectorMap.read(file);
        fingerprints.add(FileFingerprint.of(file));
        Map<String, String> sectors = SectorMap.restrictTo(all, panel.assets());
        if (sectors.isEmpty() && !all.isEmpty()) {
            // Not one name matches (another universe's file, or names spelt another way): the
            // sector models would quietly become the single-index model.
            String first = all.keySet().iterator().next();
            throw new InputException(new InputException.Location(file, 0, null), "none of the " + all.size()
                    + " assets named here is in the universe of " + spec.assets().getFileName() + " (the first is '"
                    + first + "', the universe's first is '" + panel.assets().get(0) + "'); expected the asset names"
                    + " of " + spec.assets().getFileName());
        }
        List<String> without = panel.assets().stream().filter(a -> !sectors.containsKey(a)).toList();
        if (!without.isEmpty()) {
            warnings.add(file.getFileName() + " gives no sector for " + without.size() + " of " + panel.assetCount()
                    + " assets: " + listed(without));
        }
        warnSectorsOfOne(file, sectors);
        // A name the universe does not hold is most often a misspelt asset, which the line above then lists too.
        List<String> unknown = all.keySet().stream().filter(a -> panel.assetColumn(a) < 0).toList();
        if (!unknown.isEmpty()) {
            warnings.add(file.getFileName() + " gives a sector for " + unknown.size() + " asset"
                    + (unknown.size() == 1 ? "" : "s") + " not in the universe, which "
                    + (unknown.size() == 1 ? "is" : "are") + " ignored: " + listed(unknown));
        }
        return sectors;
    }

    /**
     * Method §11: with {@code factors: sectors} a sector of one asset has that asset's own excess
     * return as its factor, which the asset's regression fits exactly: the model gives it no
     * residual risk, and its residual diagnostics and sector maps leave it out. Said once, naming
     * each such sector (in name order) and its asset.
     */
    private void warnSectorsOfOne(Path file, Map<String, String> sectors) {
        boolean used = study.strategies().stream()
                .anyMatch(s -> s.riskSettings().factors().orElse(null) instanceof FactorSource.Sectors);
        if (!used) {
            return;
        }
        Map<String, List<String>> members = new TreeMap<>();
        sectors.forEach((asset, sector) -> members.computeIfAbsent(sector, k -> new ArrayList<>()).add(asset));
        List<String> alone = members.entrySet().stream().filter(e -> e.getValue().size() == 1)
                .map(e -> "'" + e.getKey() + "' (" + e.getValue().get(0) + ")").toList();
        if (!alone.isEmpty()) {
            boolean one = alone.size() == 1;
            warnings.add(file.getFileName() + ": " + (one ? "sector " : alone.size() + " sectors ") + listed(alone)
                    + (one ? " holds" : " each hold") + " a single asset of the universe; with factors: sectors"
                    + (one ? " its factor is that asset's" : " each one's factor is that asset's") + " own return,"
                    + " which the multi-index model fits exactly: the asset gets no residual risk there and is left"
                    + " out of that model's residual diagnostics and sector maps; give it a sector with other assets"
                    + " to estimate its own risk");
        }
    }

    /** Method §11: every factor file a multi-index strategy names, once each, in study order. */
    private Map<Path, FactorTable> factorFiles(WideTable table, int offset, ReturnPanel panel, int firstNeeded,
                                               int firstRebalance) {
        Map<Path, FactorTable> out = new LinkedHashMap<>();
        for (StrategySpec s : study.strategies()) {
            if (s.riskSettings().factors().orElse(null) instanceof FactorSource.File f && !out.containsKey(f.path())) {
                out.put(f.path(), FactorFileReader.read(f.path(), table, offset, panel, firstNeeded, firstRebalance));
                fingerprints.add(FileFingerprint.of(f.path()));
            }
        }
        return out;
    }

    private Map<Path, AlphaTable> alphas(ReturnPanel panel, Schedule schedule) {
        Map<Path, AlphaTable> out = new LinkedHashMap<>();
        for (StrategySpec s : study.strategies()) {
            if (s.alphas().isPresent() && !out.containsKey(s.alphas().get())) {
                Path file = s.alphas().get();
                AlphaTable table = AlphaTable.read(file);
                out.put(file, table);
                fingerprints.add(FileFingerprint.of(file));
                warnUnknownAlphaAssets(file, table, panel);
                warnAlphasNeverUsed(file, table, panel.date(schedule.rebalanceRow(schedule.count() - 1)));
                warnImplausibleAlphas(file, table, panel.periodsPerYear());
            }
        }
        return out;
    }

    /** An alpha for an asset the panel does not hold is never used; say which ones. */
    private void warnUnknownAlphaAssets(Path file, AlphaTable table, ReturnPanel panel) {
        List<String> unknown = new ArrayList<>();
        for (String asset : table.assets()) {
            if (panel.assetColumn(asset) < 0) {
                unknown.add(asset);
            }
        }
        if (!unknown.isEmpty()) {
            warnings.add(file.getFileName() + " gives alphas for " + unknown.size() + " asset"
                    + (unknown.size() == 1 ? "" : "s") + " not in the universe, which are ignored: " + listed(unknown));
        }
    }

    /**
     * Method §4: a rebalance uses the latest alpha dated on or before it, so a file whose alphas
     * all come after the last rebalance (dated in another year or century by mistake) changes
     * nothing, which the run would otherwise not show.
     */
    private void warnAlphasNeverUsed(Path file, AlphaTable table, LocalDate lastRebalance) {
        table.firstDate().filter(first -> first.isAfter(lastRebalance)).ifPresent(first -> warnings.add(
                file.getFileName() + ": its first alpha is dated " + first + ", after the last rebalance ("
                        + lastRebalance + "), so no rebalance uses any of its alphas"));
    }

    /**
     * Method §4: an alpha is a per-period expected excess return. One worth more than 100 % a year,
     * (1 + α)^p − 1 > 1, or less than −50 % a year is most often a file in percent, or annual
     * alphas given per period: the limits of the risk-free rate's warning, for the same mistakes.
     * The largest and the smallest alpha are checked, each warned of at its line.
     */
    private void warnImplausibleAlphas(Path file, AlphaTable table, int periods) {
        table.highest().filter(e -> Math.pow(1 + e.alpha(), periods) - 1 > IntakeChecks.IMPLAUSIBLE_ANNUAL_RATE)
                .ifPresent(e -> warnings.add(implausibleAlpha(file, e, "above 100 %")));
        table.lowest().filter(e -> Math.pow(1 + e.alpha(), periods) - 1
                < IntakeChecks.IMPLAUSIBLE_NEGATIVE_ANNUAL_RATE)
                .ifPresent(e -> warnings.add(implausibleAlpha(file, e, "below -50 %")));
    }

    private static String implausibleAlpha(Path file, AlphaTable.Entry e, String limit) {
        return file.getFileName() + " line " + e.line() + ", column 'alpha': the alpha of " + e.alpha() + " for '"
                + e.asset() + "' on " + e.date() + " is " + limit + " a year as a per-period return; alphas must be"
                + " per period and decimal (0.001 for 0.1 % a period), not percent or annual";
    }

    /** The first few names, then "..." when there are more. */
    private static String listed(List<String> names) {
        int shown = Math.min(names.size(), UNKNOWN_SHOWN);
        return String.join(", ", names.subList(0, shown)) + (shown < names.size() ? ", ..." : "");
    }

    /**
     * With B resamples a bootstrap p-value moves in steps of 1/(B + 1); below 1 000 the steps
     * are too coarse for the adjustments over windows and strategies that the report applies.
     */
    private void warnFewResamples() {
        int b = study.evidence().resamples();
        if (b < FEW_RESAMPLES) {
            warnings.add("evidence.resamples: " + b + " resamples resolve bootstrap p-values only in steps of 1/" + (b + 1)
                    + ", too coarse once they are adjusted for several windows and strategies; "
                    + FEW_RESAMPLES + " or more (the default is " + EvidenceSpec.DEFAULT_RESAMPLES + ") is common practice");
        }
    }
}
