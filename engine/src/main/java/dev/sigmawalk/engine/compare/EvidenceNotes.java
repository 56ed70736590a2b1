package dev.sigmawalk.engine.compare;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Turns the per-rebalance notes of the residual diagnostics into one warning per window length
 * and note, naming how many rebalances and which dates, so a suspended stretch of data gives a
 * line, not hundreds. A constant market is left to the window scan's own warning.
 */
public final class EvidenceNotes {
    private EvidenceNotes() {
    }

    /** @param probes the evidence of every window length, in study order, each in date order */
    public static List<String> warnings(Map<Integer, List<WindowEvidence>> probes) {
        List<String> out = new ArrayList<>();
        for (Map.Entry<Integer, List<WindowEvidence>> e : probes.entrySet()) {
            Map<String, Dates> byNote = new LinkedHashMap<>();
            for (WindowEvidence w : e.getValue()) {
                for (String note : w.notes()) {
                    if (!note.equals(ResidualGuard.CONSTANT_MARKET)) {
                        byNote.computeIfAbsent(note, k -> new Dates()).add(w.date());
                    }
                }
            }
            byNote.forEach((note, dates) -> out.add("residual diagnostics, " + e.getKey() + "-row window, "
                    + dates.describe() + ": " + note));
        }
        return out;
    }

    private static final class Dates {
        private LocalDate first;
        private LocalDate last;
        private int count;

        void add(LocalDate d) {
            first = first == null ? d : first;
            last = d;
            count++;
        }

        String describe() {
            return count == 1 ? "at 1 rebalance, " + first : "at " + count + " rebalances from " + first + " to " + last;
        }
    }
}
