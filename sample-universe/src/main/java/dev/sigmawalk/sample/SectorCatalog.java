package dev.sigmawalk.sample;

import java.util.List;

/** The fixed list of invented sectors; companies are dealt to them in this order. */
final class SectorCatalog {
    private static final List<Sector> BRENNMARK = List.of(
            // Three sectors share a sector shock in their residuals, so the single-index model
            // misses part of their co-movement; the other five follow it exactly.
            new Sector("TW", "Tidewater Power", 0.60, 0.30),
            new Sector("SM", "Saltworks and Minerals", 1.30, 0.0),
            new Sector("FF", "Ferry and Freight", 1.10, 0.15),
            new Sector("OF", "Orchard Foods", 0.70, 0.0),
            new Sector("GC", "Glass and Ceramics", 1.00, 0.0),
            new Sector("LH", "Lending Houses", 1.20, 0.22),
            new Sector("SN", "Signal Networks", 1.40, 0.0),
            new Sector("TP", "Timber and Paper", 0.90, 0.0));

    private SectorCatalog() {
    }

    static List<Sector> brennmark() {
        return BRENNMARK;
    }
}
