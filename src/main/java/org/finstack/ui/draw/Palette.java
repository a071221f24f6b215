package org.finstack.ui.draw;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.Objects;

/**
 * The colours a drawing uses. The workbench fills it from the theme's {@code Finstack.*} keys;
 * tests and exports may use {@link #PLAIN}.
 *
 * @param background behind the drawing
 * @param fin        fin plates
 * @param finEdge    fin outlines
 * @param tube       tube metal in section
 * @param bore       the inside of a tube
 * @param text       labels
 * @param dimension  dimension lines and the air arrow
 * @param bar        the bars of the resistance picture
 * @param circuits   one colour per circuit, repeated when there are more circuits
 */
public record Palette(Color background, Color fin, Color finEdge, Color tube, Color bore, Color text,
        Color dimension, Color bar, List<Color> circuits) {

    /** A light palette of our own, for exports and tests. */
    public static final Palette PLAIN = new Palette(new Color(0xFBFAF6), new Color(0xDCE3E0), new Color(0x8FA39C),
            new Color(0xB0683A), new Color(0xFBFAF6), new Color(0x1F2A28), new Color(0x2F6F86), new Color(0x3C8D7B),
            List.of(new Color(0xC4573A), new Color(0x2E7FA8), new Color(0x8A9A2C), new Color(0x7A4E9C),
                    new Color(0xD19A1E), new Color(0x2F8F6B), new Color(0xA8406E), new Color(0x4D5FB0)));

    /** Checks the parts are present. */
    public Palette {
        Objects.requireNonNull(background, "background");
        circuits = List.copyOf(circuits);
        if (circuits.isEmpty()) {
            throw new IllegalArgumentException("at least one circuit colour");
        }
    }

    /**
     * Starts a drawing: a copy of the graphics, smoothed (shapes and text), with the area filled in
     * the background colour. The caller disposes of it.
     *
     * @param g    the graphics to draw on
     * @param area the drawing's area
     * @return the copy to draw with
     */
    public Graphics2D canvas(Graphics2D g, Rectangle2D area) {
        Graphics2D g2 = (Graphics2D) g.create();
        g2.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g2.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g2.setColor(background);
        g2.fill(area);
        return g2;
    }

    /**
     * @param circuit a circuit number, from 0
     * @return its colour
     */
    public Color circuit(int circuit) {
        return circuits.get(Math.floorMod(circuit, circuits.size()));
    }
}
