package org.fatefield.scenarios.format;

import java.util.Locale;

/** The nearest known name to a misspelt one, for messages that say "did you mean". */
public final class Suggestions {

    private Suggestions() {
    }

    /** " (did you mean 'x'?)" when a known name is within two edits of {@code word}, else "". */
    public static String didYouMean(String word, Iterable<String> known) {
        String best = null;
        int bestDistance = 3;
        for (String candidate : known) {
            if (candidate.equals(word)) {
                // The word itself is known here but not valid where it was written: no suggestion.
                continue;
            }
            int d = editDistance(word.toLowerCase(Locale.ROOT), candidate.toLowerCase(Locale.ROOT));
            if (d < bestDistance) {
                best = candidate;
                bestDistance = d;
            }
        }
        return best == null ? "" : " (did you mean '" + best + "'?)";
    }

    private static int editDistance(String a, String b) {
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                current[j] = Math.min(Math.min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + cost);
            }
            int[] swap = previous;
            previous = current;
            current = swap;
        }
        return previous[b.length()];
    }
}
