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
 * The selected option's rating: total capacity and its band (10th to 90th percentile, filled in
 * when the comparison that rates it is done), sensible and latent capacity, sensible heat ratio,
 * condensate, air out and its relative humidity, air pressure drop, airflow, UA, NTU, fin
 * efficiency; for a full refrigerant side its outlet state (superheat or subcooling), mass flow,
 * pressure drop and saturation-temperature drop, charge, the temperature difference on its stated
 * basis and the energy-balance error; the zones of the zone model; a frost warning; the warnings;
 * the picture of where the heat is held back; and the cautions for the refrigerant.
 */
final class ResultsPanel extends JPanel {

    private static final long serialVersionUID = 1L;

    /** The values shown, in order; each has a label {@code results.KEY}. */
    static final List<String> KEYS = List.of("capacity", "capacityBand", "sensible", "latent", "shr", "airIn", "airOut", "airOutRh",
        "condensate", "airPressureDrop", "airflow", "faceVelocity", "ua", "ntu", "finEfficiency",
        "surfaceEffectiveness", "effectiveness", "airCoefficient", "refrigerantOutlet", "refrigerantMassFlow",
        "refrigerantPressureDrop", "saturationDrop", "charge", "td", "energyBalance");

    private final Map<String, JLabel> values = new LinkedHashMap<>();
    private final JLabel headline = new JLabel(" ");
    private final JLabel summary = new JLabel(" ");
    private final JTextArea warnings = new JTextArea(4, 40);
    private final JTextArea cautions = new JTextArea(3, 40);
    private final JPanel cautionBox = new JPanel(new BorderLayout());
    private final JTextArea frost = note();
    private final JTextArea zones = note();
    private final JTextArea tdBasis = note();
    private List<String> cautionLines = List.of();
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
        frost.setName("results.frost");
        frost.setForeground(Theme.color("Finstack.error", frost.getForeground()));
        frost.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        zones.setName("results.zones");
        tdBasis.setName("results.tdBasis");
        tdBasis.setText(Messages.format("results.tdBasis", org.finstack.io.RatingJson.TD_BASIS));
        frost.setFont(frost.getFont().deriveFont(java.awt.Font.BOLD));
        values.get("td").setToolTipText(org.finstack.io.RatingJson.TD_BASIS);
        JPanel notes = new JPanel();
        notes.setLayout(new BoxLayout(notes, BoxLayout.Y_AXIS));
        for (JComponent c : List.of(tdBasis, zones, frost)) {
            c.setAlignmentX(LEFT_ALIGNMENT);
            notes.add(c);
        }
        JPanel top = new JPanel(new BorderLayout(0, UIScale.scale(6)));
        top.add(headline, BorderLayout.NORTH);
        top.add(grid, BorderLayout.CENTER);
        top.add(notes, BorderLayout.SOUTH);
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
        frost.setText(" ");
        zones.setText(" ");
    }

    /** @param text what to show for the capacity band: its ends, "working", "off" or why it is missing */
    void band(String text) {
        set("capacityBand", text);
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
     * @param cautions the cautions for its refrigerant
     */
    void show(String name, CoilCase c, Rating r, UnitSystem u, List<String> cautions) {
        rating = r;
        ratedCase = c;
        cautionLines = List.copyOf(cautions);
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
        Rating.Moisture m = r.moisture();
        set("sensible", Quantities.format(m.sensibleCapacity(), Dimension.HEAT_FLOW, u));
        set("latent", Quantities.format(m.latentCapacity(), Dimension.HEAT_FLOW, u));
        set("shr", String.format(Locale.ROOT, "%.2f", m.sensibleHeatRatio()));
        set("condensate", Quantities.format(m.condensate(), Dimension.MASS_FLOW, u,
                u == UnitSystem.US ? "lb/h" : "kg/h"));
        set("airOutRh", String.format(Locale.ROOT, "%.0f %%", 100 * m.airOutletRelativeHumidity()));
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
        Rating.RefrigerantResult ref = r.refrigerant();
        if (ref == null) {
            for (String k : List.of("refrigerantOutlet", "refrigerantMassFlow", "refrigerantPressureDrop",
                    "saturationDrop", "charge", "td", "energyBalance")) {
                set(k, Messages.get("results.notModelled"));
            }
        } else {
            set("refrigerantOutlet", outlet(r, u));
            set("refrigerantMassFlow", Quantities.format(ref.massFlow(), Dimension.MASS_FLOW, u));
            set("refrigerantPressureDrop", Quantities.format(ref.pressureDrop(), Dimension.PRESSURE_DIFFERENCE, u));
            set("saturationDrop", Quantities.format(ref.saturationTemperatureDrop(), Dimension.TEMPERATURE_DIFFERENCE,
                    u));
            set("charge", Quantities.format(ref.charge(), Dimension.MASS, u));
            set("td", Quantities.format(org.finstack.io.RatingJson.temperatureDifference(r),
                    Dimension.TEMPERATURE_DIFFERENCE, u));
            set("energyBalance", String.format(Locale.ROOT, "%+.2f %%", 100 * ref.energyBalanceError()));
        }
        tdBasis.setVisible(ref != null);
        frost.setText(m.frost() ? "\u2744 " + Messages.get("results.frostWarning") : " ");
        frost.setVisible(m.frost());
        List<String> z = new ArrayList<>();
        for (Rating.ZoneResult zr : r.zones()) {
            z.add(Messages.format("results.zone", zr.name(), String.format(Locale.ROOT, "%.0f", 100 * zr.areaFraction()),
                    Quantities.format(zr.duty(), Dimension.HEAT_FLOW, u),
                    Quantities.format(zr.insideCoefficient(), Dimension.HEAT_TRANSFER_COEFFICIENT, u),
                    zr.wet() ? Messages.get("results.zoneWet") : Messages.get("results.zoneDry")));
        }
        zones.setText(z.isEmpty() ? " " : Messages.get("results.zonesTitle") + "  " + String.join("   \u00b7   ", z));
        zones.setVisible(!z.isEmpty());
        List<ResistanceBars.Bar> list = new ArrayList<>();
        r.resistances().shares().forEach((k, v) -> list.add(new ResistanceBars.Bar(
                Messages.get("results.resistance." + k), v)));
        bars.set(list);
        warnings.setText(r.warnings().isEmpty() ? Messages.get("results.noWarnings")
                : "\u2022 " + String.join("\n\u2022 ", r.warnings()));
        warnings.setCaretPosition(0);
        String text = String.join("\n", cautionLines);
        cautions.setText(text);
        cautionBox.setVisible(!text.isEmpty());
        revalidate();
    }

    /** @return the refrigerant's outlet state: superheat or subcooling, and the quality when two-phase */
    private static String outlet(Rating r, UnitSystem u) {
        Rating.RefrigerantResult ref = r.refrigerant();
        boolean evaporator = r.duty() == org.finstack.coil.Duty.EVAPORATOR;
        String t = Quantities.format(ref.outletTemperature(), Dimension.TEMPERATURE, u);
        if (ref.outletQuality() >= 0) {
            return Messages.format("results.outletTwoPhase", String.format(Locale.ROOT, "%.2f", ref.outletQuality()), t);
        }
        return Messages.format(evaporator ? "results.outletSuperheat" : "results.outletSubcooling",
                Quantities.format(evaporator ? ref.outletSuperheat() : ref.outletSubcooling(),
                        Dimension.TEMPERATURE_DIFFERENCE, u), t);
    }

    /** @return a read-only text that wraps to the panel's width instead of widening it */
    private static JTextArea note() {
        JTextArea t = new JTextArea(" ", 1, 40);
        t.setEditable(false);
        t.setLineWrap(true);
        t.setWrapStyleWord(true);
        t.setOpaque(false);
        t.setFocusable(false);
        t.setBorder(BorderFactory.createEmptyBorder(1, 0, 1, 0));
        return t;
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

    /** @return the cautions shown with the rating */
    List<String> cautions() {
        return cautionLines;
    }

    /**
     * @param key one of {@link #KEYS}
     * @return the text shown for it
     */
    String value(String key) {
        return values.get(key).getText();
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
