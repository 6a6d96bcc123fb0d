package org.fatefield.engine.tissue;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.fatefield.engine.coupling.ParameterMapping;
import org.fatefield.engine.coupling.SignalCoupling;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.variability.ExtrinsicNoise;

/**
 * Everything a tissue run needs, validated: the model objects a scenario file becomes. Built
 * with {@link #of} and, for variability and further fields, the {@code with} copies.
 *
 * @param circuit   the circuit in every cell and its simulation method
 * @param mapping   how the local morphogen sets the circuit's parameters
 * @param morphogen morphogen physics
 * @param domain    where cells live (the fields fill its width x height rectangle)
 * @param growth    founders, size, mechanics and division
 * @param fates     the fate rules
 * @param timing    duration, step and recording interval
 * @param extrinsic cell-to-cell parameter variability, inherited at division
 * @param others    further fields besides the primary morphogen (indices 1, 2, ... for couplings)
 */
public record TissueSpec(CircuitSetup circuit, ParameterMapping mapping, MorphogenSpec morphogen, Domain domain,
        GrowthSpec growth, FateClassifier fates, Timing timing, List<ExtrinsicNoise> extrinsic,
        List<MorphogenSpec> others) {

    /** A tissue with one field and no extrinsic variability. */
    public static TissueSpec of(CircuitSetup circuit, ParameterMapping mapping, MorphogenSpec morphogen,
            Domain domain, GrowthSpec growth, FateClassifier fates, Timing timing) {
        return new TissueSpec(circuit, mapping, morphogen, domain, growth, fates, timing, List.of(), List.of());
    }

    /** With cell-to-cell parameter variability {@code value}. */
    public TissueSpec withExtrinsic(List<ExtrinsicNoise> value) {
        return new TissueSpec(circuit, mapping, morphogen, domain, growth, fates, timing, value, others);
    }

    /** With the further fields {@code value} besides the primary morphogen. */
    public TissueSpec withOtherFields(List<MorphogenSpec> value) {
        return new TissueSpec(circuit, mapping, morphogen, domain, growth, fates, timing, extrinsic, value);
    }

    /** With another domain (shape and size). */
    public TissueSpec withDomain(Domain value) {
        return new TissueSpec(circuit, mapping, morphogen, value, growth, fates, timing, extrinsic, others);
    }

    /** With other growth and division rules. */
    public TissueSpec withGrowth(GrowthSpec value) {
        return new TissueSpec(circuit, mapping, morphogen, domain, value, fates, timing, extrinsic, others);
    }

    /** With other timing. */
    public TissueSpec withTiming(Timing value) {
        return new TissueSpec(circuit, mapping, morphogen, domain, growth, fates, value, extrinsic, others);
    }

    /** Domain width (µm). */
    public double width() {
        return domain.width();
    }

    /** Domain height (µm). */
    public double height() {
        return domain.height();
    }

    /** All fields, the primary first. */
    public List<MorphogenSpec> fields() {
        List<MorphogenSpec> all = new ArrayList<>();
        all.add(morphogen);
        all.addAll(others);
        return all;
    }

    /** Checks that the parts fit together. */
    public TissueSpec {
        extrinsic = List.copyOf(extrinsic);
        others = List.copyOf(others);
        for (SignalCoupling coupling : mapping.couplings()) {
            if (coupling.field() > others.size()) {
                throw new IllegalArgumentException("coupling of " + coupling.label() + " reads field " + coupling.field()
                        + " but the tissue has " + (others.size() + 1) + " fields");
            }
        }
        Objects.requireNonNull(domain, "domain");
        double width = domain.width();
        double height = domain.height();
        if (mapping.parameterCount() != circuit.network().parameterNames().size()) {
            throw new IllegalArgumentException("parameter mapping has " + mapping.parameterCount()
                    + " parameters but the circuit has " + circuit.network().parameterNames().size());
        }
        if (growth.size().variable() && circuit.noise() != NoiseMode.LANGEVIN && circuit.noise() != NoiseMode.NONE) {
            throw new IllegalArgumentException("cells of unequal volume (size control " + growth.size().control()
                    + ", volume split cv " + growth.size().splitCv() + ") need Langevin or deterministic circuits: the"
                    + " molecule-count methods assume every newborn has the same volume");
        }
        domain.checkGrid(morphogen.gridSpacing());
        for (MorphogenSpec field : others) {
            domain.checkGrid(field.gridSpacing());
        }
        if (2 * growth.cellRadius() > Math.min(width, height)) {
            throw new IllegalArgumentException("a cell of radius " + growth.cellRadius()
                    + " µm does not fit in a " + width + " x " + height + " µm domain");
        }
    }
}
