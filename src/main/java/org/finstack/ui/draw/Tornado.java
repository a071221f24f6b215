package org.finstack.ui.draw;

import java.awt.BasicStroke;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * A tornado chart: one horizontal bar per input, the largest effect at the top, each bar drawn
 * from a common zero line, to the right for a gain and to the left for a loss, its length in
 * proportion to the effect so the longest bar fills its half of the chart. Gains are filled in
 * the palette's bar colour, losses in its tube colour (warm against the bars' cool tone); the
 * value's text stands at the bar's outer end.
 */
public final class Tornado {

    private static final double ROW = 26;
    private static final double LABEL_SHARE = 0.32;
    private static final double VALUE_ROOM = 76;

    private Tornado() {
    }

    /**
     * One bar.
     *
     * @param label the input (e.g. "Fin density")
     * @param value its effect, in the chart's unit (e.g. % of capacity); finite
     * @param text  the effect as written beside the bar
     */
    public record Bar(String label, double value, String text) {

        /** Checks the parts. */
        public Bar {
            Objects.requireNonNull(label, "label");
            Objects.requireNonNull(text, "text");
            if (!Double.isFinite(value)) {
                throw new IllegalArgumentException("bar " + label + ": value " + value + " is not finite");
            }
        }
    }

    /**
     * @param bars bars in any order
     * @return the same bars, largest |value| first; bars of equal size keep their order
     */
    public static List<Bar> sorted(List<Bar> bars) {
        List<Bar> out = new ArrayList<>(bars);
        out.sort(Comparator.comparingDouble((Bar b) -> Math.abs(b.value())).reversed());
        return List.copyOf(out);
    }

    /**
     * @param bars the bars
     * @return the height the chart needs [px]
     */
    public static int preferredHeight(List<Bar> bars) {
        return (int) Math.ceil(bars.size() * ROW + 2 * ROW);
    }

    /**
     * @param area the chart's area [px]
     * @return the x of the zero line [px]
     */
    public static double zeroX(Rectangle2D area) {
        double left = area.getX() + LABEL_SHARE * area.getWidth() + VALUE_ROOM;
        double right = area.getMaxX() - VALUE_ROOM;
        return (left + right) / 2;
    }

    /**
     * @param area the chart's area [px]
     * @param bars the bars
     * @return pixels per unit of value: the largest |value| spans the half-width; 0 when every value is 0
     */
    public static double scale(Rectangle2D area, List<Bar> bars) {
        double max = bars.stream().mapToDouble(b -> Math.abs(b.value())).max().orElse(0);
        double half = Math.max(0, area.getMaxX() - VALUE_ROOM - zeroX(area));
        return max > 0 ? half / max : 0;
    }

    /**
     * Where a bar is drawn, in the order of {@link #sorted}.
     *
     * @param area  the chart's area [px]
     * @param bars  the bars, sorted
     * @param index a bar's position, from 0
     * @return its rectangle (zero width for a zero effect)
     */
    public static Rectangle2D bar(Rectangle2D area, List<Bar> bars, int index) {
        double zero = zeroX(area);
        double length = Math.abs(bars.get(index).value()) * scale(area, bars);
        double y = area.getY() + ROW + index * ROW + 4;
        double x = bars.get(index).value() < 0 ? zero - length : zero;
        return new Rectangle2D.Double(x, y, length, ROW - 8);
    }

    /**
     * Paints the chart, bars sorted by {@link #sorted}.
     *
     * @param g       where to paint
     * @param area    the area [px]
     * @param bars    the bars, in any order
     * @param title   the line above the bars (what the values are, with their unit)
     * @param palette the colours
     */
    public static void paint(Graphics2D g, Rectangle2D area, List<Bar> bars, String title, Palette palette) {
        List<Bar> s = sorted(bars);
        Graphics2D g2 = palette.canvas(g, area);
        try {
            g2.setFont(g2.getFont().deriveFont(Font.PLAIN, 12f));
            FontMetrics fm = g2.getFontMetrics();
            g2.setColor(palette.text());
            g2.drawString(title, (float) (area.getX() + 4), (float) (area.getY() + ROW / 2 + fm.getAscent() / 2.0));
            double zero = zeroX(area);
            for (int i = 0; i < s.size(); i++) {
                Bar b = s.get(i);
                Rectangle2D r = bar(area, s, i);
                float baseline = (float) (r.getCenterY() + fm.getAscent() / 2.0 - 1);
                g2.setColor(palette.text());
                g2.drawString(fit(b.label(), fm, LABEL_SHARE * area.getWidth() - 8), (float) (area.getX() + 4),
                        baseline);
                if (r.getWidth() > 0) {
                    g2.setColor(b.value() < 0 ? palette.tube() : palette.bar());
                    g2.fill(r);
                }
                g2.setColor(palette.text());
                int w = fm.stringWidth(b.text());
                float x = b.value() < 0 ? (float) (r.getX() - 6 - w) : (float) (r.getMaxX() + 6);
                g2.drawString(b.text(), x, baseline);
            }
            g2.setColor(palette.dimension());
            g2.setStroke(new BasicStroke(1.2f));
            g2.draw(new Line2D.Double(zero, area.getY() + ROW, zero, area.getY() + ROW + Math.max(1, s.size()) * ROW));
        } finally {
            g2.dispose();
        }
    }

    private static String fit(String text, FontMetrics fm, double width) {
        if (fm.stringWidth(text) <= width) {
            return text;
        }
        String t = text;
        while (t.length() > 1 && fm.stringWidth(t + "\u2026") > width) {
            t = t.substring(0, t.length() - 1);
        }
        return t + "\u2026";
    }
}
