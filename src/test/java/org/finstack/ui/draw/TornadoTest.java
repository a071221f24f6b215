package org.finstack.ui.draw;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The tornado chart puts the largest effect first whatever its sign, scales the largest bar to
 * the full half-width and the others in proportion, draws gains right and losses left of one
 * zero line, and paints each bar in its colour where the geometry says it is. These are invariants
 * of the chart's own layout; the effects themselves are checked against the study in
 * WorkbenchStudyGuiTest.
 */
class TornadoTest {

    private static final Rectangle2D AREA = new Rectangle2D.Double(0, 0, 800, 300);
    private static final List<Tornado.Bar> BARS = List.of(new Tornado.Bar("wall", 0.5, "+0.5 %"),
            new Tornado.Bar("fouling", -8.0, "-8 %"), new Tornado.Bar("rows", 12.0, "+12 %"),
            new Tornado.Bar("fins", 4.0, "+4 %"), new Tornado.Bar("none", 0.0, "0 %"),
            new Tornado.Bar("fins again", -4.0, "-4 %"));

    @Test
    void largestEffectFirstWhateverItsSignAndTiesKeepTheirOrder() {
        assertThat(Tornado.sorted(BARS)).extracting(Tornado.Bar::label)
                .containsExactly("rows", "fouling", "fins", "fins again", "wall", "none");
    }

    @Test
    void theLargestBarFillsTheHalfWidthAndTheOthersScaleWithIt() {
        List<Tornado.Bar> s = Tornado.sorted(BARS);
        double zero = Tornado.zeroX(AREA);
        Rectangle2D rows = Tornado.bar(AREA, s, 0);
        Rectangle2D fouling = Tornado.bar(AREA, s, 1);
        Rectangle2D fins = Tornado.bar(AREA, s, 2);
        Rectangle2D finsAgain = Tornado.bar(AREA, s, 3);
        // the half-width is the room right of the zero line, less the value's text
        double half = AREA.getMaxX() - 76 - zero;
        assertThat(rows.getX()).isEqualTo(zero);
        assertThat(rows.getWidth()).isCloseTo(half, within(1e-9));
        assertThat(fouling.getMaxX()).isCloseTo(zero, within(1e-9));
        assertThat(fouling.getWidth()).isCloseTo(half * 8 / 12, within(1e-9));
        assertThat(fins.getWidth()).isCloseTo(finsAgain.getWidth(), within(1e-9));
        assertThat(fins.getX()).isEqualTo(zero);
        assertThat(finsAgain.getMaxX()).isCloseTo(zero, within(1e-9));
        assertThat(Tornado.bar(AREA, s, 5).getWidth()).isZero();
        assertThat(Tornado.scale(AREA, s)).isCloseTo(half / 12, within(1e-12));
        // bars go down the chart in order
        assertThat(fouling.getY()).isGreaterThan(rows.getMaxY());
    }

    @Test
    void allZeroEffectsDrawNoBars() {
        List<Tornado.Bar> zeros = List.of(new Tornado.Bar("a", 0, "0"), new Tornado.Bar("b", 0, "0"));
        assertThat(Tornado.scale(AREA, zeros)).isZero();
        assertThat(Tornado.bar(AREA, zeros, 1).getWidth()).isZero();
    }

    @Test
    void aValueThatIsNotFiniteIsRefused() {
        assertThatThrownBy(() -> new Tornado.Bar("x", Double.NaN, "?")).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("x");
    }

    @Test
    void gainsAndLossesArePaintedInTheirColoursWhereTheGeometrySays() {
        BufferedImage img = new BufferedImage((int) AREA.getWidth(), (int) AREA.getHeight(),
                BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        Tornado.paint(g, AREA, BARS, "Capacity change [%]", Palette.PLAIN);
        g.dispose();
        List<Tornado.Bar> s = Tornado.sorted(BARS);
        Rectangle2D gain = Tornado.bar(AREA, s, 0);
        Rectangle2D loss = Tornado.bar(AREA, s, 1);
        assertThat(colourAt(img, gain.getCenterX(), gain.getCenterY())).isEqualTo(Palette.PLAIN.bar());
        assertThat(colourAt(img, loss.getCenterX(), loss.getCenterY())).isEqualTo(Palette.PLAIN.tube());
        // beyond the longest bar's end the background shows
        assertThat(colourAt(img, gain.getMaxX() + 2, gain.getY() + 1)).isEqualTo(Palette.PLAIN.background());
    }

    private static Color colourAt(BufferedImage img, double x, double y) {
        return new Color(img.getRGB((int) Math.round(x), (int) Math.round(y)));
    }
}
