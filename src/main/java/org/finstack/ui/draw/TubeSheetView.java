package org.finstack.ui.draw;

import java.awt.BasicStroke;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;
import org.finstack.geometry.Arrangement;
import org.finstack.geometry.CoilGeometry;

/**
 * The coil seen end-on, through the tube sheet, to scale: the fin plate as deep as the rows
 * and as high as the tubes in a row, every tube at its pitch (successive rows shifted by half a
 * transverse pitch when staggered), each collar coloured by its circuit, and the air entering
 * from the left. Default circuiting: the tubes split evenly among the circuits, each circuit a
 * band of neighbouring tubes through all rows, as a coil is usually fed.
 */
public final class TubeSheetView {

    private static final double MARGIN = 10;
    private static final double ARROW_SPACE = 46;
    private static final double LEGEND_SPACE = 22;

    private TubeSheetView() {
    }

    /**
     * Where a coil lands in an area: the scale and the plate's corner.
     *
     * @param coil  the coil
     * @param scale pixels per metre
     * @param plate the fin plate's rectangle in pixels
     */
    public record Layout(CoilGeometry coil, double scale, Rectangle2D plate) {

        /**
         * @param row  row number from the air inlet, from 0
         * @param tube tube number in the row from the top, from 0
         * @return the tube's centre in pixels
         */
        public Point2D centre(int row, int tube) {
            double pt = coil.transversePitch();
            double shift = coil.arrangement() == Arrangement.STAGGERED ? (row % 2 == 0 ? 0.25 : 0.75) : 0.5;
            double x = (row + 0.5) * coil.rowPitch();
            double y = (tube + shift) * pt;
            return new Point2D.Double(plate.getX() + x * scale, plate.getY() + y * scale);
        }

        /** @return the collar radius in pixels */
        public double collarRadius() {
            return coil.collarDiameter() / 2 * scale;
        }
    }

    /**
     * @param coil the coil
     * @param area where to draw, in pixels
     * @return the layout {@link #paint} uses for that area
     */
    public static Layout layout(CoilGeometry coil, Rectangle2D area) {
        double depth = coil.rows() * coil.rowPitch();
        double height = coil.tubesPerRow() * coil.transversePitch();
        double w = Math.max(1, area.getWidth() - 2 * MARGIN - ARROW_SPACE);
        double h = Math.max(1, area.getHeight() - 2 * MARGIN - LEGEND_SPACE);
        double scale = Math.min(w / depth, h / height);
        double x = area.getX() + MARGIN + ARROW_SPACE + (w - depth * scale) / 2;
        double y = area.getY() + MARGIN + (h - height * scale) / 2;
        return new Layout(coil, scale, new Rectangle2D.Double(x, y, depth * scale, height * scale));
    }

    /**
     * The circuit a tube belongs to under the default circuiting: tubes counted along each
     * horizontal band through all rows, top to bottom, and split evenly among the circuits.
     *
     * @param coil the coil
     * @param row  row number from the air inlet, from 0
     * @param tube tube number in the row from the top, from 0
     * @return the circuit number, from 0
     */
    public static int circuitOf(CoilGeometry coil, int row, int tube) {
        long order = (long) tube * coil.rows() + row;
        return (int) (order * coil.circuits() / coil.tubes());
    }

    /**
     * Paints the tube sheet.
     *
     * @param g       where to paint
     * @param area    the area, in pixels
     * @param coil    the coil
     * @param palette the colours
     * @param air     label of the air arrow (e.g. "air")
     * @param caption text under the drawing (e.g. "3 rows x 16 tubes, 4 circuits")
     */
    public static void paint(Graphics2D g, Rectangle2D area, CoilGeometry coil, Palette palette, String air,
            String caption) {
        Graphics2D g2 = palette.canvas(g, area);
        try {
            Layout l = layout(coil, area);
            Rectangle2D plate = l.plate();
            g2.setColor(palette.fin());
            g2.fill(plate);
            g2.setColor(palette.finEdge());
            g2.setStroke(new BasicStroke(1f));
            g2.draw(plate);
            double rc = l.collarRadius();
            double ri = coil.insideDiameter() / 2 * l.scale();
            for (int r = 0; r < coil.rows(); r++) {
                for (int t = 0; t < coil.tubesPerRow(); t++) {
                    Point2D c = l.centre(r, t);
                    g2.setColor(palette.circuit(circuitOf(coil, r, t)));
                    g2.fill(new Ellipse2D.Double(c.getX() - rc, c.getY() - rc, 2 * rc, 2 * rc));
                    if (ri > 3) {
                        g2.setColor(palette.bore());
                        g2.setStroke(new BasicStroke(1f));
                        g2.draw(new Ellipse2D.Double(c.getX() - ri, c.getY() - ri, 2 * ri, 2 * ri));
                    }
                }
            }
            arrow(g2, plate, palette, air);
            g2.setColor(palette.text());
            g2.setFont(g2.getFont().deriveFont(Font.PLAIN, 12f));
            float w = (float) g2.getFontMetrics().getStringBounds(caption, g2).getWidth();
            float x = (float) Math.max(area.getX() + 4, Math.min(plate.getCenterX() - w / 2, area.getMaxX() - w - 4));
            g2.drawString(caption, x, (float) (plate.getMaxY() + 16));
        } finally {
            g2.dispose();
        }
    }

    private static void arrow(Graphics2D g2, Rectangle2D plate, Palette palette, String air) {
        double y = plate.getCenterY();
        double x1 = plate.getX() - 40;
        double x2 = plate.getX() - 8;
        g2.setColor(palette.dimension());
        g2.setStroke(new BasicStroke(2f));
        g2.draw(new Line2D.Double(x1, y, x2 - 6, y));
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
