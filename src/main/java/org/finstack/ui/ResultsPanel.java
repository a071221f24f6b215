package org.finstack.ui;

import com.formdev.flatlaf.FlatClientProperties;
import com.formdev.flatlaf.util.UIScale;
import java.awt.BorderLayout;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.GridLayout;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import javax.swing.BorderFactory;
import javax.swing.BoxLayout;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextArea;
import org.finstack.coil.CoilCase;
import org.finstack.coil.Rating;
import org.finstack.ui.draw.ResistanceBars;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;

/**
 * The selected option's rating: capacity, air out, air pressure drop, airflow, UA, NTU, fin
 * efficiency; the warnings; the picture of where the heat is held back; and, for refrigerants
 * that call for them, the cautions.
 */
final class ResultsPanel extends JPanel {

    private static final long serialVersionUID = 1L;

    private static final String[] KEYS = {"capacity", "airIn", "airOut", "airPressureDrop", "airflow",
        "faceVelocity", "ua", "ntu", "finEfficiency", "surfaceEffectiveness", "effectiveness", "airCoefficient"};

    private final Map<String, JLabel> values = new LinkedHashMap<>();
    private final JLabel headline = new JLabel(" ");
    private final JLabel summary = new JLabel(" ");
    private final JTextArea warnings = new JTextArea(4, 40);
    private final JTextArea cautions = new JTextArea(3, 40);
    private final JPanel cautionBox = new JPanel(new BorderLayout());
    private final BarsComponent bars = new BarsComponent();
    private Rating rating;
    private CoilCase ratedCase;

    ResultsPanel() {
        super(new BorderLayout());
        setBorder(BorderFactory.createEmptyBorder(8, 10, 8, 10));
        headline.setName("results.headline");
        summary.setName("summary");
        summary.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        headline.putClientProperty(FlatClientProperties.STYLE_CLASS, "h3");
        JPanel grid = new JPanel(new GridLayout(0, 4, UIScale.scale(10), UIScale.scale(4)));
        for (String k : KEYS) {
            JLabel name = new JLabel(Messages.get("results." + k));
            JLabel v = new JLabel("-");
            v.setName("results." + k);
            v.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
            values.put(k, v);
            grid.add(name);
            grid.add(v);
        }
        JPanel top = new JPanel(new BorderLayout(0, UIScale.scale(6)));
        top.add(headline, BorderLayout.NORTH);
        top.add(grid, BorderLayout.CENTER);
        JPanel middle = new JPanel();
        middle.setLayout(new BoxLayout(middle, BoxLayout.Y_AXIS));
        JLabel barsTitle = new JLabel(Messages.get("results.heldBack"));
        barsTitle.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        barsTitle.setAlignmentX(LEFT_ALIGNMENT);
        bars.setAlignmentX(LEFT_ALIGNMENT);
        middle.add(javax.swing.Box.createVerticalStrut(UIScale.scale(10)));
        middle.add(barsTitle);
        middle.add(bars);
        warnings.setName("results.warnings");
        warnings.setEditable(false);
        warnings.setLineWrap(true);
        warnings.setWrapStyleWord(true);
        cautions.setName("results.cautions");
        cautions.setEditable(false);
        cautions.setLineWrap(true);
        cautions.setWrapStyleWord(true);
        cautions.setBackground(Theme.color("Finstack.caution.background", cautions.getBackground()));
        cautions.setForeground(Theme.color("Finstack.caution.foreground", cautions.getForeground()));
        JLabel cautionTitle = new JLabel(Messages.get("results.cautionsTitle"));
        cautionTitle.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        cautionBox.add(cautionTitle, BorderLayout.NORTH);
        cautionBox.add(cautions, BorderLayout.CENTER);
        cautionBox.setBorder(BorderFactory.createMatteBorder(0, UIScale.scale(4), 0, 0,
                Theme.color("Finstack.caution.stripe", java.awt.Color.ORANGE)));
        cautionBox.setVisible(false);
        JPanel bottom = new JPanel();
        bottom.setLayout(new BoxLayout(bottom, BoxLayout.Y_AXIS));
        JLabel warnTitle = new JLabel(Messages.get("results.warningsTitle"));
        warnTitle.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        for (JComponent c : List.of(warnTitle, new JScrollPane(warnings), cautionBox)) {
            c.setAlignmentX(LEFT_ALIGNMENT);
            bottom.add(c);
        }
        JPanel body = new JPanel(new BorderLayout());
        body.add(top, BorderLayout.NORTH);
        body.add(middle, BorderLayout.CENTER);
        body.add(bottom, BorderLayout.SOUTH);
        add(body, BorderLayout.NORTH);
    }

    /** Shows that nothing is rated until the marked entries are fixed. */
    void showInvalid(String reason) {
        rating = null;
        headline.setText(Messages.format("results.invalid", reason));
        summary.setText(headline.getText());
        values.values().forEach(v -> v.setText("-"));
        bars.set(List.of());
        warnings.setText("");
        cautionBox.setVisible(false);
    }

    /** @param text a status line, e.g. while a rating runs */
    void headline(String text) {
        headline.setText(text);
    }

    /**
     * Shows a rating.
     *
     * @param name the option's name
     * @param c    the case rated
     * @param r    its rating
     * @param u    the unit system
     */
    void show(String name, CoilCase c, Rating r, UnitSystem u) {
        rating = r;
        ratedCase = c;
        headline.setText(Messages.format("results.headlineRated", name, r.model()));
        refresh(u);
    }

    /** @param u the unit system to show the last rating in */
    void refresh(UnitSystem u) {
        if (rating == null) {
            return;
        }
        Rating r = rating;
        set("capacity", Quantities.format(r.capacity(), Dimension.HEAT_FLOW, u));
        summary.setText(Messages.format("results.summary", Quantities.format(r.capacity(), Dimension.HEAT_FLOW, u),
                Quantities.format(r.airOutletTemperature(), Dimension.TEMPERATURE, u),
                Quantities.format(r.airPressureDrop(), Dimension.PRESSURE_DIFFERENCE, u),
                r.warnings().isEmpty() ? "" : Messages.format("results.summaryWarnings", r.warnings().size())));
        set("airIn", Quantities.format(r.airInletTemperature(), Dimension.TEMPERATURE, u));
        set("airOut", Quantities.format(r.airOutletTemperature(), Dimension.TEMPERATURE, u));
        set("airPressureDrop", Quantities.format(r.airPressureDrop(), Dimension.PRESSURE_DIFFERENCE, u));
        set("airflow", Quantities.format(r.airVolumeFlow(), Dimension.VOLUME_FLOW, u));
        set("faceVelocity", Quantities.format(r.faceVelocity(), Dimension.VELOCITY, u));
        set("ua", Quantities.format(r.ua(), Dimension.UA, u));
        set("ntu", String.format(Locale.ROOT, "%.3f", r.ntu()));
        set("finEfficiency", String.format(Locale.ROOT, "%.3f", r.finEfficiency()));
        set("surfaceEffectiveness", String.format(Locale.ROOT, "%.3f", r.surfaceEffectiveness()));
        set("effectiveness", String.format(Locale.ROOT, "%.3f", r.effectiveness()));
        set("airCoefficient", Quantities.format(r.airCoefficient(), Dimension.HEAT_TRANSFER_COEFFICIENT, u));
        List<ResistanceBars.Bar> list = new ArrayList<>();
        r.resistances().shares().forEach((k, v) -> list.add(new ResistanceBars.Bar(
                Messages.get("results.resistance." + k), v)));
        bars.set(list);
        warnings.setText(r.warnings().isEmpty() ? Messages.get("results.noWarnings")
                : "\u2022 " + String.join("\n\u2022 ", r.warnings()));
        warnings.setCaretPosition(0);
        String text = Cautions.forCase(ratedCase);
        cautions.setText(text);
        cautionBox.setVisible(!text.isEmpty());
        revalidate();
    }

    private void set(String key, String text) {
        values.get(key).setText(text);
    }

    /** @return the one-line summary of the rating shown, placed above the tabs by the window */
    JLabel summary() {
        return summary;
    }

    /** @return the rating shown, or null */
    Rating rating() {
        return rating;
    }

    /** @return the hazards of the refrigerant shown, for tests */
    Set<RefrigerantSafety.Hazard> hazards() {
        return ratedCase == null ? Set.of() : RefrigerantSafety.hazards(ratedCase.refrigerant().fluid());
    }

    /** Paints the resistance bars with the theme's palette. */
    private static final class BarsComponent extends JComponent {

        private static final long serialVersionUID = 1L;
        private List<ResistanceBars.Bar> list = List.of();

        BarsComponent() {
            setName("results.bars");
        }

        void set(List<ResistanceBars.Bar> bars) {
            list = List.copyOf(bars);
            int h = ResistanceBars.preferredHeight(list);
            setPreferredSize(new java.awt.Dimension(UIScale.scale(520), h));
            setMaximumSize(new java.awt.Dimension(Integer.MAX_VALUE, h));
            revalidate();
            repaint();
        }

        @Override
        protected void paintComponent(Graphics g) {
            ResistanceBars.paint((Graphics2D) g, new Rectangle2D.Double(0, 0, getWidth(), getHeight()), list,
                    Theme.palette());
        }
    }
}
