package org.fatefield.engine.metrics;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.lineage.Ancestry;

/**
 * How fates run in families. For every pair of live cells the lineage distance is the number of
 * divisions between them through their most recent common ancestor (sisters 2, first cousins 4,
 * an aunt and niece 3); the statistic is the fraction of pairs at each distance that share a fate.
 * Pairs are counted exactly, bottom-up over the family tree: at each ancestor, every cell below
 * one daughter pairs with every cell below the other, counted by depth and fate. Clone
 * composition is the fate count of each founder's live descendants.
 *
 * @param sameFate  distance to the fraction of pairs at that distance with the same fate
 * @param pairs     distance to the number of pairs at that distance
 * @param clones    founder id to fate counts of its live descendants
 */
public record LineageStatistics(Map<Integer, Double> sameFate, Map<Integer, Long> pairs, Map<Long, int[]> clones) {

    /** Computes the statistics of {@code cells} (their current fates) in {@code fateCount} fates. */
    public static LineageStatistics of(List<Cell> cells, Ancestry ancestry, int fateCount) {
        // Histogram per tree node: depth below the node -> fate -> live cells.
        Map<Long, Map<Integer, long[]>> below = new HashMap<>();
        long maxId = -1;
        for (Cell cell : cells) {
            if (cell.fate() >= 0) {
                below.computeIfAbsent(cell.id(), k -> new HashMap<>())
                        .computeIfAbsent(0, k -> new long[fateCount])[cell.fate()]++;
                maxId = Math.max(maxId, cell.id());
            }
        }
        Map<Integer, Long> same = new TreeMap<>();
        Map<Integer, Long> all = new TreeMap<>();
        Map<Long, Map<Integer, long[]>> merged = new HashMap<>();
        // Daughters have larger ids than their mothers, so descending ids visit children first.
        for (long id = maxId; id >= 0; id--) {
            Map<Integer, long[]> own = below.remove(id);
            Map<Integer, long[]> children = merged.remove(id);
            Map<Integer, long[]> histogram = own != null ? own : new HashMap<>();
            if (children != null) {
                for (Map.Entry<Integer, long[]> e : children.entrySet()) {
                    add(histogram, e.getKey(), e.getValue());
                }
            }
            if (histogram.isEmpty()) {
                continue;
            }
            long parent = ancestry.parent(id);
            if (parent < 0) {
                continue;
            }
            Map<Integer, long[]> sibling = merged.get(parent);
            if (sibling != null) {
                // Pairs through this parent: this subtree against what its sister brought before.
                for (Map.Entry<Integer, long[]> a : histogram.entrySet()) {
                    for (Map.Entry<Integer, long[]> b : sibling.entrySet()) {
                        int distance = a.getKey() + 1 + b.getKey();
                        long s = 0;
                        long[] fa = a.getValue();
                        long[] fb = b.getValue();
                        long ta = 0;
                        long tb = 0;
                        for (int f = 0; f < fateCount; f++) {
                            s += fa[f] * fb[f];
                            ta += fa[f];
                            tb += fb[f];
                        }
                        same.merge(distance, s, Long::sum);
                        all.merge(distance, ta * tb, Long::sum);
                    }
                }
            }
            Map<Integer, long[]> target = merged.computeIfAbsent(parent, k -> new HashMap<>());
            for (Map.Entry<Integer, long[]> e : histogram.entrySet()) {
                add(target, e.getKey() + 1, e.getValue());
            }
        }
        Map<Integer, Double> fraction = new TreeMap<>();
        for (Map.Entry<Integer, Long> e : all.entrySet()) {
            fraction.put(e.getKey(), e.getValue() > 0 ? (double) same.get(e.getKey()) / e.getValue() : Double.NaN);
        }
        Map<Long, int[]> clones = new TreeMap<>();
        for (Cell cell : cells) {
            if (cell.fate() >= 0) {
                clones.computeIfAbsent(ancestry.founder(cell.id()), key -> new int[fateCount])[cell.fate()]++;
            }
        }
        return new LineageStatistics(fraction, all, clones);
    }

    private static void add(Map<Integer, long[]> histogram, int depth, long[] counts) {
        long[] target = histogram.computeIfAbsent(depth, k -> new long[counts.length]);
        for (int f = 0; f < counts.length; f++) {
            target[f] += counts[f];
        }
    }

    /** Fraction of live sister pairs that share a fate (NaN if there are none). */
    public double sisterAgreement() {
        return sameFate.getOrDefault(2, Double.NaN);
    }
}
