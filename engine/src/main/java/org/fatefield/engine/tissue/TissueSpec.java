package org.fatefield.engine.tissue;

import java.util.ArrayList;
import java.util.List;
import org.fatefield.engine.coupling.ParameterMapping;
import org.fatefield.engine.coupling.SignalCoupling;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.mechanics.DomainShape;
import org.fatefield.engine.variability.ExtrinsicNoise;

/**
 * Everything a tissue run needs, validated: the model objects a scenario file becomes.
 *
 * @param circuit   the circuit in every cell and its simulation method
 * @param mapping   how the local morphogen sets the circuit's parameters
 * @param morphogen morphogen physics
 * @param width     domain width (µm), greater than 0
 * @param height    domain height (µm), greater than 0
 * @param growth    founders, size, mechanics and division
 * @param fates     the fate rules
 * @param timing    duration, step and recording interval
 * @param extrinsic cell-to-cell parameter variability, inherited at division
 * @param others    further fields besides the primary morphogen (indices 1, 2, ... for couplings)
 */
public record TissueSpec(CircuitSetup circuit, ParameterMapping mapping, MorphogenSpec morphogen, double width,
        double height, GrowthSpec growth, FateClassifier fates, Timing timing, List<ExtrinsicNoise> extrinsic,
        List<MorphogenSpec> others) {

    /** A tissue with one field. */
    public TissueSpec(CircuitSetup circuit, ParameterMapping mapping, MorphogenSpec morphogen, double width,
            double height, GrowthSpec growth, FateClassifier fates, Timing timing, List<ExtrinsicNoise> extrinsic) {
        this(circuit, mapping, morphogen, width, height, growth, fates, timing, extrinsic, List.of());
    }

    /** All fields, the primary first. */
    public List<MorphogenSpec> fields() {
        List<MorphogenSpec> all = new ArrayList<>();
        all.add(morphogen);
        all.addAll(others);
        return all;
    }

    /** A tissue without extrinsic variability. */
    public TissueSpec(CircuitSetup circuit, ParameterMapping mapping, MorphogenSpec morphogen, double width,
            double height, GrowthSpec growth, FateClassifier fates, Timing timing) {
        this(circuit, mapping, morphogen, width, height, growth, fates, timing, List.of());
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
        if (!(width > 0) || !(height > 0) || Double.isInfinite(width) || Double.isInfinite(height)) {
            throw new IllegalArgumentException("domain must be finite with positive width and height, got "
                    + width + " x " + height);
        }
        if (mapping.parameterCount() != circuit.network().parameterNames().size()) {
            throw new IllegalArgumentException("parameter mapping has " + mapping.parameterCount()
                    + " parameters but the circuit has " + circuit.network().parameterNames().size());
        }
        if (growth.size().variable() && circuit.noise() != NoiseMode.LANGEVIN && circuit.noise() != NoiseMode.NONE) {
            throw new IllegalArgumentException("cells of unequal volume (size control " + growth.size().control()
                    + ", volume split cv " + growth.size().splitCv() + ") need Langevin or deterministic circuits: the"
                    + " molecule-count methods assume every newborn has the same volume");
        }
        if (growth.shape() == DomainShape.STRIP) {
            List<MorphogenSpec> all = new ArrayList<>(others);
            all.add(morphogen);
            for (MorphogenSpec field : all) {
                double squares = height / field.gridSpacing();
                if (Math.abs(squares - Math.round(squares)) > 1e-6 * squares || Math.round(squares) < 3) {
                    throw new IllegalArgumentException("a strip's height must be a whole number of morphogen grid"
                            + " squares, at least three, so the fields wrap around exactly: height " + height
                            + " µm / grid spacing " + field.gridSpacing() + " µm = " + squares
                            + "; change tissue.height or the grid spacing");
                }
            }
        }
        if (2 * growth.cellRadius() > Math.min(width, height)) {
            throw new IllegalArgumentException("a cell of radius " + growth.cellRadius()
                    + " µm does not fit in a " + width + " x " + height + " µm domain");
        }
    }
}
