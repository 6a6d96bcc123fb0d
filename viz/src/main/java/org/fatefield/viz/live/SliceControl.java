package org.fatefield.viz.live;

import java.util.Locale;
import java.util.function.DoubleConsumer;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSlider;

/**
 * The depth slider of the live window for a 3-D tissue: which plane z the picture cuts, from
 * the bottom face to the top one in 1% steps, with the plane's depth in µm beside it. Hidden for
 * a flat tissue.
 */
final class SliceControl extends JPanel {

    private final JSlider slider = new JSlider(0, 100, 50);
    private final JLabel label = new JLabel();
    private double depth;

    /** A control that tells {@code onChange} the plane's depth (µm) whenever the slider moves. */
    SliceControl(DoubleConsumer onChange) {
        add(label);
        add(slider);
        slider.addChangeListener(e -> {
            double plane = plane();
            label.setText(text(plane));
            onChange.accept(plane);
        });
        setVisible(false);
    }

    /** Shows the control for a tissue {@code value} µm deep (hides it for 0), keeping the slider's place. */
    void setDepth(double value) {
        depth = value;
        setVisible(value > 0);
        label.setText(text(plane()));
    }

    /** The plane the slider stands at (µm). */
    double plane() {
        return depth * slider.getValue() / 100.0;
    }

    private String text(double plane) {
        return String.format(Locale.ROOT, "slice z = %.1f of %.1f µm", plane, depth);
    }
}
