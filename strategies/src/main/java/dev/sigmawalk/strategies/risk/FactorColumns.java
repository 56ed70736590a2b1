package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.data.FactorTable;
import dev.sigmawalk.engine.model.EstimationWindow;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/** Where a multi-index model's factors come from in each window (Method §11). */
public sealed interface FactorColumns permits FactorColumns.Sectors, FactorColumns.File {

    /** The window's factors and which of them each eligible asset loads on. */
    FactorDesign design(EstimationWindow window);

    /** The setting as the study file spells it ({@code sectors} or the file). */
    String spelling();

    /**
     * The market excess return m, then one column per sector with an eligible asset (in the
     * order the sectors first appear among the window's assets): the equal-weighted mean excess
     * return of that sector's eligible assets, the asset itself included. Asset i loads on the
     * market and its own sector; an asset without a sector on the market only.
     *
     * @param sectorOf asset id to sector
     */
    record Sectors(Map<String, String> sectorOf) implements FactorColumns {
        public Sectors {
            sectorOf = Map.copyOf(sectorOf);
        }

        @Override
        public FactorDesign design(EstimationWindow window) {
            List<String> assets = window.assets();
            int n = assets.size();
            Map<String, Integer> column = new LinkedHashMap<>();
            int[][] columnsOf = new int[n][];
            for (int i = 0; i < n; i++) {
                String sector = sectorOf.get(assets.get(i));
                if (sector == null) {
                    columnsOf[i] = new int[] {0};
                } else {
                    int c = column.computeIfAbsent(sector, s -> column.size() + 1);
                    columnsOf[i] = new int[] {0, c};
                }
            }
            int k = column.size() + 1;
            int len = window.length();
            int[] members = new int[k];
            for (int[] cols : columnsOf) {
                if (cols.length == 2) {
                    members[cols[1]]++;
                }
            }
            double[] g = new double[len * k];
            double[] x = window.excessReturns();
            double[] m = window.marketExcess();
            for (int t = 0; t < len; t++) {
                g[t * k] = m[t];
                for (int i = 0; i < n; i++) {
                    if (columnsOf[i].length == 2) {
                        g[t * k + columnsOf[i][1]] += x[t * n + i];
                    }
                }
                for (int c = 1; c < k; c++) {
                    g[t * k + c] /= members[c];
                }
            }
            List<String> names = new ArrayList<>();
            names.add("market");
            names.addAll(column.keySet());
            return new FactorDesign(names, len, g, columnsOf);
        }

        @Override
        public String spelling() {
            return "sectors";
        }
    }

    /**
     * The columns of a factor file over the window rows, used as given; every asset loads on
     * every column (the market is a factor only if the file has it).
     *
     * @param table the file aligned to the panel's rows
     * @param spelling the file as the study names it
     */
    record File(FactorTable table, String spelling) implements FactorColumns {
        public File {
            Objects.requireNonNull(table, "table");
            Objects.requireNonNull(spelling, "spelling");
        }

        @Override
        public FactorDesign design(EstimationWindow window) {
            int len = window.length();
            int k = table.factorCount();
            int first = window.endRow() - len + 1;
            if (first < 0 || window.endRow() >= table.rows()) {
                throw new IllegalArgumentException("factor file " + table.file().getFileName() + " covers panel rows 0.."
                        + (table.rows() - 1) + ", not the window's rows " + first + ".." + window.endRow());
            }
            double[] g = new double[len * k];
            for (int t = 0; t < len; t++) {
                for (int a = 0; a < k; a++) {
                    g[t * k + a] = table.value(first + t, a);
                }
            }
            int[] all = new int[k];
            for (int a = 0; a < k; a++) {
                all[a] = a;
            }
            int[][] columnsOf = new int[window.assetCount()][];
            for (int i = 0; i < columnsOf.length; i++) {
                columnsOf[i] = all;
            }
            return new FactorDesign(table.names(), len, g, columnsOf);
        }
    }
}
