package org.fatefield.engine.robustness;

import java.util.ArrayList;
import java.util.List;
import org.fatefield.engine.coupling.ParameterMapping;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.tissue.CircuitSetup;
import org.fatefield.engine.tissue.TissueSpec;

/**
 * One quantity a robustness analysis scales: the morphogen amplitude (every source rate and wall
 * value), the tissue size (width and height), the noise level (the inverse of the system size) or
 * one circuit parameter.
 *
 * @param name      how it is reported
 * @param parameter circuit parameter index, or -1 for the tissue-level quantities
 */
public record Perturbation(String name, int parameter) {

    /** Morphogen amplitude. */
    public static final String AMPLITUDE = "morphogen amplitude";
    /** Tissue size. */
    public static final String SIZE = "tissue size";
    /** Noise level. */
    public static final String NOISE = "noise level";

    /** The tissue-level perturbations, then one per circuit parameter. */
    public static List<Perturbation> all(TissueSpec spec) {
        List<Perturbation> out = new ArrayList<>(List.of(new Perturbation(AMPLITUDE, -1), new Perturbation(SIZE, -1),
                new Perturbation(NOISE, -1)));
        List<String> names = spec.circuit().network().parameterNames();
        for (int i = 0; i < names.size(); i++) {
            out.add(new Perturbation(names.get(i), i));
        }
        return out;
    }

    /** {@code spec} with this quantity multiplied by {@code factor}. */
    public TissueSpec apply(TissueSpec spec, double factor) {
        if (parameter >= 0) {
            double[] base = spec.mapping().base();
            base[parameter] *= factor;
            return with(spec, spec.circuit(), new ParameterMapping(base, spec.mapping().couplings()), spec.morphogen(),
                    spec.width(), spec.height());
        }
        return switch (name) {
            case AMPLITUDE -> with(spec, spec.circuit(), spec.mapping(), spec.morphogen().withProductionScaled(factor), spec.width(),
                    spec.height());
            case SIZE -> with(spec, spec.circuit(), spec.mapping(), spec.morphogen(), spec.width() * factor,
                    spec.height() * factor);
            default -> with(spec, new CircuitSetup(spec.circuit().network(), spec.circuit().noise(),
                    spec.circuit().systemSize() / factor, spec.circuit().initialState()), spec.mapping(),
                    spec.morphogen(), spec.width(), spec.height());
        };
    }

    private static TissueSpec with(TissueSpec spec, CircuitSetup circuit, ParameterMapping mapping,
            MorphogenSpec morphogen, double width, double height) {
        return new TissueSpec(circuit, mapping, morphogen, spec.domain().resized(width, height), spec.growth(),
                spec.fates(), spec.timing(), spec.extrinsic(), spec.others());
    }
}
