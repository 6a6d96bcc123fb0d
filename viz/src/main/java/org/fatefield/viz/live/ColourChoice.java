package org.fatefield.viz.live;

import java.util.ArrayList;
import java.util.List;

/**
 * One entry of the live window's "colour by" list, in words a person reads: a colour mode and,
 * for a species level, which species.
 *
 * @param mode    the colour mode
 * @param species the species shown (species mode only, else 0)
 * @param label   what the list shows
 */
record ColourChoice(TissueGui.ColourMode mode, int species, String label) {

    /** The choices for a circuit with these species: fate, commitment, clone, then each species' level. */
    static List<ColourChoice> all(List<String> speciesNames) {
        List<ColourChoice> choices = new ArrayList<>();
        choices.add(new ColourChoice(TissueGui.ColourMode.FATE, 0, "fate"));
        choices.add(new ColourChoice(TissueGui.ColourMode.COMMITMENT, 0, "commitment (pale: fate just entered)"));
        choices.add(new ColourChoice(TissueGui.ColourMode.CLONE, 0, "clone (descendants of one founder)"));
        for (int s = 0; s < speciesNames.size(); s++) {
            choices.add(new ColourChoice(TissueGui.ColourMode.SPECIES, s, speciesNames.get(s) + " level"));
        }
        return choices;
    }

    @Override
    public String toString() {
        return label;
    }
}
