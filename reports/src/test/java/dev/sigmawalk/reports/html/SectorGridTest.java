package dev.sigmawalk.reports.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.evidence.SectorCoMovement;
import dev.sigmawalk.engine.evidence.SectorCorrelation;
import dev.sigmawalk.engine.evidence.SectorPairMean;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/**
 * A sector x sector map averages each cell over the rebalances where it exists, worked out by
 * hand here: a cell seen at two rebalances is the plain mean of the two, a cell seen once keeps
 * its value, and a cell is found with its sectors in either order.
 */
class SectorGridTest {
    private static final double EXACT = 0;

    @Test
    void cells_areMeansOverTheRebalancesWhereTheyExist() {
        SectorCoMovement first = new SectorCoMovement(
                List.of(new SectorCorrelation("bay", 3, 3, 0.30), new SectorCorrelation("cove", 2, 1, -0.10)),
                6, OptionalDouble.of(0.05), List.of(new SectorPairMean("bay", "cove", 6, 0.05)));
        SectorCoMovement second = new SectorCoMovement(List.of(new SectorCorrelation("bay", 2, 1, 0.10)),
                2, OptionalDouble.of(-0.25), List.of(new SectorPairMean("bay", "dune", 2, -0.25)));
        SectorGrid g = SectorGrid.of("multi-index:sectors", 60, List.of(first, second)).orElseThrow();

        assertEquals(List.of("bay", "cove", "dune"), g.sectors());
        SectorGrid.Cell bay = g.cell("bay", "bay").orElseThrow();
        assertEquals(2, bay.rebalances());
        assertEquals((0.30 + 0.10) / 2, bay.mean(), EXACT, "(0.30 + 0.10) / 2");
        assertEquals(-0.10, g.cell("cove", "cove").orElseThrow().mean(), EXACT);
        assertEquals(1, g.cell("cove", "bay").orElseThrow().rebalances(), "either order");
        assertEquals(-0.25, g.cell("dune", "bay").orElseThrow().mean(), EXACT);
        assertTrue(g.cell("cove", "dune").isEmpty(), "cove and dune never shared a window");
        assertTrue(g.cell("dune", "dune").isEmpty(), "dune never had two assets");
        assertEquals(List.of(List.of("bay", "bay"), List.of("bay", "cove"), List.of("bay", "dune"),
                List.of("cove", "cove")), List.copyOf(g.cells().keySet()), "cells in name order");
    }

    @Test
    void noSectorCell_givesNoGrid() {
        assertTrue(SectorGrid.of("single-index", 36, List.of()).isEmpty());
    }
}
