package org.finstack.ui.draw;

import java.awt.BasicStroke;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import org.finstack.geometry.CoilGeometry;

/**
 * A section along one tube, to scale: the tube wall, the fins standing off it at their pitch and
 * thickness, and each fin's collar lying on the tube, so the collar diameter (tube plus two fin
 * thicknesses) is seen beside the tube diameter. Dimension marks give the fin pitch, the fin
 * thickness, the tube and the collar diameters.
 */
public final class FinSectionView {

    private static final double MARGIN = 14;
    private static final int PITCHES = 6;

    private FinSectionView() {
    }

    /**
     * The texts of the dimension marks, already formatted in the user's units.
     *
     * @param pitch     fin pitch, e.g. "fin pitch 2.1 mm"
     * @param thickness fin thickness, e.g. "fin 0.115 mm"
     * @param tube      tube diameter, e.g. "tube 9.52 mm"
     * @param collar    collar diameter, e.g. "collar 9.75 mm"
     */
    public record Labels(String pitch, String thickness, String tube, String collar) {
    }

    /**
     * @param coil the coil
     * @param area where to draw, in pixels
     * @return pixels per metre used for that area
     */
    public static double scale(CoilGeometry coil, Rectangle2D area) {
        double width = PITCHES * coil.finPitch();
        double height = 1.9 * coil.collarDiameter();
        return Math.min((area.getWidth() - 2 * MARGIN - 110) / width, (area.getHeight() - 2 * MARGIN - 30) / height);
    }

    /**
     * Paints the section.
     *
     * @param g       where to paint
     * @param area    the area, in pixels
     * @param coil    the coil
     * @param palette the colours
     * @param labels  the dimension texts
     */
    public static void paint(Graphics2D g, Rectangle2D area, CoilGeometry coil, Palette palette, Labels labels) {
        Graphics2D g2 = palette.canvas(g, area);
        try {
            double s = Math.max(0.1, scale(coil, area));
            double p = coil.finPitch() * s;
            double t = Math.max(1, coil.finThickness() * s);
            double ro = coil.tubeOuterDiameter() / 2 * s;
            double ri = coil.insideDiameter() / 2 * s;
            double rc = coil.collarDiameter() / 2 * s;
            double width = PITCHES * p;
            double x0 = area.getX() + Math.max(MARGIN, (area.getWidth() - width - 110) / 2);
            double cy = area.getY() + MARGIN + 18 + 0.95 * coil.collarDiameter() * s;
            double finReach = 0.95 * coil.collarDiameter() * s;
            // tube wall, above and below the axis
            g2.setColor(palette.tube());
            g2.fill(new Rectangle2D.Double(x0, cy - ro, width, ro - ri));
            g2.fill(new Rectangle2D.Double(x0, cy + ri, width, ro - ri));
            g2.setColor(palette.bore());
            g2.fill(new Rectangle2D.Double(x0, cy - ri, width, 2 * ri));
            // fins with their collars
            for (int i = 0; i <= PITCHES; i++) {
                double xf = x0 + i * p;
                if (xf + t > x0 + width + 0.5) {
                    break;
                }
                g2.setColor(palette.fin());
                g2.fill(new Rectangle2D.Double(xf, cy - finReach, t, finReach - ro));
                g2.fill(new Rectangle2D.Double(xf, cy + ro, t, finReach - ro));
                double collar = Math.min(p - t, Math.max(t, 0.8 * p));
                g2.fill(new Rectangle2D.Double(xf, cy - rc, Math.min(collar, x0 + width - xf), rc - ro));
                g2.fill(new Rectangle2D.Double(xf, cy + ro, Math.min(collar, x0 + width - xf), rc - ro));
                g2.setColor(palette.finEdge());
                g2.setStroke(new BasicStroke(0.8f));
                g2.draw(new Rectangle2D.Double(xf, cy - finReach, t, finReach - ro));
                g2.draw(new Rectangle2D.Double(xf, cy + ro, t, finReach - ro));
            }
            g2.setColor(palette.text());
            g2.setStroke(new BasicStroke(1f));
            g2.setFont(g2.getFont().deriveFont(Font.PLAIN, 12f));
            // fin pitch between the first two fins, above
            double yp = cy - finReach - 6;
            dimension(g2, palette, x0 + t / 2, yp, x0 + p + t / 2, yp);
            g2.setColor(palette.text());
            g2.drawString(labels.pitch(), (float) (x0), (float) (yp - 6));
            // thickness, below
            g2.drawString(labels.thickness(), (float) (x0 + 2 * p), (float) (cy + finReach + 16));
            // diameters, at the right
            double xr = x0 + width + 10;
            dimension(g2, palette, xr, cy - ro, xr, cy + ro);
            dimension(g2, palette, xr + 10, cy - rc, xr + 10, cy + rc);
            g2.setColor(palette.text());
            g2.drawString(labels.tube(), (float) (xr + 16), (float) (cy - 4));
            g2.drawString(labels.collar(), (float) (xr + 16), (float) (cy + 14));
        } finally {
            g2.dispose();
        }
    }

    private static void dimension(Graphics2D g2, Palette palette, double x1, double y1, double x2, double y2) {
        g2.setColor(palette.dimension());
        g2.setStroke(new BasicStroke(1f));
        g2.draw(new Line2D.Double(x1, y1, x2, y2));
        double a = Math.atan2(y2 - y1, x2 - x1);
        tick(g2, x1, y1, a);
        tick(g2, x2, y2, a + Math.PI);
    }

    private static void tick(Graphics2D g2, double x, double y, double a) {
        Path2D head = new Path2D.Double();
        head.moveTo(x, y);
        head.lineTo(x + 6 * Math.cos(a + 0.4), y + 6 * Math.sin(a + 0.4));
        head.lineTo(x + 6 * Math.cos(a - 0.4), y + 6 * Math.sin(a - 0.4));
        head.closePath();
        g2.fill(head);
    }
}
