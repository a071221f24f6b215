package org.finstack.ui.draw;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.finstack.geometry.Arrangement;
import org.finstack.geometry.CoilGeometry;
import org.finstack.material.Materials;
import org.finstack.testing.Coils;
import org.junit.jupiter.api.Test;

/**
 * The drawings paint to a plain {@link BufferedImage} with no window, and their pixels say what
 * the geometry says: a tube's colour at each tube centre the pattern gives, fin plate between
 * tubes, staggered rows shifted by half a pitch, circuits sharing the tubes evenly (invariants of
 * the drawing against the geometry as reference).
 */
class TubeSheetViewTest {

    private static final Rectangle2D AREA = new Rectangle2D.Double(0, 0, 600, 700);

    private static BufferedImage render(CoilGeometry c) {
        BufferedImage img = new BufferedImage(600, 700, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        TubeSheetView.paint(g, AREA, c, Palette.PLAIN, "air", "caption");
        g.dispose();
        return img;
    }

    private static Color at(BufferedImage img, Point2D p) {
        return new Color(img.getRGB((int) Math.round(p.getX()), (int) Math.round(p.getY())));
    }

    @Test
    void everyTubeCentreCarriesItsCircuitsColour() {
        CoilGeometry c = Coils.exampleCondenser();
        BufferedImage img = render(c);
        TubeSheetView.Layout l = TubeSheetView.layout(c, AREA);
        for (int r = 0; r < c.rows(); r++) {
            for (int t = 0; t < c.tubesPerRow(); t++) {
                assertThat(at(img, l.centre(r, t))).as("row %d tube %d", r, t)
                        .isEqualTo(Palette.PLAIN.circuit(TubeSheetView.circuitOf(c, r, t)));
            }
        }
    }

    @Test
    void finPlateShowsBetweenTubesOfARow() {
        CoilGeometry c = Coils.exampleCondenser();
        BufferedImage img = render(c);
        TubeSheetView.Layout l = TubeSheetView.layout(c, AREA);
        Point2D a = l.centre(0, 3);
        Point2D b = l.centre(0, 4);
        Point2D mid = new Point2D.Double((a.getX() + b.getX()) / 2, (a.getY() + b.getY()) / 2);
        assertThat(at(img, mid)).isEqualTo(Palette.PLAIN.fin());
    }

    @Test
    void drawingIsToScaleAndStaggeredRowsShiftByHalfAPitch() {
        CoilGeometry c = Coils.exampleCondenser();
        TubeSheetView.Layout l = TubeSheetView.layout(c, AREA);
        double pt = c.transversePitch() * l.scale();
        double pl = c.rowPitch() * l.scale();
        assertThat(l.centre(0, 1).getY() - l.centre(0, 0).getY()).isCloseTo(pt, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(l.centre(1, 0).getX() - l.centre(0, 0).getX()).isCloseTo(pl, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(l.centre(1, 0).getY() - l.centre(0, 0).getY()).isCloseTo(pt / 2,
                org.assertj.core.data.Offset.offset(1e-9));
        // the plate is as high as the tubes in a row and as deep as the rows
        assertThat(l.plate().getHeight() / l.plate().getWidth()).isCloseTo(16 * 25.4 / (3 * 22.0),
                org.assertj.core.data.Offset.offset(1e-9));
    }

    @Test
    void inlineRowsStandBehindEachOther() {
        CoilGeometry s = Coils.exampleCondenser();
        CoilGeometry c = new CoilGeometry(s.tubeOuterDiameter(), s.tubeWall(), s.tubeMaterial(), Arrangement.INLINE,
                s.transversePitch(), s.rowPitch(), 3, 16, s.finnedLength(), "plain", s.finPitch(), s.finThickness(),
                Materials.library().fin("f", "aluminium"), 4, null, 0);
        TubeSheetView.Layout l = TubeSheetView.layout(c, AREA);
        assertThat(l.centre(1, 5).getY()).isEqualTo(l.centre(0, 5).getY());
        BufferedImage img = render(c);
        assertThat(at(img, l.centre(2, 15))).isEqualTo(Palette.PLAIN.circuit(TubeSheetView.circuitOf(c, 2, 15)));
    }

    @Test
    void defaultCircuitingSplitsTubesEvenly() {
        CoilGeometry c = Coils.exampleCondenser(); // 48 tubes, 4 circuits
        Map<Integer, Integer> count = new HashMap<>();
        for (int r = 0; r < c.rows(); r++) {
            for (int t = 0; t < c.tubesPerRow(); t++) {
                count.merge(TubeSheetView.circuitOf(c, r, t), 1, Integer::sum);
            }
        }
        assertThat(count).containsOnlyKeys(0, 1, 2, 3).allSatisfy((k, v) -> assertThat(v).isEqualTo(12));
    }

    @Test
    void sectionAndBarsRenderWithoutAWindow() {
        BufferedImage img = new BufferedImage(500, 300, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        CoilGeometry c = Coils.exampleCondenser();
        FinSectionView.paint(g, new Rectangle2D.Double(0, 0, 500, 300), c, Palette.PLAIN,
                new FinSectionView.Labels("fin pitch 2.1 mm", "fins 0.115 mm", "tube 9.52 mm", "collar 9.75 mm"));
        g.dispose();
        assertThat(colours(img)).contains(Palette.PLAIN.tube().getRGB() & 0xFFFFFF, Palette.PLAIN.fin().getRGB() & 0xFFFFFF);

        List<ResistanceBars.Bar> bars = List.of(new ResistanceBars.Bar("air film", 0.6),
                new ResistanceBars.Bar("wall", 0.0), new ResistanceBars.Bar("refrigerant film", 0.4));
        BufferedImage b = new BufferedImage(500, ResistanceBars.preferredHeight(bars), BufferedImage.TYPE_INT_RGB);
        Graphics2D gb = b.createGraphics();
        Rectangle2D area = new Rectangle2D.Double(0, 0, 500, b.getHeight());
        ResistanceBars.paint(gb, area, bars, Palette.PLAIN);
        gb.dispose();
        Rectangle2D first = ResistanceBars.track(area, 0);
        int y = (int) first.getCenterY();
        // 60 %: filled at half the track, not at nine tenths
        assertThat(new Color(b.getRGB((int) (first.getX() + 0.5 * first.getWidth()), y))).isEqualTo(Palette.PLAIN.bar());
        assertThat(new Color(b.getRGB((int) (first.getX() + 0.9 * first.getWidth()), y))).isEqualTo(Palette.PLAIN.fin());
    }

    private static List<Integer> colours(BufferedImage img) {
        List<Integer> out = new ArrayList<>();
        for (int x = 0; x < img.getWidth(); x += 2) {
            for (int y = 0; y < img.getHeight(); y += 2) {
                out.add(img.getRGB(x, y) & 0xFFFFFF);
            }
        }
        return out;
    }
}
