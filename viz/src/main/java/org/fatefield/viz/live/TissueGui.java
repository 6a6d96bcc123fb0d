package org.fatefield.viz.live;

import java.awt.Color;
import java.util.List;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.field.MorphogenField;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.viz.palette.FatePalette;
import org.fatefield.viz.palette.SpeciesPalette;
import org.fatefield.viz.tissue.DepthSlice;
import sim.display.GUIState;
import sim.field.continuous.Continuous2D;
import sim.field.grid.DoubleGrid2D;
import sim.portrayal.continuous.ContinuousPortrayal2D;
import sim.portrayal.grid.FastValueGridPortrayal2D;
import sim.util.Double2D;
import sim.util.gui.ColorMap;

/**
 * The model side of the live view: a MASON GUIState over a tissue, keeping a continuous field of
 * cell positions and a grid of morphogen values in step with the engine for MASON's display (the
 * engine itself keeps its own arrays; these copies exist only for drawing). The y axis is flipped
 * so that the picture matches the headless images (y up).
 */
public final class TissueGui extends GUIState {

    /** How cells are coloured. */
    public enum ColourMode {
        /** By fate, the default fate in grey. */
        FATE,
        /** By the level of one species (see {@link #setSpecies}), light to dark in its colour. */
        SPECIES,
        /** By clone (descendants of one founder), in colours no fate uses. */
        CLONE,
        /**
         * By commitment: the fate's colour, pale when the cell has only just entered it and full
         * once it has held it for one mean cell cycle; uncommitted cells grey.
         */
        COMMITMENT
    }

    /** Samples of history kept per cell for the clicked cell's trace. */
    static final int TRACE_SAMPLES = 400;

    private final Tissue tissue;
    private final Continuous2D space;
    private final ContinuousPortrayal2D cellPortrayal = new ContinuousPortrayal2D();
    private final FastValueGridPortrayal2D fieldPortrayal = new FastValueGridPortrayal2D("morphogen", false);
    private DoubleGrid2D grid;
    private ColourMode mode = ColourMode.FATE;
    /** Id of the selected cell, or -1: cells are followed by id, as relocation replaces their objects. */
    private long selectedId = -1;
    private int species;
    private double speciesMax = 1;
    private double fieldMax = 1e-12;
    private CellTraces traces;
    /** Depth of the plane shown in a 3-D tissue (µm), mid-depth at first. */
    private double slicePlane;

    /**
     * A view of {@code tissue} (not yet started). The clicked cell's trace is taken by an
     * observer of the tissue's tick, so it sees every step however the tissue is advanced.
     */
    public TissueGui(Tissue tissue) {
        super(tissue);
        this.tissue = tissue;
        this.space = new Continuous2D(4 * tissue.spec().growth().cellRadius(), tissue.spec().width(),
                tissue.spec().height());
        this.slicePlane = DepthSlice.plane(tissue);
        tissue.addObserver(t -> traces.record(t.time(), t.cells()));
    }

    /** The tissue. */
    public Tissue tissue() {
        return tissue;
    }

    /** The cells' portrayal, for the display. */
    public ContinuousPortrayal2D cells() {
        return cellPortrayal;
    }

    /** The field's portrayal, for the display. */
    public FastValueGridPortrayal2D field() {
        return fieldPortrayal;
    }

    @Override
    public void start() {
        super.start();
        selectedId = -1;
        traces = new CellTraces(TRACE_SAMPLES, tissue.spec().circuit().network().speciesNames().size());
        MorphogenField f = tissue.field();
        grid = new DoubleGrid2D(f.columns(), f.rows());
        fieldPortrayal.setField(grid);
        fieldPortrayal.setMap(new ColorMap() {
            @Override
            public Color getColor(double level) {
                return FatePalette.morphogen(level / fieldMax);
            }

            @Override
            public int getRGB(double level) {
                return getColor(level).getRGB();
            }

            @Override
            public int getAlpha(double level) {
                return 255;
            }

            @Override
            public boolean validLevel(double level) {
                return true;
            }

            @Override
            public double defaultValue() {
                return 0;
            }
        });
        cellPortrayal.setField(space);
        cellPortrayal.setPortrayalForAll(new CellPortrayal(this));
        traces.record(tissue.time(), tissue.cells());
        sync();
    }

    /** Copies positions and field values into the display's fields; call after advancing the tissue. */
    public void sync() {
        space.clear();
        double height = tissue.spec().height();
        double max = 1e-12;
        for (Cell cell : tissue.cells()) {
            if (DepthSlice.drawnRadius(tissue, cell, slicePlane) > 0) {
                space.setObjectLocation(cell, new Double2D(cell.x(), height - cell.y()));
            }
            max = Math.max(max, cell.concentration(species));
        }
        speciesMax = max;
        MorphogenField f = tissue.field();
        fieldMax = Math.max(f.max(), 1e-12);
        int layer = DepthSlice.layer(f, slicePlane);
        for (int i = 0; i < f.columns(); i++) {
            for (int j = 0; j < f.rows(); j++) {
                grid.field[i][f.rows() - 1 - j] = f.value(i, j, layer);
            }
        }
    }

    /** The colour of {@code cell} in the current mode. */
    Color colourOf(Cell cell) {
        int fates = tissue.spec().fates().fateCount();
        return switch (mode) {
            case FATE -> FatePalette.fate(Math.max(0, cell.fate()), fates);
            case SPECIES -> SpeciesPalette.level(species, cell.concentration(species) / speciesMax);
            case CLONE -> SpeciesPalette.clone(tissue.ancestry().founder(cell.id()));
            case COMMITMENT -> cell.fate() < 0 ? FatePalette.fate(fates - 1, fates)
                    : FatePalette.held(cell.fate(), fates,
                            (tissue.time() - cell.fateSince()) / tissue.spec().growth().cycle().mean());
        };
    }

    /** Sets the colour mode. */
    public void setMode(ColourMode value) {
        this.mode = value;
    }

    /** Depth of the plane shown (µm); 0 in a flat tissue. */
    public double slicePlane() {
        return slicePlane;
    }

    /** Shows the plane z = {@code value} µm of a 3-D tissue (kept inside the depth), and syncs. */
    public void setSlicePlane(double value) {
        slicePlane = Math.min(Math.max(value, 0.0), tissue.spec().domain().depth());
        sync();
    }

    /** The colour mode. */
    public ColourMode mode() {
        return mode;
    }

    /**
     * Sets the species shown in {@link ColourMode#SPECIES} mode.
     *
     * @throws IllegalArgumentException if there is no such species
     */
    public void setSpecies(int index) {
        int count = tissue.spec().circuit().network().speciesNames().size();
        if (index < 0 || index >= count) {
            throw new IllegalArgumentException("species index must be from 0 to " + (count - 1) + ", got " + index);
        }
        this.species = index;
        if (grid != null) {
            sync();
        }
    }

    /** The species shown in species mode. */
    public int species() {
        return species;
    }

    /** Highest level of the shown species among live cells (the top of its colour bar). */
    public double speciesMax() {
        return speciesMax;
    }

    /** Highest morphogen level on the grid (the top of its colour bar). */
    public double fieldMax() {
        return fieldMax;
    }

    /** The selected cell if it is still alive, else null. */
    public Cell selected() {
        return selectedId < 0 ? null : tissue.cellById(selectedId).orElse(null);
    }

    /** Id of the selected cell (alive or not), -1 if none was selected. */
    public long selectedId() {
        return selectedId;
    }

    /** Selects a cell (or none, with null). */
    public void select(Cell cell) {
        this.selectedId = cell == null ? -1 : cell.id();
    }

    /** Recent history of the selected cell (back through its ancestors), or null. */
    CellTraces.Trace selectedTrace() {
        return selectedId < 0 ? null : traces.of(selectedId);
    }

    /** The live cells. */
    public List<Cell> liveCells() {
        return tissue.cells();
    }
}
