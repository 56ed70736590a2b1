package dev.sigmawalk.engine.evidence;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The sector of every asset of a window as a number 0..s−1, sectors in name order, with each
 * sector's member count: the cells of the sector × sector co-movement map (Method §8).
 */
final class SectorIndex {
    private final List<String> names;
    private final int[] sector;
    private final int[] members;

    private SectorIndex(List<String> names, int[] sector, int[] members) {
        this.names = names;
        this.sector = sector;
        this.members = members;
    }

    /**
     * @param assets the window's assets, in index order
     * @param sectorOf sector of every one of them; an asset without one is an error naming it
     */
    static SectorIndex of(List<String> assets, Map<String, String> sectorOf) {
        int n = assets.size();
        String[] names = new String[n];
        Map<String, Integer> count = new TreeMap<>();
        for (int i = 0; i < n; i++) {
            String s = sectorOf.get(assets.get(i));
            if (s == null) {
                throw new IllegalArgumentException("asset '" + assets.get(i) + "' has no sector in the sector map");
            }
            names[i] = s;
            count.merge(s, 1, Integer::sum);
        }
        List<String> sorted = List.copyOf(new ArrayList<>(count.keySet()));
        int[] sector = new int[n];
        for (int i = 0; i < n; i++) {
            sector[i] = Collections.binarySearch(sorted, names[i]);
        }
        int[] members = new int[sorted.size()];
        for (int g = 0; g < members.length; g++) {
            members[g] = count.get(sorted.get(g));
        }
        return new SectorIndex(sorted, sector, members);
    }

    /** s, the number of sectors holding assets of the window. */
    int sectors() {
        return names.size();
    }

    /** The sector number of asset i. */
    int of(int i) {
        return sector[i];
    }

    /** The name of sector g. */
    String name(int g) {
        return names.get(g);
    }

    /** Assets of the window in sector g. */
    int members(int g) {
        return members[g];
    }
}
