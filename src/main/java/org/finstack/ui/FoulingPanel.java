package org.finstack.ui;

import com.formdev.flatlaf.FlatClientProperties;
import com.formdev.flatlaf.util.UIScale;
import java.awt.BasicStroke;
import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Component;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import javax.swing.BorderFactory;
import javax.swing.Box;
import javax.swing.BoxLayout;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSpinner;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.ListSelectionModel;
import javax.swing.Scrollable;
import javax.swing.SpinnerNumberModel;
import javax.swing.table.DefaultTableModel;
import javax.swing.text.DefaultCaret;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.Duty;
import org.finstack.coil.Rating;
import org.finstack.core.FinstackException;
import org.finstack.core.Numbers;
import org.finstack.core.Warnings;
import org.finstack.geometry.CoilGeometry;
import org.finstack.study.Constraints;
import org.finstack.study.Progress;
import org.finstack.study.Project;
import org.finstack.study.cost.CleaningCase;
import org.finstack.study.cost.CleaningPayback;
import org.finstack.study.cost.FouledCoil;
import org.finstack.study.cost.Tariff;
import org.finstack.study.fan.ConstantAirflowEcFan;
import org.finstack.study.fan.FanCurve;
import org.finstack.study.fan.FixedSpeedFan;
import org.finstack.study.fouling.CoilFan;
import org.finstack.study.fouling.FanInLoop;
import org.finstack.study.fouling.FoulingLevel;
import org.finstack.study.fouling.FoulingStudy;
import org.finstack.study.frost.FrostStudy;
import org.finstack.ui.draw.Palette;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The fouling and frost tab: for the selected option's case, with a chosen fan in the loop, the
 * fouling curve from the clean coil to a heavy dust deposit ({@link FoulingStudy}) as a chart and
 * a table; for an evaporator below 0 °C the frost timeline and the defrost interval
 * ({@link FrostStudy}); and what the dirt costs a year and how soon a cleaning pays back at each
 * level ({@link CleaningCase#fromCapacityLoss}, {@link CleaningPayback}). Everything is worked out
 * in one worker with progress and Cancel; this panel only reads fields and shows results.
 */
final class FoulingPanel extends JPanel {

    private static final long serialVersionUID = 1L;

    /**
     * Speed reserve of the generic constant-airflow EC fan over its design point [-]; a choice of
     * this program (the maker's figure governs a real fan), as in {@link ConstantAirflowEcFan}'s
     * worked example.
     */
    static final double EC_SPEED_RESERVE = 1.3;

    /** Time steps of the frost march; the {@code frost} command's default. */
    static final int FROST_STEPS = 24;

    private static final double KELVIN_AT_0C = 273.15; // exact by definition

    /** Which fan moves the air. */
    enum FanChoice {
        /** The project's fan curve ({@code constraints.fanCurve}). */
        PROJECT_CURVE,
        /** A generic axial propeller fan on a fixed-speed motor, sized to the clean coil. */
        AXIAL,
        /** A generic forward-curved centrifugal fan on a fixed-speed motor, sized to the clean coil. */
        FORWARD_CURVED,
        /** A generic constant-airflow EC fan, sized to the clean coil. */
        EC,
        /** No fan: the airflow held at the case's value. */
        HELD;

        @Override
        public String toString() {
            return Messages.get("field.fan." + name());
        }
    }

    /**
     * The cleaning inputs, as read from the fields.
     *
     * @param runHours           compressor running hours per year [h]
     * @param pricePerKwh        energy price [currency/kWh]
     * @param currency           currency label
     * @param efficiency         the plant's second-law efficiency [-]
     * @param cleaningCost       price of one cleaning [currency]
     * @param otherSaturation    the plant's other saturation temperature [K]
     */
    record PaybackInputs(double runHours, double pricePerKwh, String currency, double efficiency,
            double cleaningCost, double otherSaturation) {
    }

    /**
     * Everything one run found.
     *
     * @param option       the option's name
     * @param choice       the fan chosen
     * @param curve        the fouling curve
     * @param paybacks     one payback per level of the curve, empty when the cleaning inputs were refused
     * @param paybackError the refusal of the cleaning inputs, or null
     * @param frost        the frost march, or null when the coil cannot frost or the march was refused
     * @param frostNote    why there is no frost march, or null
     * @param cautions     the cautions for the refrigerant
     */
    record Outcome(String option, FanChoice choice, FoulingStudy.FoulingCurve curve,
            List<CleaningPayback> paybacks, String paybackError, FrostStudy.FrostResult frost, String frostNote,
            List<String> cautions) {
    }

    private final ProjectModel model;
    private final JComboBox<FanChoice> fan = new JComboBox<>();
    private final JLabel fanNote = new JLabel();
    private final QuantityField heaviest = new QuantityField("fouling.maxThickness", Dimension.LENGTH, false);
    // levels: the fouling command's default; hours: a starting span to follow the frost, a choice of this program
    private final JSpinner levels = new JSpinner(new SpinnerNumberModel(6, 2, 20, 1));
    private final JSpinner hours = new JSpinner(new SpinnerNumberModel(6.0, 0.5, 1000.0, 0.5));
    private final QuantityField runHours = new QuantityField("cleaning.runHours", Dimension.DIMENSIONLESS, false);
    private final QuantityField price = new QuantityField("cleaning.energyPrice", Dimension.DIMENSIONLESS, false);
    private final JTextField currency = new JTextField("EUR", 6);
    private final QuantityField efficiency = new QuantityField("cleaning.secondLawEfficiency",
            Dimension.DIMENSIONLESS, false);
    private final QuantityField cleaningCost = new QuantityField("cleaning.cost", Dimension.DIMENSIONLESS, false);
    private final QuantityField otherSaturation = new QuantityField("cleaning.otherSaturationTemperature",
            Dimension.TEMPERATURE, false);
    private final JLabel otherLabel;
    private final StudyRun run;
    private final JLabel heading = new JLabel(" ");
    private final ChartPanel foulingChart = new ChartPanel(null);
    private final DefaultTableModel rows = new DefaultTableModel(0, COLUMNS.length) {
        private static final long serialVersionUID = 1L;

        @Override
        public boolean isCellEditable(int row, int column) {
            return false;
        }
    };
    private final JTable table = new JTable(rows);
    private final JTextArea payback = text("fouling.payback");
    private final JTextArea frostSummary = text("fouling.frostSummary");
    private final ChartPanel frostChart = new ChartPanel(null);
    private final JTextArea notes = text("fouling.notes");
    private final JTextArea cautions = text("fouling.cautions");
    private final JPanel cautionBox = new JPanel(new BorderLayout());
    private Duty shownDuty;
    private CoilGeometry shownCoil;
    private Outcome last;

    /** The table's columns, by their message key under {@code field.fouling.column.}. */
    static final String[] COLUMNS = {"deposit", "capacity", "airflow", "pressureDrop", "loss", "fanPower", "dirtCost",
        "payback"};

    /** @param model the workbench's project, selection and units */
    FoulingPanel(ProjectModel model) {
        super(new BorderLayout());
        this.model = model;
        setName("field.fouling");
        fan.setName("fouling.fan");
        fanNote.setName("fouling.fanNote");
        fan.setPreferredSize(new java.awt.Dimension(UIScale.scale(170), fan.getPreferredSize().height));
        levels.setName("fouling.levels");
        hours.setName("fouling.hours");
        currency.setName("cleaning.currency");
        table.setName("fouling.table");
        heading.setName("fouling.heading");
        foulingChart.setName("fouling.chart");
        frostChart.setName("fouling.frostChart");
        for (int i = 0; i < COLUMNS.length; i++) {
            table.getColumnModel().getColumn(i).setHeaderValue(Messages.get("field.fouling.column." + COLUMNS[i]));
        }
        table.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        table.getSelectionModel().addListSelectionListener(e -> {
            if (!e.getValueIsAdjusting()) {
                showPayback();
            }
        });
        fan.addActionListener(e -> fanNote.setText(String.format(Locale.ROOT,
                "<html><body style='width: %dpx'>%s</body></html>", UIScale.scale(260),
                Messages.get(fan.getSelectedItem() == FanChoice.HELD ? "field.fan.heldNote"
                        : "field.fan.note"))));
        run = new StudyRun("fouling", Messages.get("field.fouling.run"), this::run);

        Form form = new Form();
        form.group(Messages.get("field.fouling.fanGroup"))
                .field(Messages.get("field.fouling.fan"), fan, null)
                .wide(fanNote)
                .field(Messages.get("field.fouling.maxThickness"), heaviest,
                        Messages.get("field.fouling.maxThickness.tip"))
                .field(Messages.get("field.fouling.levels"), levels, null)
                .group(Messages.get("field.frost.group"))
                .field(Messages.get("field.frost.hours"), hours, Messages.get("field.frost.hours.tip"))
                .group(Messages.get("field.cleaning.group"))
                .field(Messages.get("field.cleaning.runHours"), runHours, null)
                .field(Messages.get("field.cleaning.energyPrice"), price, null)
                .field(Messages.get("field.cleaning.currency"), currency, null)
                .field(Messages.get("field.cleaning.efficiency"), efficiency,
                        Messages.get("field.cleaning.efficiency.tip"))
                .field(Messages.get("field.cleaning.cost"), cleaningCost, null);
        form.field(" ", otherSaturation, Messages.get("field.cleaning.other.tip"));
        JPanel inputs = form.end();
        otherLabel = labelOf(inputs, otherSaturation);

        JPanel results = new WidthTracking();
        results.setLayout(new BoxLayout(results, BoxLayout.Y_AXIS));
        results.setBorder(BorderFactory.createEmptyBorder(8, 10, 8, 10));
        heading.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        foulingChart.setPreferredSize(new java.awt.Dimension(UIScale.scale(640), UIScale.scale(300)));
        frostChart.setPreferredSize(new java.awt.Dimension(UIScale.scale(640), UIScale.scale(260)));
        JScrollPane tableScroll = new JScrollPane(table);
        tableScroll.setPreferredSize(new java.awt.Dimension(UIScale.scale(640), UIScale.scale(170)));
        cautions.setBackground(Theme.color("Finstack.caution.background", cautions.getBackground()));
        cautions.setForeground(Theme.color("Finstack.caution.foreground", cautions.getForeground()));
        JLabel cautionTitle = title("field.cautionsTitle");
        cautionBox.add(cautionTitle, BorderLayout.NORTH);
        cautionBox.add(cautions, BorderLayout.CENTER);
        cautionBox.setBorder(BorderFactory.createMatteBorder(0, UIScale.scale(4), 0, 0,
                Theme.color("Finstack.caution.stripe", Color.ORANGE)));
        for (JComponent c : List.of(heading, foulingChart, tableScroll, title("field.cleaning.resultTitle"), payback,
                title("field.frost.title"), frostSummary, frostChart, title("field.notesTitle"), notes, cautionBox)) {
            c.setAlignmentX(Component.LEFT_ALIGNMENT);
            results.add(c);
            results.add(Box.createVerticalStrut(UIScale.scale(6)));
        }
        frostChart.setVisible(false);
        JPanel right = new JPanel(new BorderLayout());
        right.add(run, BorderLayout.NORTH);
        right.add(new JScrollPane(results), BorderLayout.CENTER);
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, new JScrollPane(inputs), right);
        split.setResizeWeight(0.3);
        split.setDividerLocation(UIScale.scale(400));
        add(split, BorderLayout.CENTER);

        for (JTextField f : List.of(heaviest, runHours, price, currency, efficiency, cleaningCost, otherSaturation)) {
            f.setColumns(7);
        }
        for (JSpinner sp : List.of(levels, hours)) {
            ((JSpinner.DefaultEditor) sp.getEditor()).getTextField().setColumns(4);
        }
        // starting values of the invented demo readings (examples/measured/otterby-rooftop-condenser-measured.json),
        // to be replaced by the site's own
        runHours.show(3000, UnitSystem.SI);
        price.show(0.20, UnitSystem.SI);
        efficiency.show(0.5, UnitSystem.SI);
        cleaningCost.show(250, UnitSystem.SI);
        refresh();
        model.addListener(c -> {
            if (c == ProjectModel.Change.UNITS) {
                heaviest.convert(model.units());
                otherSaturation.convert(model.units());
                if (last != null) {
                    show(last);
                }
            } else if (c == ProjectModel.Change.PROJECT || c == ProjectModel.Change.SELECTION) {
                refresh();
            }
        });
    }

    private static JTextArea text(String name) {
        JTextArea t = new JTextArea(3, 40);
        t.setName(name);
        t.setEditable(false);
        t.setLineWrap(true);
        t.setWrapStyleWord(true);
        ((DefaultCaret) t.getCaret()).setUpdatePolicy(DefaultCaret.NEVER_UPDATE);
        return t;
    }

    /** A panel as wide as the scroll pane's view, so that its charts, table and text fit the width. */
    private static final class WidthTracking extends JPanel implements Scrollable {
        private static final long serialVersionUID = 1L;

        @Override
        public java.awt.Dimension getPreferredScrollableViewportSize() {
            return getPreferredSize();
        }

        @Override
        public int getScrollableUnitIncrement(java.awt.Rectangle visible, int orientation, int direction) {
            return UIScale.scale(16);
        }

        @Override
        public int getScrollableBlockIncrement(java.awt.Rectangle visible, int orientation, int direction) {
            return visible.height;
        }

        @Override
        public boolean getScrollableTracksViewportWidth() {
            return true;
        }

        @Override
        public boolean getScrollableTracksViewportHeight() {
            return false;
        }
    }

    private static JLabel title(String key) {
        JLabel l = new JLabel(Messages.get(key));
        l.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        return l;
    }

    /** @return the label Form put beside the field (its text follows the duty) */
    private static JLabel labelOf(JPanel inputs, JComponent field) {
        for (Component c : inputs.getComponents()) {
            if (c instanceof JLabel l && l.getLabelFor() == field) {
                return l;
            }
        }
        throw new IllegalStateException("no label for " + field.getName());
    }

    /**
     * Brings the choices in line with the project and the selected option: the fans on offer, the
     * heaviest deposit and the other saturation temperature when the coil changed.
     */
    private void refresh() {
        Optional<CoilCase> selected = model.selectedCase();
        if (selected.isEmpty()) {
            return;
        }
        CoilCase c = selected.get();
        List<FanChoice> offered = new ArrayList<>();
        if (model.project().constraints().fanCurve().size() >= 2) {
            offered.add(FanChoice.PROJECT_CURVE);
        } else {
            offered.addAll(List.of(FanChoice.AXIAL, FanChoice.FORWARD_CURVED, FanChoice.EC));
        }
        offered.add(FanChoice.HELD);
        List<FanChoice> now = new ArrayList<>();
        for (int i = 0; i < fan.getItemCount(); i++) {
            now.add(fan.getItemAt(i));
        }
        if (!now.equals(offered)) {
            Object chosen = fan.getSelectedItem();
            fan.removeAllItems();
            offered.forEach(fan::addItem);
            fan.setSelectedItem(offered.contains(chosen) ? chosen : offered.get(0));
        }
        if (!c.coil().equals(shownCoil)) {
            shownCoil = c.coil();
            heaviest.show(FoulingStudy.heavyThickness(c), model.units());
        }
        Duty duty = c.refrigerant().duty();
        if (duty != shownDuty) {
            shownDuty = duty;
            boolean evaporator = duty == Duty.EVAPORATOR;
            otherLabel.setText(Messages.get(evaporator ? "field.cleaning.condensing" : "field.cleaning.evaporating"));
            // starting values to replace with the plant's own: 40 C condensing, -5 C evaporating
            otherSaturation.show(evaporator ? 313.15 : 268.15, model.units());
        }
    }

    /** Reads the fields and starts the run. */
    void run() {
        CoilCase c;
        Project project = model.project();
        String option = model.option().name();
        try {
            c = project.caseOf(model.selected());
        } catch (FinstackException e) {
            refused(e);
            return;
        }
        double maxThickness;
        PaybackInputs cleaning;
        try {
            maxThickness = read(heaviest);
            cleaning = new PaybackInputs(read(runHours), read(price), currency.getText().strip(), read(efficiency),
                    read(cleaningCost), read(otherSaturation));
        } catch (FinstackException e) {
            // the field is marked; the status line says which and why, where the user looks after Run
            run.problem(e.getMessage());
            return;
        }
        FanChoice choice = (FanChoice) fan.getSelectedItem();
        int n = (Integer) levels.getValue();
        double h = (Double) hours.getValue();
        List<Constraints.FanPoint> curve = project.constraints().fanCurve();
        run.start(p -> compute(option, c, choice, curve, maxThickness, n, h, cleaning, p), this::show, this::refused);
    }

    private static double read(QuantityField f) {
        try {
            double v = f.read();
            f.clearError();
            return v;
        } catch (FinstackException e) {
            f.showError(e.getMessage());
            throw e;
        }
    }

    /**
     * The fan for a choice; a generic fan is sized so that the clean coil runs at its design point.
     *
     * @param choice   the choice
     * @param fanCurve the project's fan curve
     * @param c        the clean case
     * @return the fan, or null to hold the airflow
     */
    static CoilFan fan(FanChoice choice, List<Constraints.FanPoint> fanCurve, CoilCase c) {
        if (choice == FanChoice.HELD) {
            return null;
        }
        if (choice == FanChoice.PROJECT_CURVE) {
            double[] q = fanCurve.stream().mapToDouble(Constraints.FanPoint::volumeFlow).toArray();
            double[] dp = fanCurve.stream().mapToDouble(Constraints.FanPoint::pressure).toArray();
            return new CoilFan.Curve(new FanCurve(q, dp));
        }
        Rating r = CoilModels.rate(c);
        double q = r.airVolumeFlow();
        double dp = r.airPressureDrop();
        return new CoilFan.Generic(switch (choice) {
            case AXIAL -> FixedSpeedFan.axialPropeller(q, dp);
            case FORWARD_CURVED -> FixedSpeedFan.forwardCurved(q, dp);
            default -> ConstantAirflowEcFan.typical(q, dp, EC_SPEED_RESERVE, Double.MAX_VALUE);
        });
    }

    private static Outcome compute(String option, CoilCase c, FanChoice choice, List<Constraints.FanPoint> fanCurve,
            double maxThickness, int n, double hours, PaybackInputs cleaning, Progress progress) {
        List<String> cautions = RatingRunner.cautions(c);
        CoilFan fan = fan(choice, fanCurve, c);
        boolean evaporator = c.refrigerant().duty() == Duty.EVAPORATOR;
        boolean frosty = evaporator && c.refrigerant().saturationTemperature() < KELVIN_AT_0C;
        int total = n + 1 + (frosty ? FROST_STEPS : 0);
        FoulingStudy.FoulingCurve curve = FoulingStudy.curve(c, fan, FoulingLevel.DUST_CONDUCTIVITY, maxThickness, n,
                part(progress, 0, total));
        List<CleaningPayback> paybacks = new ArrayList<>();
        String paybackError = null;
        try {
            Rating clean = FanInLoop.rate(c, fan, curve.points().get(0).airflow()).rating();
            double dT = clean.moisture().sensibleCapacity() / clean.ua();
            Tariff tariff = new Tariff(cleaning.pricePerKwh(), cleaning.currency());
            FouledCoil coil = evaporator ? FouledCoil.EVAPORATOR : FouledCoil.CONDENSER;
            for (FoulingStudy.FoulingPoint p : curve.points()) {
                CleaningCase cc = CleaningCase.fromCapacityLoss(coil, curve.points().get(0).capacity(),
                        c.refrigerant().saturationTemperature(), dT, Math.max(0, p.capacityLossFraction()),
                        cleaning.otherSaturation(), cleaning.efficiency(),
                        cleaning.runHours() * CleaningCase.SECONDS_PER_HOUR, tariff, cleaning.cleaningCost());
                paybacks.add(CleaningPayback.of(cc, new Warnings()));
            }
        } catch (FinstackException e) {
            paybacks.clear();
            paybackError = e.getMessage();
        }
        progress.step(n + 1, total);
        FrostStudy.FrostResult frost = null;
        String frostNote;
        if (!evaporator) {
            frostNote = Messages.get("field.frost.condenser");
        } else if (!frosty) {
            frostNote = Messages.format("field.frost.aboveZero", Numbers.brief(c.refrigerant().saturationTemperature()
                    - KELVIN_AT_0C));
        } else {
            try {
                frost = FrostStudy.march(c, fan, hours, FROST_STEPS, FrostStudy.DEFAULT_THRESHOLD,
                        part(progress, n + 1, total));
                frostNote = null;
            } catch (FinstackException e) {
                frostNote = e.getMessage();
            }
        }
        return new Outcome(option, choice, curve, paybacks, paybackError, frost, frostNote, cautions);
    }

    /** A share of a progress: steps offset into the whole. */
    private static Progress part(Progress whole, int offset, int total) {
        return new Progress() {
            @Override
            public void step(int done, int steps) {
                whole.step(offset + done, total);
            }

            @Override
            public boolean cancelled() {
                return whole.cancelled();
            }
        };
    }

    private void refused(FinstackException e) {
        last = null;
        heading.setText(Messages.get("field.fouling.refused"));
        rows.setRowCount(0);
        foulingChart.setChart(null);
        frostChart.setVisible(false);
        frostSummary.setText("");
        payback.setText("");
        notes.setText(e.getMessage());
    }

    private void show(Outcome o) {
        last = o;
        UnitSystem u = model.units();
        heading.setText(Messages.format("field.fouling.heading", o.option(), o.choice()));
        List<FoulingStudy.FoulingPoint> points = o.curve().points();
        rows.setRowCount(0);
        for (int i = 0; i < points.size(); i++) {
            FoulingStudy.FoulingPoint p = points.get(i);
            CleaningPayback pb = o.paybacks().isEmpty() ? null : o.paybacks().get(i);
            rows.addRow(new Object[] {Quantities.format(p.thickness(), Dimension.LENGTH, u, u == UnitSystem.SI ? "mm"
                    : "in"), Quantities.format(p.capacity(), Dimension.HEAT_FLOW, u),
                Quantities.format(p.airflow(), Dimension.VOLUME_FLOW, u),
                Quantities.format(p.airPressureDrop(), Dimension.PRESSURE_DIFFERENCE, u),
                percent(p.capacityLossFraction()),
                Double.isNaN(p.fanPower()) ? Messages.get("field.notKnown") : Quantities.format(p.fanPower(),
                        Dimension.POWER, u),
                pb == null ? "" : money(pb), pb == null ? "" : paybackText(pb)});
        }
        table.getSelectionModel().setSelectionInterval(points.size() - 1, points.size() - 1);
        foulingChart.setChart(foulingChart(points, u));
        showPayback();
        if (o.frost() != null) {
            FrostStudy.FrostResult f = o.frost();
            frostSummary.setText(Double.isNaN(f.defrostInterval())
                    ? Messages.format("field.frost.noDefrost", Numbers.brief((Double) hours.getValue()))
                    : Messages.format("field.frost.interval", Numbers.brief(f.defrostInterval()),
                            Numbers.brief(100 * FrostStudy.DEFAULT_THRESHOLD)));
            frostChart.setChart(frostChart(f));
            frostChart.setVisible(true);
        } else {
            frostSummary.setText(o.frostNote());
            frostChart.setVisible(false);
        }
        List<String> lines = new ArrayList<>(o.curve().notes());
        lines.addAll(o.curve().warnings());
        if (o.frost() != null) {
            lines.addAll(o.frost().notes());
            lines.addAll(o.frost().warnings());
        }
        notes.setText(String.join("\n", lines.stream().distinct().toList()));
        cautions.setText(String.join("\n", o.cautions()));
        cautionBox.setVisible(!o.cautions().isEmpty());
        revalidate();
    }

    private void showPayback() {
        if (last == null) {
            return;
        }
        if (last.paybackError() != null) {
            payback.setText(Messages.format("field.cleaning.refused", last.paybackError()));
            return;
        }
        int row = table.getSelectedRow();
        if (row < 0 || row >= last.paybacks().size()) {
            return;
        }
        FoulingStudy.FoulingPoint p = last.curve().points().get(row);
        UnitSystem u = model.units();
        payback.setText(Messages.format("field.cleaning.sentence", Quantities.format(p.thickness(), Dimension.LENGTH, u,
                u == UnitSystem.SI ? "mm" : "in"), percent(p.capacityLossFraction()), last.paybacks().get(row)
                        .summary()));
    }

    private static String percent(double share) {
        return String.format(Locale.ROOT, "%.1f %%", 100 * share);
    }

    private static String money(CleaningPayback p) {
        return String.format(Locale.ROOT, "%s %.0f", p.cleaningCase().tariff().currency(), p.costPerYear());
    }

    private static String paybackText(CleaningPayback p) {
        return p.paybackYears().isEmpty() ? Messages.get("field.cleaning.never")
                : Messages.format("field.cleaning.years", String.format(Locale.ROOT, "%.1f",
                        p.paybackYears().getAsDouble()));
    }

    private static JFreeChart foulingChart(List<FoulingStudy.FoulingPoint> points, UnitSystem u) {
        String unit = u == UnitSystem.SI ? "mm" : "in";
        XYSeries cap = new XYSeries(Messages.get("field.fouling.series.capacity"));
        XYSeries air = new XYSeries(Messages.get("field.fouling.series.airflow"));
        XYSeries dp = new XYSeries(Messages.get("field.fouling.series.pressureDrop"));
        XYSeries loss = new XYSeries(Messages.get("field.fouling.series.loss"));
        FoulingStudy.FoulingPoint clean = points.get(0);
        for (FoulingStudy.FoulingPoint p : points) {
            double x = Quantities.toUnit(p.thickness(), Dimension.LENGTH, unit);
            cap.add(x, 100 * p.capacity() / clean.capacity());
            air.add(x, 100 * p.airflow() / clean.airflow());
            dp.add(x, 100 * p.airPressureDrop() / clean.airPressureDrop());
            loss.add(x, 100 * p.capacityLossFraction());
        }
        XYSeriesCollection data = new XYSeriesCollection();
        for (XYSeries s : List.of(cap, air, dp, loss)) {
            data.addSeries(s);
        }
        XYPlot plot = new XYPlot(data, new NumberAxis(Messages.format("field.fouling.axis.deposit", unit)),
                new NumberAxis(Messages.get("field.fouling.axis.share")), lines(4));
        return styled(new JFreeChart(Messages.get("field.fouling.chartTitle"), JFreeChart.DEFAULT_TITLE_FONT, plot,
                true));
    }

    private static JFreeChart frostChart(FrostStudy.FrostResult f) {
        XYSeries cap = new XYSeries(Messages.get("field.fouling.series.capacity"));
        XYSeries air = new XYSeries(Messages.get("field.fouling.series.airflow"));
        XYSeries mass = new XYSeries(Messages.get("field.frost.series.mass"));
        FrostStudy.FrostPoint first = f.timeline().get(0);
        for (FrostStudy.FrostPoint p : f.timeline()) {
            cap.add(p.time(), 100 * p.capacity() / first.capacity());
            air.add(p.time(), 100 * p.airflow() / first.airflow());
            mass.add(p.time(), p.frostMass());
        }
        XYSeriesCollection shares = new XYSeriesCollection();
        shares.addSeries(cap);
        shares.addSeries(air);
        XYPlot plot = new XYPlot(shares, new NumberAxis(Messages.get("field.frost.axis.time")),
                new NumberAxis(Messages.get("field.fouling.axis.share")), lines(2));
        NumberAxis right = new NumberAxis(Messages.get("field.frost.axis.mass"));
        plot.setRangeAxis(1, right);
        plot.setDataset(1, new XYSeriesCollection(mass));
        plot.mapDatasetToRangeAxis(1, 1);
        XYLineAndShapeRenderer massLine = new XYLineAndShapeRenderer(true, true);
        massLine.setSeriesPaint(0, Theme.palette().circuit(3));
        massLine.setSeriesStroke(0, new BasicStroke(2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 1f,
                new float[] {6f, 4f}, 0f));
        plot.setRenderer(1, massLine);
        return styled(new JFreeChart(Messages.get("field.frost.chartTitle"), JFreeChart.DEFAULT_TITLE_FONT, plot,
                true));
    }

    /** Solid lines with points, one palette colour per series. */
    private static XYLineAndShapeRenderer lines(int series) {
        Palette palette = Theme.palette();
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, true);
        for (int i = 0; i < series; i++) {
            r.setSeriesPaint(i, palette.circuit(i));
            r.setSeriesStroke(i, new BasicStroke(2f));
        }
        return r;
    }

    /** The drawing palette's background and text on a chart. */
    private static JFreeChart styled(JFreeChart ch) {
        Palette palette = Theme.palette();
        ch.setBackgroundPaint(palette.background());
        ch.getTitle().setPaint(palette.text());
        ch.getLegend().setBackgroundPaint(palette.background());
        ch.getLegend().setItemPaint(palette.text());
        XYPlot plot = ch.getXYPlot();
        plot.setBackgroundPaint(palette.background());
        plot.setDomainGridlinePaint(palette.finEdge());
        plot.setRangeGridlinePaint(palette.finEdge());
        for (int i = 0; i < plot.getRangeAxisCount(); i++) {
            axis((NumberAxis) plot.getRangeAxis(i), palette);
        }
        axis((NumberAxis) plot.getDomainAxis(), palette);
        return ch;
    }

    private static void axis(NumberAxis a, Palette palette) {
        a.setAutoRangeIncludesZero(false);
        a.setLabelPaint(palette.text());
        a.setTickLabelPaint(palette.text());
        a.setAxisLinePaint(palette.dimension());
    }

    /** @return the last run's outcome, or null */
    Outcome outcome() {
        return last;
    }

    /** @return the run controls */
    StudyRun runner() {
        return run;
    }
}
