package org.finstack.ui.draw;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.finstack.coil.Circuiting;
import org.finstack.coil.Rating.TubeResult;
import org.finstack.geometry.CoilGeometry;
import org.finstack.testing.Coils;
import org.junit.jupiter.api.Test;

/**
 * The coil map paints a hand-built per-tube table (no rating model involved) to a plain image:
 * each tube centre carries the scale colour of its own value, the quality view greys out
 * single-phase tubes, each circuit's trace runs between its consecutive tubes in its colour, the
 * legend's ends are the scale's ends, and a point finds the tube under it.
 */
class CoilMapTest {

    private static final Rectangle2D AREA = new Rectangle2D.Double(0, 0, 700, 640);
    private static final CoilGeometry COIL = Coils.exampleCondenser(); // 3 rows x 16 tubes, 4 circuits
    private static final Circuiting CIRCUITING = Circuiting.standard(COIL.rows(), COIL.tubesPerRow(),
            COIL.circuits());

    /**
     * A condenser-like table: along each circuit the refrigerant cools from 70 C to 40 C; the first
     * quarter of each circuit is superheated vapour (single-phase), the last tube subcooled liquid.
     */
    static List<TubeResult> tubes() {
        List<TubeResult> out = new ArrayList<>();
        for (int c = 0; c < CIRCUITING.count(); c++) {
            List<Circuiting.Tube> path = CIRCUITING.circuits().get(c);
            int n = path.size();
            for (int i = 0; i < n; i++) {
                double tIn = 343.15 - 30.0 * i / n - c * 0.5;
                double tOut = 343.15 - 30.0 * (i + 1) / n - c * 0.5;
                double qIn = i < n / 4 ? -1 : 1 - (double) (i - n / 4) / (n - n / 4 - 1);
                double qOut = i < n / 4 - 1 ? -1 : i == n - 1 ? -1 : Math.max(0, qIn - 0.1);
                Circuiting.Tube t = path.get(i);
                out.add(new TubeResult(c, t.row(), t.position(), tIn, tOut, qIn, qOut, 305.15, 310.15, 120));
            }
        }
        return out;
    }

    private static BufferedImage render(List<TubeResult> tubes, CoilMap.Colouring c) {
        BufferedImage img = new BufferedImage((int) AREA.getWidth(), (int) AREA.getHeight(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        CoilMap.paint(g, AREA, COIL, CIRCUITING, tubes, c, Palette.PLAIN,
                new CoilMap.Labels("Temperature", v -> String.format(java.util.Locale.ROOT, "%.1f", v), "single phase",
                        "air"));
        g.dispose();
        return img;
    }

    private static Color at(BufferedImage img, Point2D p) {
        return new Color(img.getRGB((int) Math.round(p.getX()), (int) Math.round(p.getY())));
    }

    @Test
    void everyTubeCentreCarriesItsTemperatureColour() {
        List<TubeResult> tubes = tubes();
        BufferedImage img = render(tubes, CoilMap.Colouring.TEMPERATURE);
        TubeSheetView.Layout l = CoilMap.layout(COIL, AREA);
        CoilMap.Scale s = CoilMap.scale(tubes, CoilMap.Colouring.TEMPERATURE);
        assertThat(tubes).hasSize(48);
        for (TubeResult t : tubes) {
            assertThat(at(img, l.centre(t.row(), t.position()))).as("row %d tube %d", t.row(), t.position())
                    .isEqualTo(s.colour(CoilMap.value(t, CoilMap.Colouring.TEMPERATURE)));
        }
        // the scale spans exactly the table's mean temperatures
        assertThat(s.max()).isCloseTo(343.15 - 15.0 / 12, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(s.min()).isCloseTo(343.15 - 30.0 * 23 / 24 - 1.5, org.assertj.core.data.Offset.offset(1e-9));
    }

    @Test
    void qualityViewGreysTheSinglePhaseTubes() {
        List<TubeResult> tubes = tubes();
        BufferedImage img = render(tubes, CoilMap.Colouring.QUALITY);
        TubeSheetView.Layout l = CoilMap.layout(COIL, AREA);
        int grey = 0;
        for (TubeResult t : tubes) {
            Color c = at(img, l.centre(t.row(), t.position()));
            if (t.qualityIn() < 0 && t.qualityOut() < 0) {
                assertThat(c).isEqualTo(CoilMap.SINGLE_PHASE);
                grey++;
            } else {
                assertThat(c).isEqualTo(new CoilMap.Scale(0, 1).colour(CoilMap.value(t, CoilMap.Colouring.QUALITY)));
            }
        }
        assertThat(grey).isEqualTo(4 * 2);
        // the two views differ
        BufferedImage temp = render(tubes, CoilMap.Colouring.TEMPERATURE);
        TubeResult first = tubes.get(0);
        assertThat(at(img, l.centre(first.row(), first.position())))
                .isNotEqualTo(at(temp, l.centre(first.row(), first.position())));
    }

    @Test
    void eachCircuitIsTracedInItsColourBetweenConsecutiveTubes() {
        BufferedImage img = render(tubes(), CoilMap.Colouring.TEMPERATURE);
        TubeSheetView.Layout l = CoilMap.layout(COIL, AREA);
        for (int c = 0; c < CIRCUITING.count(); c++) {
            List<Circuiting.Tube> path = CIRCUITING.circuits().get(c);
            // the first two tubes of each standard circuit stand next to each other in the last row
            Circuiting.Tube a = path.get(0);
            Circuiting.Tube b = path.get(1);
            assertThat(a.row()).isEqualTo(b.row());
            Point2D pa = l.centre(a.row(), a.position());
            Point2D pb = l.centre(b.row(), b.position());
            Point2D mid = new Point2D.Double((pa.getX() + pb.getX()) / 2, (pa.getY() + pb.getY()) / 2);
            assertThat(at(img, mid)).as("circuit %d", c).isEqualTo(Palette.PLAIN.circuit(c));
            // and the ring round each tube carries the circuit's colour too
            double r = l.collarRadius() - CoilMap.ringWidth(l) / 2;
            int x = (int) Math.floor(pa.getX() + r);
            int y = (int) Math.floor(pa.getY());
            assertThat(new Color(img.getRGB(x, y))).isEqualTo(Palette.PLAIN.circuit(c));
        }
    }

    @Test
    void legendEndsAreTheScaleEnds() {
        List<TubeResult> tubes = tubes();
        BufferedImage img = render(tubes, CoilMap.Colouring.TEMPERATURE);
        Rectangle2D bar = CoilMap.legendBar(AREA);
        CoilMap.Scale s = CoilMap.scale(tubes, CoilMap.Colouring.TEMPERATURE);
        Color top = at(img, new Point2D.Double(bar.getCenterX(), bar.getY() + 2));
        Color bottom = at(img, new Point2D.Double(bar.getCenterX(), bar.getMaxY() - 2));
        assertThat(distance(top, s.colour(s.max()))).isLessThan(12);
        assertThat(distance(bottom, s.colour(s.min()))).isLessThan(12);
        assertThat(top).isNotEqualTo(bottom);
    }

    @Test
    void aPointFindsTheTubeUnderIt() {
        List<TubeResult> tubes = tubes();
        TubeSheetView.Layout l = CoilMap.layout(COIL, AREA);
        TubeResult t = tubes.get(17);
        assertThat(CoilMap.tubeAt(l, tubes, l.centre(t.row(), t.position()))).isEqualTo(t);
        assertThat(CoilMap.tubeAt(l, tubes, new Point2D.Double(l.plate().getX() + 1, l.plate().getY() + 1))).isNull();
    }

    @Test
    void scaleRunsColdToWarmAndSurvivesASingleValue() {
        CoilMap.Scale s = new CoilMap.Scale(270, 300);
        assertThat(s.colour(270).getBlue()).isGreaterThan(s.colour(270).getRed());
        assertThat(s.colour(300).getRed()).isGreaterThan(s.colour(300).getBlue());
        // outside the range: the end colours
        assertThat(s.colour(200)).isEqualTo(s.colour(270));
        assertThat(s.colour(400)).isEqualTo(s.colour(300));
        assertThat(new CoilMap.Scale(280, 280).colour(280)).isEqualTo(s.colour(285));
        assertThat(CoilMap.scale(List.of(), CoilMap.Colouring.TEMPERATURE)).isEqualTo(new CoilMap.Scale(0, 1));
    }

    private static int distance(Color a, Color b) {
        return Math.abs(a.getRed() - b.getRed()) + Math.abs(a.getGreen() - b.getGreen())
                + Math.abs(a.getBlue() - b.getBlue());
    }
}
