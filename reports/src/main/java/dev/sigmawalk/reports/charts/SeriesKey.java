package dev.sigmawalk.reports.charts;

/**
 * Key of a chart series: ordered by position, shown by label. Two lines may carry the same label
 * (the chart library refuses duplicate keys, so the position keeps them apart).
 */
record SeriesKey(int position, String label) implements Comparable<SeriesKey> {
    @Override
    public int compareTo(SeriesKey o) {
        return Integer.compare(position, o.position);
    }

    @Override
    public String toString() {
        return label;
    }
}
