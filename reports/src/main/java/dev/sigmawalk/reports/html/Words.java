package dev.sigmawalk.reports.html;

import java.util.List;

/** Small pieces of report wording shared by several sections. */
final class Words {
    private Words() {
    }

    /** "60 periods", "1 period". */
    static String periods(int n) {
        return n + (n == 1 ? " period" : " periods");
    }

    /** "none" for 0, otherwise the number: reads better at the start of a clause. */
    static String howMany(int n) {
        return n == 0 ? "none" : Integer.toString(n);
    }

    /** "a", "a and b", "a, b and c". */
    static String list(List<String> items) {
        if (items.isEmpty()) {
            return "";
        }
        if (items.size() == 1) {
            return items.get(0);
        }
        return String.join(", ", items.subList(0, items.size() - 1)) + " and " + items.get(items.size() - 1);
    }
}
