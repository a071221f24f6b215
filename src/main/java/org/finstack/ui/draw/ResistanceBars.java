package org.finstack.ui.draw;

import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.geom.RoundRectangle2D;
import java.util.List;
import java.util.Locale;

/**
 * Where the heat is held back: one horizontal bar per series resistance, its length its share of
 * 1/UA, with the share written beside it.
 */
public final class ResistanceBars {

    private static final double ROW = 22;

    private ResistanceBars() {
    }

    /**
     * One bar.
     *
     * @param label what the resistance is (e.g. "air film")
     * @param share its share of the total [0..1]
     */
    public record Bar(String label, double share) {
    }

    /**
     * @param bars the bars
     * @return the height the picture needs [px]
     */
    public static int preferredHeight(List<Bar> bars) {
        return (int) Math.ceil(bars.size() * ROW + 8);
    }

    /**
     * @param area  the area, in pixels
     * @param index a bar's position, from 0
     * @return that bar's full-length track (a share of one fills it)
     */
    public static Rectangle2D track(Rectangle2D area, int index) {
        double labelWidth = Math.min(150, area.getWidth() * 0.35);
        double x = area.getX() + labelWidth + 8;
        double w = Math.max(10, area.getWidth() - labelWidth - 70);
        return new Rectangle2D.Double(x, area.getY() + 4 + index * ROW + 4, w, ROW - 8);
    }

    /**
     * Paints the bars.
     *
     * @param g       where to paint
     * @param area    the area, in pixels
     * @param bars    the bars, in order
     * @param palette the colours
     */
    public static void paint(Graphics2D g, Rectangle2D area, List<Bar> bars, Palette palette) {
        Graphics2D g2 = palette.canvas(g, area);
        try {
            g2.setFont(g2.getFont().deriveFont(Font.PLAIN, 12f));
            FontMetrics fm = g2.getFontMetrics();
            for (int i = 0; i < bars.size(); i++) {
                Bar b = bars.get(i);
                Rectangle2D track = track(area, i);
                float baseline = (float) (track.getCenterY() + fm.getAscent() / 2.0 - 1);
                g2.setColor(palette.text());
                g2.drawString(b.label(), (float) (area.getX() + 4), baseline);
                g2.setColor(palette.fin());
                g2.fill(new RoundRectangle2D.Double(track.getX(), track.getY(), track.getWidth(), track.getHeight(), 6, 6));
                double share = Math.max(0, Math.min(1, b.share()));
                if (share > 0) {
                    g2.setColor(palette.bar());
                    g2.fill(new RoundRectangle2D.Double(track.getX(), track.getY(),
                            Math.max(2, share * track.getWidth()), track.getHeight(), 6, 6));
                }
                g2.setColor(palette.text());
                g2.drawString(String.format(Locale.ROOT, "%.1f %%", 100 * b.share()),
                        (float) (track.getMaxX() + 6), baseline);
            }
        } finally {
            g2.dispose();
        }
    }
}
