package org.finstack.ui;

import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.function.Supplier;
import javax.swing.JComponent;
import com.formdev.flatlaf.util.UIScale;
import org.finstack.geometry.CoilGeometry;
import org.finstack.ui.draw.FinSectionView;
import org.finstack.ui.draw.TubeSheetView;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;

/** Shows the selected coil to scale: the tube sheet above, the fin section below. */
final class DrawingPanel extends JComponent {

    private static final long serialVersionUID = 1L;

    private final Supplier<CoilGeometry> coil;
    private final Supplier<UnitSystem> units;

    DrawingPanel(Supplier<CoilGeometry> coil, Supplier<UnitSystem> units) {
        this.coil = coil;
        this.units = units;
        setName("coil.drawing");
        setPreferredSize(new Dimension(UIScale.scale(460), UIScale.scale(560)));
    }

    @Override
    protected void paintComponent(Graphics g) {
        paintTo((Graphics2D) g, getWidth(), getHeight());
    }

    /**
     * Paints both views into an area.
     *
     * @param g where
     * @param w width [px]
     * @param h height [px]
     */
    void paintTo(Graphics2D g, int w, int h) {
        CoilGeometry c = coil.get();
        UnitSystem u = units.get();
        int top = (int) (h * 0.62);
        String caption = Messages.format("drawing.caption", c.rows(), c.tubesPerRow(), c.circuits(),
                c.arrangement() == org.finstack.geometry.Arrangement.STAGGERED
                        ? Messages.get("drawing.staggered") : Messages.get("drawing.inline"));
        TubeSheetView.paint(g, new Rectangle2D.Double(0, 0, w, top), c, Theme.palette(), Messages.get("drawing.air"),
                caption);
        FinSectionView.paint(g, new Rectangle2D.Double(0, top, w, h - top), c, Theme.palette(),
                new FinSectionView.Labels(
                        Messages.format("drawing.finPitch", Quantities.format(c.finPitch(),
                                org.finstack.units.Dimension.FIN_PITCH, u)),
                        Messages.format("drawing.finThickness", Quantities.format(c.finThickness(),
                                org.finstack.units.Dimension.LENGTH, u)),
                        Messages.format("drawing.tube", Quantities.format(c.tubeOuterDiameter(),
                                org.finstack.units.Dimension.LENGTH, u)),
                        Messages.format("drawing.collar", Quantities.format(c.collarDiameter(),
                                org.finstack.units.Dimension.LENGTH, u))));
    }

    /**
     * @param w width [px]
     * @param h height [px]
     * @return the drawing as an image
     */
    BufferedImage image(int w, int h) {
        BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            paintTo(g, w, h);
        } finally {
            g.dispose();
        }
        return img;
    }
}
