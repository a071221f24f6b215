package org.finstack.ui;

import com.formdev.flatlaf.FlatClientProperties;
import com.formdev.flatlaf.util.UIScale;
import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Component;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import javax.swing.BorderFactory;
import javax.swing.Box;
import javax.swing.BoxLayout;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextArea;
import javax.swing.text.DefaultCaret;
import org.finstack.coil.CoilCase;
import org.finstack.coil.Duty;
import org.finstack.coil.FoulingResistances;
import org.finstack.coil.RefrigerantSide;
import org.finstack.core.Check;
import org.finstack.core.FinstackException;
import org.finstack.core.InputException;
import org.finstack.study.diagnosis.Diagnosis;
import org.finstack.study.diagnosis.Estimate;
import org.finstack.study.diagnosis.HealthyRanges;
import org.finstack.study.diagnosis.Measurements;
import org.finstack.study.diagnosis.Reading;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;

/**
 * The diagnosis tab: field readings on the selected option's coil, each with its instrument's
 * accuracy, diagnosed by {@link Diagnosis} in a worker (progress, Cancel): the present and clean
 * UA, the fouling level, the air-side fouling resistance, the capacity now and clean and the
 * share lost, each with its 10th-to-90th-percentile range; beside each reading the range a
 * healthy coil shows ({@link HealthyRanges}, common practice), odd ones marked. The option's own
 * air-side fouling is left out of the diagnosed coil: it is what the readings reveal. A reading
 * the study refuses (leaving air warmer than entering on an evaporator, no airflow) is shown as
 * the study's one-line message, and its field is marked.
 */
final class DiagnosisPanel extends JPanel {

    private static final long serialVersionUID = 1L;

    /** A reading's value field, its accuracy field and the label for its healthy range. */
    private record Row(QuantityField value, QuantityField accuracy, JLabel healthy, JComponent[] parts) {
    }

    private static final String IN = "measured.airInletTemperature";
    private static final String OUT = "measured.airOutletTemperature";
    private static final String RH = "measured.airInletRelativeHumidity";
    private static final String FLOW = "measured.volumeFlow";
    private static final String SAT = "measured.saturationTemperature";
    private static final String SUPERHEAT = "measured.superheat";
    private static final String SUBCOOLING = "measured.subcooling";

    private final ProjectModel model;
    private final Map<String, Row> rows = new LinkedHashMap<>();
    private final JLabel heading = new JLabel(" ");
    private final JLabel error = new JLabel(" ");
    private final Map<String, JLabel> results = new LinkedHashMap<>();
    private final JTextArea warnings = new JTextArea(4, 40);
    private final JTextArea cautions = new JTextArea(3, 40);
    private final JPanel cautionBox = new JPanel(new BorderLayout());
    private final StudyRun run;
    private Duty shownDuty;
    private Diagnosis last;

    /** The results shown, by their key under {@code field.diagnosis.result.}. */
    static final List<String> RESULTS = List.of("measuredDuty", "ua", "cleanUa", "foulingLevel", "airSideFouling",
            "capacityNow", "capacityClean", "loss");

    /** @param model the workbench's project, selection and units */
    DiagnosisPanel(ProjectModel model) {
        super(new BorderLayout());
        this.model = model;
        setName("field.diagnosis");
        run = new StudyRun("diagnosis", Messages.get("field.diagnosis.run"), this::diagnose);
        JPanel grid = new JPanel(new GridBagLayout());
        grid.setBorder(BorderFactory.createEmptyBorder(8, 10, 8, 10));
        int y = 0;
        JLabel group = new JLabel(Messages.get("field.diagnosis.readings"));
        group.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        grid.add(group, cell(0, y++, 4));
        addRow(grid, y++, IN, Dimension.TEMPERATURE, Dimension.TEMPERATURE_DIFFERENCE);
        addRow(grid, y++, OUT, Dimension.TEMPERATURE, Dimension.TEMPERATURE_DIFFERENCE);
        addRow(grid, y++, RH, Dimension.DIMENSIONLESS, Dimension.DIMENSIONLESS);
        addRow(grid, y++, FLOW, Dimension.VOLUME_FLOW, Dimension.DIMENSIONLESS);
        addRow(grid, y++, SAT, Dimension.TEMPERATURE, Dimension.TEMPERATURE_DIFFERENCE);
        addRow(grid, y++, SUPERHEAT, Dimension.TEMPERATURE_DIFFERENCE, Dimension.TEMPERATURE_DIFFERENCE);
        addRow(grid, y++, SUBCOOLING, Dimension.TEMPERATURE_DIFFERENCE, Dimension.TEMPERATURE_DIFFERENCE);
        JLabel basis = new JLabel("<html>" + Messages.format("field.diagnosis.healthyBasis", HealthyRanges.BASIS)
                + "</html>");
        grid.add(basis, cell(0, y++, 4));
        grid.add(run, cell(0, y++, 4));
        error.setName("diagnosis.error");
        error.setForeground(Theme.color("Finstack.error", Color.RED.darker()));
        grid.add(error, cell(0, y++, 4));
        JLabel resultTitle = new JLabel(Messages.get("field.diagnosis.results"));
        resultTitle.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        heading.setName("diagnosis.heading");
        grid.add(resultTitle, cell(0, y++, 4));
        grid.add(heading, cell(0, y++, 4));
        for (String k : RESULTS) {
            JLabel name = new JLabel(Messages.get("field.diagnosis.result." + k));
            JLabel value = new JLabel(" ");
            value.setName("diagnosis." + k);
            results.put(k, value);
            GridBagConstraints a = cell(0, y, 1);
            a.insets = new Insets(2, 8, 2, 8);
            grid.add(name, a);
            grid.add(value, cell(1, y++, 3));
        }
        GridBagConstraints fill = cell(0, y, 4);
        fill.weighty = 1;
        grid.add(new JPanel(), fill);

        warnings.setName("diagnosis.warnings");
        cautions.setName("diagnosis.cautions");
        for (JTextArea t : List.of(warnings, cautions)) {
            t.setEditable(false);
            t.setLineWrap(true);
            t.setWrapStyleWord(true);
            ((DefaultCaret) t.getCaret()).setUpdatePolicy(DefaultCaret.NEVER_UPDATE);
        }
        cautions.setBackground(Theme.color("Finstack.caution.background", cautions.getBackground()));
        cautions.setForeground(Theme.color("Finstack.caution.foreground", cautions.getForeground()));
        JLabel cautionTitle = new JLabel(Messages.get("field.cautionsTitle"));
        cautionTitle.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        cautionBox.add(cautionTitle, BorderLayout.NORTH);
        cautionBox.add(cautions, BorderLayout.CENTER);
        cautionBox.setBorder(BorderFactory.createMatteBorder(0, UIScale.scale(4), 0, 0,
                Theme.color("Finstack.caution.stripe", Color.ORANGE)));
        cautionBox.setVisible(false);
        JPanel bottom = new JPanel();
        bottom.setLayout(new BoxLayout(bottom, BoxLayout.Y_AXIS));
        bottom.setBorder(BorderFactory.createEmptyBorder(0, 10, 8, 10));
        JLabel warnTitle = new JLabel(Messages.get("field.notesTitle"));
        warnTitle.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        for (JComponent c : List.of(warnTitle, new JScrollPane(warnings), cautionBox)) {
            c.setAlignmentX(Component.LEFT_ALIGNMENT);
            bottom.add(c);
            bottom.add(Box.createVerticalStrut(UIScale.scale(6)));
        }
        add(new JScrollPane(grid), BorderLayout.CENTER);
        add(bottom, BorderLayout.SOUTH);
        refresh();
        model.addListener(c -> {
            if (c == ProjectModel.Change.UNITS) {
                rows.values().forEach(r -> {
                    r.value().convert(model.units());
                    r.accuracy().convert(model.units());
                });
                if (last != null) {
                    show(last);
                }
            } else if (c == ProjectModel.Change.PROJECT || c == ProjectModel.Change.SELECTION) {
                refresh();
            }
        });
    }

    private static GridBagConstraints cell(int x, int y, int width) {
        GridBagConstraints c = new GridBagConstraints();
        c.gridx = x;
        c.gridy = y;
        c.gridwidth = width;
        c.anchor = GridBagConstraints.WEST;
        c.insets = new Insets(2, 0, 2, 8);
        return c;
    }

    private void addRow(JPanel grid, int y, String key, Dimension value, Dimension accuracy) {
        String name = key.substring("measured.".length());
        JLabel label = new JLabel(Messages.get("field.diagnosis.reading." + name));
        QuantityField v = new QuantityField(key, value, false);
        QuantityField a = new QuantityField(key + ".accuracy", accuracy, false);
        v.setColumns(9);
        a.setColumns(6);
        label.setLabelFor(v);
        a.setToolTipText(Messages.get(key.equals(FLOW) ? "field.diagnosis.accuracyShare.tip"
                : "field.diagnosis.accuracy.tip"));
        JLabel plusMinus = new JLabel("\u00b1");
        JLabel healthy = new JLabel(" ");
        healthy.setName("diagnosis.healthy." + name);
        healthy.setOpaque(true);
        GridBagConstraints l = cell(0, y, 1);
        l.insets = new Insets(2, 8, 2, 8);
        grid.add(label, l);
        grid.add(v, cell(1, y, 1));
        JPanel acc = new JPanel(new java.awt.FlowLayout(java.awt.FlowLayout.LEFT, 4, 0));
        acc.add(plusMinus);
        acc.add(a);
        grid.add(acc, cell(2, y, 1));
        GridBagConstraints h = cell(3, y, 1);
        h.weightx = 1;
        grid.add(healthy, h);
        rows.put(key, new Row(v, a, healthy, new JComponent[] {label, v, acc, healthy}));
    }

    /** Shows the rows the selected option's duty needs and fills them from its conditions when the duty changed. */
    private void refresh() {
        Optional<CoilCase> selected = model.selectedCase();
        if (selected.isEmpty()) {
            return;
        }
        CoilCase c = selected.get();
        RefrigerantSide r = c.refrigerant();
        Duty duty = r.duty();
        if (duty == shownDuty) {
            return;
        }
        shownDuty = duty;
        boolean evaporator = duty == Duty.EVAPORATOR;
        visible(RH, evaporator);
        visible(SUPERHEAT, evaporator);
        visible(SUBCOOLING, !evaporator);
        UnitSystem u = model.units();
        // starting values from the option's conditions; the readings replace them. Accuracies are
        // typical stated limits of service instruments (common practice): 0.3 K thermometers,
        // 3 % RH, 10 % for an anemometer traverse, 0.5 K from a gauge's saturation scale
        show(IN, c.air().temperature(), 0.3, u);
        rows.get(OUT).value().setText("");
        rows.get(OUT).accuracy().show(0.3, u);
        show(RH, c.air().relativeHumidity(), 0.03, u);
        show(FLOW, c.air().volumeFlow(c.coil().derive().faceArea()), 0.1, u);
        show(SAT, r.saturationTemperature(), 0.5, u);
        double held = r.target() instanceof RefrigerantSide.Target.Superheat s ? s.kelvin()
                : r.target() instanceof RefrigerantSide.Target.Subcooling s ? s.kelvin() : 5;
        show(evaporator ? SUPERHEAT : SUBCOOLING, held, 0.5, u);
        rows.values().forEach(row -> row.healthy().setText(" "));
    }

    private void show(String key, double value, double accuracy, UnitSystem u) {
        rows.get(key).value().show(value, u);
        rows.get(key).accuracy().show(accuracy, u);
    }

    private void visible(String key, boolean on) {
        for (JComponent c : rows.get(key).parts()) {
            c.setVisible(on);
        }
    }

    /** Reads the fields and starts the diagnosis. */
    void diagnose() {
        error.setText(" ");
        rows.values().forEach(r -> {
            r.value().clearError();
            r.accuracy().clearError();
        });
        CoilCase c;
        try {
            c = model.project().caseOf(model.selected());
        } catch (FinstackException e) {
            refused(e);
            return;
        }
        boolean evaporator = c.refrigerant().duty() == Duty.EVAPORATOR;
        String held = evaporator ? SUPERHEAT : SUBCOOLING;
        Reading in;
        Reading out;
        Reading rh;
        Reading flow;
        Reading sat;
        Reading outlet;
        try {
            in = reading(IN);
            out = reading(OUT);
            rh = evaporator ? reading(RH) : null;
            double q = read(rows.get(FLOW).value());
            // the accuracy is a share of the reading; of its size, so that a negative airflow is
            // refused by the study as an airflow, not as a negative accuracy
            flow = new Reading(q, Math.abs(q) * notNegative(rows.get(FLOW).accuracy()));
            sat = reading(SAT);
            outlet = reading(held);
        } catch (InputException e) {
            refused(e);
            return;
        }
        String option = model.option().name();
        FoulingResistances f = c.fouling();
        CoilCase template = c.withFouling(new FoulingResistances(0, f.inside(), f.contact()));
        Duty duty = c.refrigerant().duty();
        double pressure = c.air().pressure();
        run.start(p -> new Result(option, Diagnosis.of(template, new Measurements(duty, in, out, rh, null, flow, sat,
                outlet, null, pressure), null, p), RatingRunner.cautions(c)), r -> {
                    heading.setText(Messages.format("field.diagnosis.heading", r.option()));
                    show(r.diagnosis());
                    cautions.setText(String.join("\n", r.cautions()));
                    cautionBox.setVisible(!r.cautions().isEmpty());
                }, this::refused);
    }

    /** A diagnosis with what goes beside it. */
    private record Result(String option, Diagnosis diagnosis, List<String> cautions) {
    }

    private Reading reading(String key) {
        Row r = rows.get(key);
        return new Reading(read(r.value()), notNegative(r.accuracy()));
    }

    /** An accuracy, refused here under its reading's own field (the study's check names only "accuracy"). */
    private static double notNegative(QuantityField f) {
        double v = read(f);
        try {
            return Check.nonNegative(f.key(), v);
        } catch (InputException e) {
            f.showError(e.getMessage());
            throw e;
        }
    }

    private static double read(QuantityField f) {
        try {
            return f.read();
        } catch (InputException e) {
            f.showError(e.getMessage());
            throw e;
        }
    }

    private void refused(FinstackException e) {
        last = null;
        error.setText("<html>" + e.getMessage() + "</html>");
        results.values().forEach(l -> l.setText(" "));
        rows.values().forEach(r -> r.healthy().setText(" "));
        warnings.setText("");
        if (e instanceof InputException ie) {
            Row r = rows.get(ie.field());
            if (r != null) {
                r.value().showError(e.getMessage());
            }
        }
    }

    private void show(Diagnosis d) {
        last = d;
        error.setText(" ");
        UnitSystem u = model.units();
        results.get("measuredDuty").setText(range(d.measuredDuty(), Dimension.HEAT_FLOW, u)
                + " (" + d.basis().id() + ")");
        results.get("ua").setText(range(d.ua(), Dimension.UA, u));
        results.get("cleanUa").setText(range(d.cleanUa(), Dimension.UA, u));
        results.get("foulingLevel").setText(share(d.foulingLevel()));
        results.get("airSideFouling").setText(range(d.airSideFouling(), Dimension.FOULING_RESISTANCE, u));
        results.get("capacityNow").setText(range(d.capacityNow(), Dimension.HEAT_FLOW, u));
        results.get("capacityClean").setText(range(d.capacityClean(), Dimension.HEAT_FLOW, u));
        results.get("loss").setText(share(d.capacityLossFraction()));
        boolean evaporator = d.measurements().duty() == Duty.EVAPORATOR;
        // HealthyRanges.check gives, in order: air temperature change, superheat or subcooling,
        // temperature difference, face velocity
        String[] beside = {OUT, evaporator ? SUPERHEAT : SUBCOOLING, SAT, FLOW};
        Color odd = Theme.color("Finstack.caution.background", new Color(0xFDF3DF));
        for (int i = 0; i < beside.length && i < d.ranges().size(); i++) {
            HealthyRanges.RangeCheck rc = d.ranges().get(i);
            JLabel l = rows.get(beside[i]).healthy();
            String text = Messages.format("field.diagnosis.healthy", rc.name(), brief(rc.value()), rc.unit(),
                    brief(rc.low()), brief(rc.high()));
            l.setText(rc.typical() ? text : Messages.format("field.diagnosis.odd", text, rc.status()));
            l.setBackground(rc.typical() ? getBackground() : odd);
            l.setForeground(rc.typical() ? getForeground() : Theme.color("Finstack.error", Color.RED.darker()));
        }
        warnings.setText(String.join("\n", d.warnings()));
    }

    private static String range(Estimate e, Dimension dim, UnitSystem u) {
        return Messages.format("field.diagnosis.range", Quantities.format(e.value(), dim, u),
                Quantities.format(e.low(), dim, u), Quantities.format(e.high(), dim, u));
    }

    private static String share(Estimate e) {
        return Messages.format("field.diagnosis.range", pct(e.value()), pct(e.low()), pct(e.high()));
    }

    private static String pct(double v) {
        return String.format(Locale.ROOT, "%.1f %%", 100 * v);
    }

    private static String brief(double v) {
        return String.format(Locale.ROOT, "%.1f", v);
    }

    /** @return the last diagnosis shown, or null */
    Diagnosis diagnosis() {
        return last;
    }

    /** @return the run controls */
    StudyRun runner() {
        return run;
    }

    /**
     * @param key a reading's key, e.g. {@code measured.airOutletTemperature}
     * @return its value field
     */
    QuantityField field(String key) {
        return rows.get(key).value();
    }

    /** @return the error shown, or a blank */
    String error() {
        return error.getText();
    }
}
