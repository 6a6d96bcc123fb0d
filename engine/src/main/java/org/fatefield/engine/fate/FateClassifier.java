package org.fatefield.engine.fate;

import java.util.ArrayList;
import java.util.List;

/**
 * Assigns each cell a fate from its circuit state: the first matching rule wins, and a cell
 * matching none takes the default fate (typically the uncommitted, progenitor-like state).
 * Fate indices run over the rules in order, then the default.
 */
public final class FateClassifier {

    private final List<FateRule> rules;
    private final List<String> names;
    private final int firstPassage;
    private final int predictionCells;

    /** Single cells simulated per position for the noise-based predicted profile, unless set. */
    public static final int DEFAULT_PREDICTION_CELLS = 200;

    /**
     * @param rules       rules in priority order
     * @param defaultName fate of a cell that matches no rule
     * @throws IllegalArgumentException if two fates share a name
     */
    public FateClassifier(List<FateRule> rules, String defaultName) {
        this(rules, defaultName, -1, DEFAULT_PREDICTION_CELLS);
    }

    private FateClassifier(List<FateRule> rules, String defaultName, int firstPassage, int predictionCells) {
        if (predictionCells < 0) {
            throw new IllegalArgumentException("prediction cells must be at least 0, got " + predictionCells);
        }
        this.firstPassage = firstPassage;
        this.predictionCells = predictionCells;
        this.rules = List.copyOf(rules);
        List<String> all = new ArrayList<>();
        for (FateRule rule : rules) {
            all.add(rule.name());
        }
        all.add(defaultName);
        for (int i = 0; i < all.size(); i++) {
            if (all.indexOf(all.get(i)) != i) {
                throw new IllegalArgumentException("fate name '" + all.get(i) + "' is used twice");
            }
        }
        this.names = List.copyOf(all);
    }

    /**
     * The same rules, with the first entry of each cell into fate {@code name} timed (every step
     * of its own life: {@code first_passage_h} in the lineage table).
     *
     * @throws IllegalArgumentException if no fate has that name
     */
    public FateClassifier withFirstPassage(String name) {
        int index = names.indexOf(name);
        if (index < 0) {
            throw new IllegalArgumentException("no fate is named '" + name + "'; fates are " + names);
        }
        return new FateClassifier(rules, names.get(names.size() - 1), index, predictionCells);
    }

    /**
     * The same rules, with {@code cells} single cells simulated per position for the noise-based
     * predicted fate profile ({@code SingleCellProfile}); 0 for none.
     */
    public FateClassifier withPredictionCells(int cells) {
        return new FateClassifier(rules, names.get(names.size() - 1), firstPassage, cells);
    }

    /** Single cells simulated per position for the noise-based predicted profile (0: none). */
    public int predictionCells() {
        return predictionCells;
    }

    /** Index of the fate whose first entry is timed, or -1 if none is. */
    public int firstPassageFate() {
        return firstPassage;
    }

    /** True when {@code state} is in the timed fate (false when none is timed). */
    public boolean inFirstPassageFate(double[] state) {
        return firstPassage >= 0 && classify(state) == firstPassage;
    }

    /** Fate index of {@code state}. */
    public int classify(double[] state) {
        for (int i = 0; i < rules.size(); i++) {
            if (rules.get(i).matches(state)) {
                return i;
            }
        }
        return rules.size();
    }

    /** All fate names: the rules in order, then the default. */
    public List<String> fateNames() {
        return names;
    }

    /** Number of fates, default included. */
    public int fateCount() {
        return names.size();
    }
}
