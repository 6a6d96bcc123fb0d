package org.fatefield.viz.live;

import java.util.List;
import java.util.Locale;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.tissue.Tissue;

/** The clicked cell's text: identity and lineage, position and age, state, local signal, own factors, fate. */
final class CellDescription {

    private CellDescription() {
    }

    static String of(Tissue t, Cell c, String parameter) {
        List<String> species = t.spec().circuit().network().speciesNames();
        StringBuilder s = new StringBuilder();
        s.append(String.format(Locale.ROOT, "cell %d, generation %d, mother %d, founder %d%n", c.id(), c.generation(),
                c.parentId(), t.ancestry().founder(c.id())));
        String where = t.spec().domain().threeD() ? String.format(Locale.ROOT, "(%.1f, %.1f, %.1f)", c.x(), c.y(), c.z())
                : String.format(Locale.ROOT, "(%.1f, %.1f)", c.x(), c.y());
        s.append(String.format(Locale.ROOT, "at %s µm, age %.2f h of %.2f h%n", where, c.age(t.time()),
                c.cycleTime()));
        for (int i = 0; i < species.size(); i++) {
            s.append(String.format(Locale.ROOT, "%s = %.3f%n", species.get(i), c.concentration(i)));
        }
        s.append(String.format(Locale.ROOT, "morphogen %.3f, %s = %.3f%n", t.signalAt(c), parameter,
                t.spec().mapping().controlAt(t.signalAt(c))));
        var extrinsic = t.spec().extrinsic();
        for (int k = 0; k < extrinsic.size(); k++) {
            s.append(String.format(Locale.ROOT, "own %s: × %.3f (inherited)%n", extrinsic.get(k).label(),
                    extrinsic.get(k).factor(c.scores()[k])));
        }
        s.append("fate: ").append(c.fate() >= 0 ? t.spec().fates().fateNames().get(c.fate()) : "not yet classified");
        if (c.fate() >= 0 && Double.isFinite(c.fateSince())) {
            s.append(String.format(Locale.ROOT, " since t = %.2f h", c.fateSince()));
        }
        return s.toString();
    }
}
