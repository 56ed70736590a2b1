package dev.sigmawalk.sample;

import java.time.LocalDate;
import java.util.Arrays;

/**
 * One row of the tables being written: a date, the risk-free rate, the index return and one
 * return per company. A reusable buffer owned by one generator run (filled in place row after
 * row to keep memory bounded); inside this package NaN marks "no return", written as an empty
 * cell.
 */
final class DayValues {
    private LocalDate date;
    private double riskFree;
    private double index;
    private final double[] assets;

    DayValues(int companies) {
        this.assets = new double[companies];
        Arrays.fill(assets, Double.NaN);
    }

    LocalDate date() {
        return date;
    }

    double riskFree() {
        return riskFree;
    }

    double index() {
        return index;
    }

    int size() {
        return assets.length;
    }

    /** The return of company i, NaN when it has none. */
    double asset(int i) {
        return assets[i];
    }

    void set(LocalDate date, double riskFree, double index) {
        this.date = date;
        this.riskFree = riskFree;
        this.index = index;
    }

    void setAsset(int i, double value) {
        assets[i] = value;
    }

    /** Rounds every value in place, so later sums use exactly the numbers that are written. */
    void roundWith(SignificantDigits digits) {
        riskFree = digits.round(riskFree);
        index = digits.round(index);
        for (int i = 0; i < assets.length; i++) {
            assets[i] = Double.isNaN(assets[i]) ? Double.NaN : digits.round(assets[i]);
        }
    }
}
