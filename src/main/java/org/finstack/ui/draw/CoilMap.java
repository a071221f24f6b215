package org.finstack.ui.draw;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.Objects;
import java.util.function.DoubleFunction;
import org.finstack.coil.Circuiting;
import org.finstack.coil.Rating.TubeResult;
import org.finstack.geometry.CoilGeometry;

/**
 * The tube-by-tube rating on the coil's face view: every tube placed as in {@link TubeSheetView}
 * and filled with a colour for its refrigerant temperature (the mean of entering and leaving) or
 * its vapour quality (the mean of entering and leaving; single-phase tubes in a neutral grey),
 * each circuit traced in its own colour through its tubes in flow order and ringing them, and a
 * legend at the right. The colour scale runs from blue (coldest, or liquid) to red (warmest, or
 * vapour). Nothing here knows Swing; the workbench paints it into a component.
 */
public final class CoilMap {

    /** Width kept at the right for the legend [px]. */
    static final double LEGEND_WIDTH = 118;

    /** Fill of a tube whose refrigerant is single-phase all through, in the quality view. */
    public static final Color SINGLE_PHASE = new Color(0x9A9A9A);

    /** The scale's colours from its low end to its high end (a blue-to-red ramp of our own). */
    private static final Color[] RAMP = {new Color(0x2C5DA8), new Color(0x3FA3C8), new Color(0x9CCB86),
        new Color(0xF2C14E), new Color(0xD2452F)};

    private CoilMap() {
    }

    /** What the tubes are coloured by. */
    public enum Colouring {
        /** Mean refrigerant temperature in the tube. */
        TEMPERATURE,
        /** Mean vapour quality in the tube. */
        QUALITY
    }

    /**
     * The texts the map writes.
     *
     * @param title       legend title (e.g. "refrigerant temperature")
     * @param value       formats a scale value for the legend (kelvin or quality)
     * @param singlePhase label of the single-phase swatch in the quality view
     * @param air         label of the air arrow
     */
    public record Labels(String title, DoubleFunction<String> value, String singlePhase, String air) {

        /** Checks the parts are present. */
        public Labels {
            Objects.requireNonNull(title, "title");
            Objects.requireNonNull(value, "value");
            Objects.requireNonNull(singlePhase, "singlePhase");
            Objects.requireNonNull(air, "air");
        }
    }

    /**
     * A linear colour scale.
     *
     * @param min value at the low (blue) end
     * @param max value at the high (red) end
     */
    public record Scale(double min, double max) {

        /**
         * @param v a value
         * @return its colour; values outside the range take the end colours; a scale with
         *         {@code min == max} gives the middle colour
         */
        public Color colour(double v) {
            double f = max > min ? (v - min) / (max - min) : 0.5;
            f = Math.max(0, Math.min(1, f));
            double pos = f * (RAMP.length - 1);
            int i = Math.min(RAMP.length - 2, (int) Math.floor(pos));
            double t = pos - i;
            Color a = RAMP[i];
            Color b = RAMP[i + 1];
            return new Color((int) Math.round(a.getRed() + t * (b.getRed() - a.getRed())),
                    (int) Math.round(a.getGreen() + t * (b.getGreen() - a.getGreen())),
                    (int) Math.round(a.getBlue() + t * (b.getBlue() - a.getBlue())));
        }
    }

    /**
     * @param t a tube
     * @param c what to colour by
     * @return the tube's value: mean refrigerant temperature [K], or mean quality [-] of the ends
     *         that are two-phase, or NaN when the refrigerant is single-phase at both ends
     */
    public static double value(TubeResult t, Colouring c) {
        if (c == Colouring.TEMPERATURE) {
            return (t.refrigerantInTemperature() + t.refrigerantOutTemperature()) / 2;
        }
        boolean in = t.qualityIn() >= 0;
        boolean out = t.qualityOut() >= 0;
        if (in && out) {
            return (t.qualityIn() + t.qualityOut()) / 2;
        }
        return in ? t.qualityIn() : out ? t.qualityOut() : Double.NaN;
    }

    /**
     * @param tubes the tubes
     * @param c     what to colour by
     * @return the scale: the tubes' temperature range, or quality 0 to 1
     */
    public static Scale scale(List<TubeResult> tubes, Colouring c) {
        if (c == Colouring.QUALITY) {
            return new Scale(0, 1);
        }
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (TubeResult t : tubes) {
            double v = value(t, c);
            min = Math.min(min, v);
            max = Math.max(max, v);
        }
        return tubes.isEmpty() ? new Scale(0, 1) : new Scale(min, max);
    }

    /**
     * @param t a tube
     * @param c what to colour by
     * @param s the scale
     * @return the tube's fill
     */
    public static Color fill(TubeResult t, Colouring c, Scale s) {
        double v = value(t, c);
        return Double.isNaN(v) ? SINGLE_PHASE : s.colour(v);
    }

    /**
     * @param coil the coil
     * @param area the whole area of the map, legend included [px]
     * @return where the tubes land (the legend's strip at the right left out)
     */
    public static TubeSheetView.Layout layout(CoilGeometry coil, Rectangle2D area) {
        return TubeSheetView.layout(coil, new Rectangle2D.Double(area.getX(), area.getY(),
                Math.max(1, area.getWidth() - LEGEND_WIDTH), area.getHeight()));
    }

    /**
     * @param layout the map's layout
     * @return the width of the ring in the circuit's colour round each tube [px]
     */
    public static double ringWidth(TubeSheetView.Layout layout) {
        return Math.max(3, layout.collarRadius() * 0.3);
    }

    /**
     * @param area the whole area of the map [px]
     * @return the legend's colour bar [px]
     */
    public static Rectangle2D legendBar(Rectangle2D area) {
        double x = area.getMaxX() - LEGEND_WIDTH + 14;
        double top = area.getY() + 40;
        double h = Math.max(20, Math.min(260, area.getHeight() - 110));
        return new Rectangle2D.Double(x, top, 18, h);
    }

    /**
     * @param layout the map's layout
     * @param tubes  the tubes
     * @param p      a point [px]
     * @return the tube under the point, or null
     */
    public static TubeResult tubeAt(TubeSheetView.Layout layout, List<TubeResult> tubes, Point2D p) {
        double r = layout.collarRadius();
        for (TubeResult t : tubes) {
            if (t.row() < layout.coil().rows() && t.position() < layout.coil().tubesPerRow()
                    && layout.centre(t.row(), t.position()).distance(p) <= r) {
                return t;
            }
        }
        return null;
    }

    /**
     * Paints the map.
     *
     * @param g          where to paint
     * @param area       the area [px]
     * @param coil       the coil
     * @param circuiting the tubes' flow order per circuit
     * @param tubes      the per-tube results ({@code Rating.tubes()})
     * @param colouring  what to colour by
     * @param palette    the colours (circuits, plate, text)
     * @param labels     the texts
     */
    public static void paint(Graphics2D g, Rectangle2D area, CoilGeometry coil, Circuiting circuiting,
            List<TubeResult> tubes, Colouring colouring, Palette palette, Labels labels) {
        Graphics2D g2 = palette.canvas(g, area);
        try {
            TubeSheetView.Layout l = layout(coil, area);
            g2.setColor(palette.fin());
            g2.fill(l.plate());
            g2.setColor(palette.finEdge());
            g2.setStroke(new BasicStroke(1f));
            g2.draw(l.plate());
            double rc = l.collarRadius();
            float route = (float) Math.max(2, rc * 0.45);
            for (int c = 0; c < circuiting.count(); c++) {
                List<Circuiting.Tube> path = circuiting.circuits().get(c);
                Path2D line = new Path2D.Double();
                for (int i = 0; i < path.size(); i++) {
                    Point2D p = l.centre(path.get(i).row(), path.get(i).position());
                    if (i == 0) {
                        line.moveTo(p.getX(), p.getY());
                    } else {
                        line.lineTo(p.getX(), p.getY());
                    }
                }
                g2.setColor(palette.circuit(c));
                g2.setStroke(new BasicStroke(route, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
                g2.draw(line);
            }
            int[][] circuitOf = circuiting.circuitOfTube();
            Scale s = scale(tubes, colouring);
            float ring = (float) ringWidth(l);
            for (TubeResult t : tubes) {
                if (t.row() >= coil.rows() || t.position() >= coil.tubesPerRow()) {
                    continue;
                }
                Point2D c = l.centre(t.row(), t.position());
                Ellipse2D disc = new Ellipse2D.Double(c.getX() - rc, c.getY() - rc, 2 * rc, 2 * rc);
                g2.setColor(fill(t, colouring, s));
                g2.fill(disc);
                g2.setColor(palette.circuit(circuitOf[t.row()][t.position()]));
                g2.setStroke(new BasicStroke(ring));
                double ir = rc - ring / 2;
                g2.draw(new Ellipse2D.Double(c.getX() - ir, c.getY() - ir, 2 * ir, 2 * ir));
            }
            legend(g2, area, s, colouring, palette, labels);
            air(g2, l.plate(), palette, labels.air());
        } finally {
            g2.dispose();
        }
    }

    private static void legend(Graphics2D g2, Rectangle2D area, Scale s, Colouring colouring, Palette palette,
            Labels labels) {
        Rectangle2D bar = legendBar(area);
        int steps = (int) Math.max(1, bar.getHeight());
        for (int i = 0; i < steps; i++) {
            double f = 1 - (i + 0.5) / steps;
            g2.setColor(s.colour(s.min() + f * (s.max() - s.min())));
            g2.fill(new Rectangle2D.Double(bar.getX(), bar.getY() + bar.getHeight() * i / steps, bar.getWidth(),
                    bar.getHeight() / steps + 0.5));
        }
        g2.setColor(palette.finEdge());
        g2.setStroke(new BasicStroke(1f));
        g2.draw(bar);
        g2.setColor(palette.text());
        g2.setFont(g2.getFont().deriveFont(Font.BOLD, 11f));
        g2.drawString(labels.title(), (float) (bar.getX() - 8), (float) (bar.getY() - 14));
        g2.setFont(g2.getFont().deriveFont(Font.PLAIN, 11f));
        float tx = (float) (bar.getMaxX() + 6);
        g2.drawString(labels.value().apply(s.max()), tx, (float) (bar.getY() + 9));
        g2.drawString(labels.value().apply((s.min() + s.max()) / 2), tx, (float) (bar.getCenterY() + 4));
        g2.drawString(labels.value().apply(s.min()), tx, (float) bar.getMaxY());
        if (colouring == Colouring.QUALITY) {
            Rectangle2D swatch = new Rectangle2D.Double(bar.getX(), bar.getMaxY() + 14, bar.getWidth(), 14);
            g2.setColor(SINGLE_PHASE);
            g2.fill(swatch);
            g2.setColor(palette.text());
            g2.drawString(labels.singlePhase(), tx, (float) swatch.getMaxY() - 2);
        }
    }

    private static void air(Graphics2D g2, Rectangle2D plate, Palette palette, String air) {
        double y = plate.getCenterY();
        double x1 = plate.getX() - 40;
        double x2 = plate.getX() - 8;
        g2.setColor(palette.dimension());
        g2.setStroke(new BasicStroke(2f));
        g2.draw(new java.awt.geom.Line2D.Double(x1, y, x2 - 6, y));
        Path2D head = new Path2D.Double();
        head.moveTo(x2, y);
        head.lineTo(x2 - 9, y - 5);
        head.lineTo(x2 - 9, y + 5);
        head.closePath();
        g2.fill(head);
        g2.setFont(g2.getFont().deriveFont(Font.BOLD, 12f));
        g2.drawString(air, (float) x1, (float) (y - 8));
    }
}
