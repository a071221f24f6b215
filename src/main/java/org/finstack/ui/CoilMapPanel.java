package org.finstack.ui;

import com.formdev.flatlaf.util.UIScale;
import java.awt.BorderLayout;
import java.awt.CardLayout;
import java.awt.FlowLayout;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.event.MouseEvent;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.List;
import java.util.Locale;
import javax.swing.BorderFactory;
import javax.swing.ButtonGroup;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JRadioButton;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.SwingConstants;
import javax.swing.table.AbstractTableModel;
import org.finstack.coil.CoilCase;
import org.finstack.coil.Rating;
import org.finstack.coil.Rating.TubeResult;
import org.finstack.ui.draw.CoilMap;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;

/**
 * The tube-by-tube rating on the coil's face: the map ({@link CoilMap}) coloured by refrigerant
 * temperature or quality (a switch), a tooltip per tube, and beside it the table of every tube.
 * Without per-tube results (another model, or none rated) it says how to get them.
 */
final class CoilMapPanel extends JPanel {

    private static final long serialVersionUID = 1L;

    private static final String MAP = "map";
    private static final String EMPTY = "empty";

    private final JRadioButton byTemperature = new JRadioButton(Messages.get("coilmap.byTemperature"));
    private final JRadioButton byQuality = new JRadioButton(Messages.get("coilmap.byQuality"));
    private final MapComponent map = new MapComponent();
    private final TubeTable tableModel = new TubeTable();
    private final JTable table = new JTable(tableModel);
    private final JLabel empty = new JLabel(Messages.get("coilmap.empty"), SwingConstants.CENTER);
    private final CardLayout cards = new CardLayout();
    private final JPanel body = new JPanel(cards);
    private CoilCase ratedCase;
    private Rating rating;
    private UnitSystem units = UnitSystem.SI;

    CoilMapPanel() {
        super(new BorderLayout());
        setName("coilmap");
        byTemperature.setName("coilmap.byTemperature");
        byQuality.setName("coilmap.byQuality");
        ButtonGroup g = new ButtonGroup();
        g.add(byTemperature);
        g.add(byQuality);
        byTemperature.setSelected(true);
        byTemperature.addActionListener(e -> map.repaint());
        byQuality.addActionListener(e -> map.repaint());
        JPanel switches = new JPanel(new FlowLayout(FlowLayout.LEFT));
        switches.add(new JLabel(Messages.get("coilmap.colourBy")));
        switches.add(byTemperature);
        switches.add(byQuality);
        table.setName("coilmap.table");
        table.setAutoCreateRowSorter(true);
        JScrollPane side = new JScrollPane(table);
        side.setPreferredSize(new java.awt.Dimension(UIScale.scale(520), UIScale.scale(300)));
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, map, side);
        split.setResizeWeight(0.55);
        empty.setName("coilmap.emptyNote");
        body.add(split, MAP);
        body.add(empty, EMPTY);
        setBorder(BorderFactory.createEmptyBorder(4, 6, 4, 6));
        add(switches, BorderLayout.NORTH);
        add(body, BorderLayout.CENTER);
        cards.show(body, EMPTY);
    }

    /**
     * Shows a rating's tubes (or the note that there are none).
     *
     * @param c the case rated, or null
     * @param r its rating, or null
     * @param u the unit system
     */
    void show(CoilCase c, Rating r, UnitSystem u) {
        units = u;
        boolean tubes = c != null && r != null && !r.tubes().isEmpty();
        ratedCase = tubes ? c : null;
        rating = tubes ? r : null;
        tableModel.fireTableStructureChanged();
        cards.show(body, tubes ? MAP : EMPTY);
        map.repaint();
    }

    /** @param u the unit system to show the last rating in */
    void refresh(UnitSystem u) {
        show(ratedCase, rating, u);
    }

    /** @return the rating whose tubes are shown, or null */
    Rating rating() {
        return rating;
    }

    /** @param quality whether to colour by quality (else by refrigerant temperature) */
    void colourByQuality(boolean quality) {
        (quality ? byQuality : byTemperature).setSelected(true);
        map.repaint();
    }

    /** @return the colouring chosen */
    CoilMap.Colouring colouring() {
        return byQuality.isSelected() ? CoilMap.Colouring.QUALITY : CoilMap.Colouring.TEMPERATURE;
    }

    /** @return the tube table, for tests */
    JTable table() {
        return table;
    }

    /** @return the map component */
    JComponent map() {
        return map;
    }

    /**
     * @param w width [px]
     * @param h height [px]
     * @return the map as an image (empty background without tubes)
     */
    BufferedImage image(int w, int h) {
        BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            map.paintTo(g, w, h);
        } finally {
            g.dispose();
        }
        return img;
    }

    /**
     * @param w width of the map [px]
     * @param h height of the map [px]
     * @return the area the map paints into
     */
    static Rectangle2D area(int w, int h) {
        return new Rectangle2D.Double(0, 0, w, h);
    }

    private CoilMap.Labels labels() {
        boolean q = colouring() == CoilMap.Colouring.QUALITY;
        return new CoilMap.Labels(Messages.get(q ? "coilmap.legend.quality" : "coilmap.legend.temperature"),
                v -> q ? String.format(Locale.ROOT, "%.2f", v) : Quantities.format(v, Dimension.TEMPERATURE, units),
                Messages.get("coilmap.singlePhase"), Messages.get("drawing.air"));
    }

    private String tip(TubeResult t) {
        return Messages.format("coilmap.tip", t.circuit() + 1, t.row() + 1, t.position() + 1,
                Quantities.format(t.refrigerantInTemperature(), Dimension.TEMPERATURE, units),
                Quantities.format(t.refrigerantOutTemperature(), Dimension.TEMPERATURE, units), quality(t.qualityIn()),
                quality(t.qualityOut()), Quantities.format(t.duty(), Dimension.HEAT_FLOW, units));
    }

    private static String quality(double q) {
        return q < 0 ? Messages.get("coilmap.singlePhaseShort") : String.format(Locale.ROOT, "%.2f", q);
    }

    /** Paints the map and answers tooltips. */
    private final class MapComponent extends JComponent {

        private static final long serialVersionUID = 1L;

        MapComponent() {
            setName("coilmap.map");
            setPreferredSize(new java.awt.Dimension(UIScale.scale(460), UIScale.scale(520)));
            setToolTipText("");
        }

        @Override
        protected void paintComponent(Graphics g) {
            paintTo((Graphics2D) g, getWidth(), getHeight());
        }

        void paintTo(Graphics2D g, int w, int h) {
            Rectangle2D area = area(w, h);
            if (rating == null) {
                g.setColor(Theme.palette().background());
                g.fill(area);
                return;
            }
            CoilMap.paint(g, area, ratedCase.coil(), ratedCase.effectiveCircuiting(), rating.tubes(), colouring(),
                    Theme.palette(), labels());
        }

        @Override
        public String getToolTipText(MouseEvent e) {
            if (rating == null) {
                return null;
            }
            TubeResult t = CoilMap.tubeAt(CoilMap.layout(ratedCase.coil(), area(getWidth(), getHeight())),
                    rating.tubes(), new Point2D.Double(e.getX(), e.getY()));
            return t == null ? null : tip(t);
        }
    }

    /** Every tube: circuit, row, tube, refrigerant temperatures and qualities, air temperatures, duty. */
    private final class TubeTable extends AbstractTableModel {

        private static final long serialVersionUID = 1L;
        private static final String[] COLUMNS = {"circuit", "row", "tube", "refrigerantIn", "refrigerantOut",
            "qualityIn", "qualityOut", "airIn", "airOut", "duty"};

        @Override
        public int getRowCount() {
            return rating == null ? 0 : rating.tubes().size();
        }

        @Override
        public int getColumnCount() {
            return COLUMNS.length;
        }

        @Override
        public String getColumnName(int column) {
            return Messages.get("coilmap.column." + COLUMNS[column]);
        }

        @Override
        public Class<?> getColumnClass(int column) {
            return column < 3 ? Integer.class : String.class;
        }

        @Override
        public Object getValueAt(int row, int column) {
            List<TubeResult> tubes = rating.tubes();
            TubeResult t = tubes.get(row);
            return switch (column) {
                case 0 -> t.circuit() + 1;
                case 1 -> t.row() + 1;
                case 2 -> t.position() + 1;
                case 3 -> Quantities.format(t.refrigerantInTemperature(), Dimension.TEMPERATURE, units);
                case 4 -> Quantities.format(t.refrigerantOutTemperature(), Dimension.TEMPERATURE, units);
                case 5 -> quality(t.qualityIn());
                case 6 -> quality(t.qualityOut());
                case 7 -> Quantities.format(t.airInTemperature(), Dimension.TEMPERATURE, units);
                case 8 -> Quantities.format(t.airOutTemperature(), Dimension.TEMPERATURE, units);
                default -> Quantities.format(t.duty(), Dimension.HEAT_FLOW, units);
            };
        }
    }
}
