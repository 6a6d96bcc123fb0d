package org.fatefield.viz.live;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.GridLayout;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;
import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.awt.geom.Point2D;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleFunction;
import java.util.function.Function;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSlider;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.JToggleButton;
import javax.swing.KeyStroke;
import javax.swing.ScrollPaneConstants;
import javax.swing.SwingUtilities;
import javax.swing.Timer;
import org.fatefield.circuits.analysis.QuasiPotential;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.viz.chart.FateProportionChart;
import org.jfree.chart.ChartPanel;
import sim.display.Display2D;
import sim.portrayal.LocationWrapper;
import sim.util.Bag;

/**
 * The live window: the tissue on MASON's 2D display (cells over the morphogen heat map, zoom by
 * the zoom slider, pan by the scroll bars), our own controls (play, pause, step, reset with new
 * settings, speed, colour mode, field on or off; in 3-D the depth of the slice shown), a legend,
 * the clicked cell's state and lineage, and four live charts (fate proportions with population;
 * the landscape at the clicked cell's local control parameter; cells over the bifurcation
 * branches; the clicked cell's trace back through its ancestors). MASON's own header, console
 * and movie button are not shown; frames are recorded by {@code run --frames}.
 */
public final class TissueWindow extends JFrame {

    private static final long serialVersionUID = 1L;

    private final Function<String, Tissue> factory;
    private final JTextField settings = new JTextField(28);
    private final List<Branch> branches;
    private final String parameter;
    private final LandscapeView landscapes;
    private TissueGui gui;
    private Display2D display;
    private final JPanel canvasHolder = new JPanel(new BorderLayout()) {
        private static final long serialVersionUID = 1L;

        /** The full width of the left column, at the tissue's aspect (at most 3/4 of the window's height). */
        @Override
        public Dimension getPreferredSize() {
            int width = getParent() != null && getParent().getWidth() > 0 ? getParent().getWidth() : 820;
            if (gui == null) {
                return new Dimension(width, 420);
            }
            double aspect = gui.tissue().spec().height() / gui.tissue().spec().width();
            int limit = TissueWindow.this.getHeight() > 0 ? TissueWindow.this.getHeight() * 3 / 4 : 620;
            return new Dimension(width, Math.min(limit, (int) Math.ceil(width * aspect) + 8));
        }
    };
    private final JTextArea info = new JTextArea(8, 28);
    private final JLabel status = new JLabel(" ");
    private final JPanel chartHolder = new JPanel(new GridLayout(2, 2));
    private LiveCharts charts;
    private ChartPanel proportions;
    private final JSlider speed = new JSlider(1, 50, 5);
    private final JSlider zoom = new JSlider(10, 80, 10);
    private final SliceControl slice = new SliceControl(plane -> {
        gui.setSlicePlane(plane);
        display.repaint();
    });
    private final JCheckBox showField = new JCheckBox("morphogen", true);
    private final JComboBox<ColourChoice> colour = new JComboBox<>();
    private final JLabel settingsProblem = new JLabel(" ");
    private final LegendStrip legendStrip = new LegendStrip(() -> gui, this::pixelsPerMicron, showField::isSelected);
    private final Timer timer;

    /**
     * @param title     window title
     * @param factory   makes a fresh (unstarted) tissue for each reset from the settings text
     *                  ({@code key = value; ...}); throws IllegalArgumentException with a message if they are wrong
     * @param branches  the circuit's steady-state branches along the control parameter
     * @param parameter the control parameter's name
     * @param landscape the circuit's landscape at a value of the control parameter, or null when
     *                  it cannot be computed for this circuit
     */
    public TissueWindow(String title, Function<String, Tissue> factory, List<Branch> branches, String parameter,
            DoubleFunction<QuasiPotential> landscape) {
        super(title);
        this.factory = factory;
        this.branches = branches;
        this.parameter = parameter;
        this.landscapes = new LandscapeView(landscape, parameter, branches);
        setDefaultCloseOperation(DISPOSE_ON_CLOSE);
        addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosed(WindowEvent e) {
                timer.stop();
                if (gui != null) {
                    gui.finish();
                }
            }
        });
        timer = new Timer(30, e -> advance(speed.getValue()));
        JToggleButton play = new JToggleButton("Play");
        play.addActionListener(e -> {
            play.setText(play.isSelected() ? "Pause" : "Play");
            if (play.isSelected()) {
                timer.start();
            } else {
                timer.stop();
            }
        });
        JButton step = new JButton("Step");
        step.addActionListener(e -> advance(1));
        JButton reset = new JButton("Reset");
        reset.addActionListener(e -> reset());
        JButton quit = new JButton("Quit");
        quit.setToolTipText("close the window and end the program (Ctrl+Q)");
        quit.addActionListener(e -> close());
        getRootPane().registerKeyboardAction(e -> close(),
                KeyStroke.getKeyStroke(KeyEvent.VK_Q, InputEvent.CTRL_DOWN_MASK), JComponent.WHEN_IN_FOCUSED_WINDOW);
        ColourChoice.all(factory.apply("").spec().circuit().network().speciesNames()).forEach(colour::addItem);
        colour.addActionListener(e -> {
            applyColour();
            display.repaint();
            legendStrip.repaint();
        });
        showField.addActionListener(e -> {
            attach();
            legendStrip.repaint();
        });
        JPanel controls = new JPanel();
        controls.add(play);
        controls.add(step);
        controls.add(reset);
        controls.add(quit);
        for (JComponent c : new JComponent[] {new JLabel("speed"), speed, new JLabel("zoom"), zoom}) {
            controls.add(c);
        }
        zoom.addChangeListener(e -> {
            display.setScale(zoom.getValue() / 10.0);
            display.repaint();
            legendStrip.repaint();
        });
        controls.add(new JLabel("colour by"));
        controls.add(colour);
        controls.add(showField);
        JPanel edits = new JPanel();
        edits.add(new JLabel("settings for the next reset (key = value; ...)"));
        edits.add(settings);
        settingsProblem.setForeground(new Color(0xB00020));
        edits.add(settingsProblem);
        edits.add(slice);
        JPanel top = new JPanel(new GridLayout(2, 1));
        top.add(controls);
        top.add(edits);
        info.setEditable(false);
        info.setBorder(BorderFactory.createTitledBorder("clicked cell"));
        chartHolder.setPreferredSize(new Dimension(760, 700));
        // The tissue takes the width of the left column at its own aspect, so no empty band
        // surrounds it; the legend and the clicked cell's text fill the rest of the column.
        JPanel below = new JPanel(new BorderLayout());
        below.add(legendStrip, BorderLayout.NORTH);
        below.add(info, BorderLayout.CENTER);
        JPanel left = new JPanel(new BorderLayout());
        left.add(canvasHolder, BorderLayout.NORTH);
        left.add(below, BorderLayout.CENTER);
        JPanel south = new JPanel(new BorderLayout());
        south.add(status, BorderLayout.WEST);
        add(top, BorderLayout.NORTH);
        add(left, BorderLayout.CENTER);
        canvasHolder.addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent e) {
                fitCanvas();
            }
        });
        add(chartHolder, BorderLayout.EAST);
        add(south, BorderLayout.SOUTH);
        reset();
        pack();
    }

    /** Starts a fresh tissue with the current settings. */
    public void reset() {
        timer.stop();
        Tissue tissue;
        try {
            tissue = factory.apply(settings.getText());
        } catch (IllegalArgumentException e) {
            String message = e.getMessage() == null ? "not a valid setting" : e.getMessage();
            settingsProblem.setText("not applied: " + (message.length() > 90 ? message.substring(0, 88) + "…" : message));
            settingsProblem.setToolTipText(message);
            if (gui != null) {
                return;
            }
            tissue = factory.apply("");
        }
        if (!settings.getText().isBlank() && tissue != null) {
            settingsProblem.setText(" ");
        }
        if (gui != null) {
            gui.finish();
        }
        gui = new TissueGui(tissue);
        gui.start();
        slice.setDepth(tissue.spec().domain().depth());
        gui.setSlicePlane(slice.plane());
        double scale = Math.min(820 / tissue.spec().width(), 620 / tissue.spec().height());
        display = new Display2D(tissue.spec().width() * scale, tissue.spec().height() * scale, gui);
        display.header.setVisible(false);
        // MASON always shows both scroll bars; show them only when zoomed past the window.
        display.display.setVerticalScrollBarPolicy(ScrollPaneConstants.VERTICAL_SCROLLBAR_AS_NEEDED);
        display.display.setHorizontalScrollBarPolicy(ScrollPaneConstants.HORIZONTAL_SCROLLBAR_AS_NEEDED);
        display.setBackdrop(Color.WHITE);
        display.insideDisplay.removeListeners();
        display.insideDisplay.addMouseListener(new MouseAdapter() {
            @Override
            public void mouseClicked(MouseEvent e) {
                select(e.getPoint());
            }
        });
        attach();
        display.reset();
        canvasHolder.removeAll();
        canvasHolder.add(display, BorderLayout.CENTER);
        charts = new LiveCharts(tissue, branches, parameter);
        proportions = new ChartPanel(FateProportionChart.create(tissue.series(), "Fate proportions"));
        chartHolder.removeAll();
        chartHolder.add(proportions);
        chartHolder.add(landscapes.panel());
        chartHolder.add(new ChartPanel(charts.phase()));
        chartHolder.add(new ChartPanel(charts.trace()));
        applyColour();
        landscapes.showMiddle(species());
        refresh();
        revalidate();
        SwingUtilities.invokeLater(this::fitCanvas);
    }

    /**
     * Sizes the tissue at zoom 1 to fill the space the window gives the canvas (keeping its
     * aspect), so that scroll bars appear only when zoomed in.
     */
    private void fitCanvas() {
        int w = canvasHolder.getWidth() - 8;
        int h = canvasHolder.getHeight() - 8;
        if (display == null || gui == null || w <= 0 || h <= 0) {
            return;
        }
        double width = gui.tissue().spec().width();
        double height = gui.tissue().spec().height();
        double fit = Math.min(w / width, h / height);
        display.insideDisplay.width = width * fit;
        display.insideDisplay.height = height * fit;
        display.setScale(zoom.getValue() / 10.0);
        display.display.revalidate();
        display.repaint();
    }

    private void attach() {
        display.detatchAll();
        display.attach(gui.field(), "morphogen", showField.isSelected());
        display.attach(gui.cells(), "cells");
        display.repaint();
    }

    /** Stops the clock and closes the window, as its close button does (the view command then ends). */
    public void close() {
        timer.stop();
        dispatchEvent(new WindowEvent(this, WindowEvent.WINDOW_CLOSING));
    }

    /** Advances the tissue by {@code steps} steps and refreshes the view. */
    public void advance(int steps) {
        gui.tissue().advance(steps);
        gui.sync();
        refresh();
    }

    private void refresh() {
        Tissue t = gui.tissue();
        status.setText(String.format(Locale.ROOT, "  t = %.2f h, %d cells", t.time(), t.cells().size()));
        proportions.setChart(FateProportionChart.create(t.series(), "Fate proportions"));
        charts.update(t);
        legendStrip.repaint();
        describeSelection();
        display.repaint();
    }

    private void select(Point2D point) {
        Bag[] hits = display.objectsHitBy(point);
        gui.select(null);
        for (Bag bag : hits) {
            for (Object o : bag) {
                if (o instanceof LocationWrapper w && w.getObject() instanceof Cell c) {
                    gui.select(c);
                }
            }
        }
        describeSelection();
        landscapeForSelection();
        display.repaint();
    }

    private void landscapeForSelection() {
        Cell c = gui.selected();
        if (c != null) {
            landscapes.show(gui.tissue().spec().mapping().controlAt(gui.tissue().signalAt(c)), "clicked cell's local value",
                    species());
        }
    }

    private void describeSelection() {
        Cell c = gui.selected();
        charts.showTrace(gui.selectedTrace());
        if (gui.selectedId() < 0) {
            info.setText("click a cell");
            return;
        }
        Tissue t = gui.tissue();
        if (c == null) {
            info.setText(String.format(Locale.ROOT, "cell %d has divided or died; click one of its daughters",
                    gui.selectedId()));
            return;
        }
        info.setText(CellDescription.of(t, c, parameter));
    }

    private List<String> species() {
        return gui.tissue().spec().circuit().network().speciesNames();
    }

    /** Switches the colour mode as if chosen in the "colour by" list (species mode: the first species). */
    public void setColourMode(TissueGui.ColourMode mode) {
        for (int k = 0; k < colour.getItemCount(); k++) {
            if (colour.getItemAt(k).mode() == mode) {
                colour.setSelectedIndex(k);
                return;
            }
        }
    }

    private void applyColour() {
        ColourChoice choice = (ColourChoice) colour.getSelectedItem();
        if (choice != null && gui != null) {
            gui.setSpecies(choice.species());
            gui.setMode(choice.mode());
        }
    }

    /** Screen pixels per µm of the tissue at the current zoom (for the scale bar). */
    private double pixelsPerMicron() {
        if (display == null || gui == null) {
            return 0;
        }
        return display.insideDisplay.width * display.getScale() / gui.tissue().spec().width();
    }

    /** Selects {@code cell} as if it had been clicked (for scripted screenshots and tests). */
    public void inspect(Cell cell) {
        gui.select(cell);
        describeSelection();
        landscapeForSelection();
        display.repaint();
    }

    /** Number of samples in the selected cell's trace, 0 if none is selected or it has gone. */
    public int selectedTraceSamples() {
        CellTraces.Trace t = gui.selectedTrace();
        return t == null ? 0 : t.size();
    }

    /** The current view state (for tests and screenshots). */
    public TissueGui gui() {
        return gui;
    }
}
