package org.fatefield.scenarios.output;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Figure labels in words: metric names and scenario key paths, with units from the schema. */
class AxisWordsTest {

    @Test
    void metricsReadAsWordsWithUnits() {
        assertEquals("progenitor boundary (µm along the gradient)", AxisWords.metric("boundary_progenitor_um"));
        assertEquals("photocyte boundary width, 10-90% (µm)", AxisWords.metric("width_photocyte_um"));
        assertEquals("fraction of cells that are shieldcyte at the end", AxisWords.metric("fraction_shieldcyte"));
        assertEquals("sister-fate agreement (fraction of sister pairs)", AxisWords.metric("sister_agreement"));
        assertEquals("made_up_metric", AxisWords.metric("made_up_metric"), "unknown names are kept");
    }

    @Test
    void keyPathsReadAsWordsWithTheSchemaUnit() {
        assertEquals("morphogen source 1: rate (1/h)", AxisWords.key("morphogen.source[1].rate"));
        assertEquals("morphogen: diffusion (µm²/h)", AxisWords.key("morphogen.diffusion"));
        assertEquals("circuit kinetics: basal (1/h)", AxisWords.key("circuit.kinetics.basal"));
        assertEquals("run: duration (h)", AxisWords.key("run.duration"));
    }
}
