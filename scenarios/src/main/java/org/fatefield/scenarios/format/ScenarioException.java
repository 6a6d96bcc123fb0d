package org.fatefield.scenarios.format;

import java.util.List;
import java.util.stream.Collectors;

/** A scenario, circuit or sweep file that cannot be used, with every problem found in it (each naming its file). */
public final class ScenarioException extends Exception {

    private static final long serialVersionUID = 1L;

    private final transient List<Problem> problems;

    /** @param problems at least one problem */
    public ScenarioException(List<Problem> problems) {
        super(problems.size() + " problem" + (problems.size() == 1 ? "" : "s") + " found:\n"
                + problems.stream().map(p -> "  " + p.format()).collect(Collectors.joining("\n")));
        this.problems = List.copyOf(problems);
    }

    /** Every problem, in file order. */
    public List<Problem> problems() {
        return problems;
    }
}
