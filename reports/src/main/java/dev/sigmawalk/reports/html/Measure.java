package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.measures.Summary;
import java.util.OptionalDouble;
import java.util.function.DoubleFunction;
import java.util.function.Function;

/**
 * The measures of {@code summary.csv} as columns of the headline table: header, unit, plain
 * explanation, how the value is printed and which value is best.
 */
public enum Measure {
    MEAN_RETURN("Mean return", "% a year", Best.NONE, Formats::percent, s -> OptionalDouble.of(s.meanReturn()),
            "Average net return per period, times the periods in a year."),
    VOLATILITY("Volatility", "% a year", Best.LOWEST, Formats::percent, s -> OptionalDouble.of(s.volatility()),
            "How widely net returns swung: their standard deviation, annualised. Lower means steadier."),
    SHARPE("Sharpe ratio", "ratio", Best.HIGHEST, Formats::ratio, s -> OptionalDouble.of(s.sharpe()),
            "Return above the risk-free rate for each unit of volatility, annualised. Higher is better."),
    CAGR("CAGR", "% a year", Best.HIGHEST, Formats::percent, s -> OptionalDouble.of(s.cagr()),
            "Compound annual growth rate: the steady yearly rate that gives the same final wealth, net of costs."),
    MAX_DRAWDOWN("Max drawdown", "% of peak", Best.LOWEST, Formats::percent, s -> OptionalDouble.of(s.maxDrawdown()),
            "The largest fall from a previous high to a later low of the wealth path."),
    MEAN_TURNOVER("Turnover", "% per rebalance", Best.LOWEST, Formats::percent, Summary::meanTurnover,
            "Share of the portfolio bought plus sold at a typical rebalance (the first purchase from cash excluded)."),
    TRACKING_ERROR("Tracking error", "% a year", Best.LOWEST, Formats::percent, Summary::trackingError,
            "How far returns wandered from the market's: the annualised standard deviation of the difference."),
    INFORMATION_RATIO("Information ratio", "ratio", Best.HIGHEST, Formats::ratio, Summary::informationRatio,
            "Average return above the market per unit of tracking error, annualised."),
    FORECAST_VOLATILITY("Forecast volatility", "% a year", Best.NONE, Formats::percent, Summary::forecastVolatility,
            "The volatility the risk model predicted when each portfolio was formed, averaged over rebalances."),
    BIAS("Bias statistic", "ratio", Best.CLOSEST_TO_ONE, Formats::ratio, Summary::bias,
            "Spread of returns measured in units of the forecast volatility. Near 1 means honest forecasts; above 1, "
                    + "risk was understated; below 1, overstated.");

    /** Which value of a column is marked as the best. */
    public enum Best {
        NONE, LOWEST, HIGHEST, CLOSEST_TO_ONE;

        /** True when {@code a} is strictly better than {@code b}. */
        boolean better(double a, double b) {
            switch (this) {
                case LOWEST:
                    return a < b;
                case HIGHEST:
                    return a > b;
                case CLOSEST_TO_ONE:
                    return Math.abs(a - 1) < Math.abs(b - 1);
                default:
                    return false;
            }
        }
    }

    private final String header;
    private final String unit;
    private final Best best;
    private final DoubleFunction<String> format;
    private final Function<Summary, OptionalDouble> value;
    private final String explanation;

    Measure(String header, String unit, Best best, DoubleFunction<String> format,
            Function<Summary, OptionalDouble> value, String explanation) {
        this.header = header;
        this.unit = unit;
        this.best = best;
        this.format = format;
        this.value = value;
        this.explanation = explanation;
    }

    public String header() {
        return header;
    }

    public String unit() {
        return unit;
    }

    public Best best() {
        return best;
    }

    public String explanation() {
        return explanation;
    }

    /** The measure's value in a summary row; empty where it does not apply. */
    public OptionalDouble of(Summary s) {
        return value.apply(s);
    }

    /** The value as printed, "n/a" when empty or not finite. */
    public String format(Summary s) {
        OptionalDouble v = of(s);
        return v.isPresent() ? format.apply(v.getAsDouble()) : Formats.NOT_APPLICABLE;
    }
}
