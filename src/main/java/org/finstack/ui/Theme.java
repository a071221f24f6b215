package org.finstack.ui;

import com.formdev.flatlaf.FlatLaf;
import java.awt.Color;
import java.util.List;
import javax.swing.UIManager;
import org.finstack.ui.draw.Palette;

/** The two themes and the drawing palette each gives. */
public enum Theme {
    /** Light. */
    LIGHT,
    /** Dark. */
    DARK;

    /** Installs the theme's look and feel (call on the event thread, before or between windows). */
    public void install() {
        FlatLaf.setup(this == DARK ? new FinstackDarkLaf() : new FinstackLightLaf());
    }

    /**
     * @param name a stored name
     * @return the theme, light when unknown
     */
    public static Theme parse(String name) {
        return "DARK".equalsIgnoreCase(name) ? DARK : LIGHT;
    }

    /** @return the drawing colours from the installed theme's {@code Finstack.*} keys */
    public static Palette palette() {
        Palette d = Palette.PLAIN;
        return new Palette(color("Finstack.drawing.background", d.background()), color("Finstack.drawing.fin", d.fin()),
                color("Finstack.drawing.finEdge", d.finEdge()), color("Finstack.drawing.tube", d.tube()),
                color("Finstack.drawing.bore", d.bore()), color("Finstack.drawing.text", d.text()),
                color("Finstack.drawing.dimension", d.dimension()), color("Finstack.drawing.bar", d.bar()),
                List.of(color("Finstack.circuit.1", d.circuit(0)), color("Finstack.circuit.2", d.circuit(1)),
                        color("Finstack.circuit.3", d.circuit(2)), color("Finstack.circuit.4", d.circuit(3)),
                        color("Finstack.circuit.5", d.circuit(4)), color("Finstack.circuit.6", d.circuit(5)),
                        color("Finstack.circuit.7", d.circuit(6)), color("Finstack.circuit.8", d.circuit(7))));
    }

    /**
     * @param key      a {@code Finstack.*} key
     * @param fallback used when the theme lacks the key
     * @return the colour
     */
    public static Color color(String key, Color fallback) {
        Color c = UIManager.getColor(key);
        return c == null ? fallback : c;
    }
}
