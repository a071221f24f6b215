package org.finstack.ui;

import com.formdev.flatlaf.FlatClientProperties;
import java.awt.BorderLayout;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import javax.swing.ButtonGroup;
import javax.swing.DefaultComboBoxModel;
import javax.swing.DefaultListCellRenderer;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JRadioButton;
import javax.swing.JTextArea;
import javax.swing.Timer;
import org.finstack.coil.AirInlet;
import org.finstack.coil.Duty;
import org.finstack.coil.FoulingResistances;
import org.finstack.coil.RefrigerantSide;
import org.finstack.coil.RefrigerantSide.SaturationConvention;
import org.finstack.coil.RefrigerantSide.Target;
import org.finstack.core.InputException;
import org.finstack.fluid.Fluids;
import org.finstack.study.CoilModel;
import org.finstack.study.Conditions;
import org.finstack.study.Option;
import org.finstack.study.Overrides;
import org.finstack.study.Project;
import org.finstack.units.Dimension;

/**
 * The selected option's operating conditions: the entering air (temperature, face velocity or
 * volume flow, pressure, relative humidity), the full refrigerant side (model, refrigerant, duty,
 * saturation temperature and its convention, liquid or entering gas temperature, the target that
 * fixes the flow, segments, optional film coefficient) and the added resistances. A part the
 * option carries of its own (from its case file) is edited there; the other parts are the
 * project's shared conditions. A refused entry or combination is marked at its field with the
 * reason the rating side gives.
 */
final class ConditionsForm extends JPanel {

    private static final long serialVersionUID = 1L;

    /** What fixes the refrigerant flow, as the form offers it. */
    enum TargetKind {
        /** None: the isothermal model. */
        NONE,
        /** Evaporator outlet superheat. */
        SUPERHEAT,
        /** Condenser outlet subcooling. */
        SUBCOOLING,
        /** Refrigerant mass flow. */
        MASS_FLOW,
        /** A required capacity (the saturation temperature is solved for). */
        CAPACITY;

        static TargetKind of(Target t) {
            if (t instanceof Target.Superheat) {
                return SUPERHEAT;
            }
            if (t instanceof Target.Subcooling) {
                return SUBCOOLING;
            }
            if (t instanceof Target.MassFlow) {
                return MASS_FLOW;
            }
            return t instanceof Target.Capacity ? CAPACITY : NONE;
        }
    }

    private final ProjectModel model;
    private final Runnable validityChanged;
    private final Map<String, QuantityField> fields = new LinkedHashMap<>();
    private final Map<String, JComponent> marks = new LinkedHashMap<>();
    private final JRadioButton byVelocity = new JRadioButton(Messages.get("conditions.byVelocity"));
    private final JRadioButton byFlow = new JRadioButton(Messages.get("conditions.byFlow"));
    private final DefaultComboBoxModel<CoilModel> models = new DefaultComboBoxModel<>();
    private final JComboBox<CoilModel> modelChoice = new JComboBox<>(models);
    private final DefaultComboBoxModel<String> fluids = new DefaultComboBoxModel<>();
    private final JComboBox<String> fluid = new JComboBox<>(fluids);
    private final JComboBox<Duty> duty = new JComboBox<>(Duty.values());
    private final JComboBox<SaturationConvention> convention = new JComboBox<>(SaturationConvention.values());
    private final JComboBox<TargetKind> target = new JComboBox<>(TargetKind.values());
    private final JLabel status = new JLabel(" ");
    private final JLabel overridden = new JLabel(" ");
    private final Timer commitTimer;
    private boolean loading;
    private boolean valid = true;
    private String message;
    /** The fluid name as the conditions spell it (kept when the list shows it under its canonical name). */
    private String loadedFluid = "";
    private String lastFluid = "";

    ConditionsForm(ProjectModel model, Runnable validityChanged) {
        super(new BorderLayout());
        this.model = model;
        this.validityChanged = validityChanged;
        commitTimer = new Timer(300, e -> commit());
        commitTimer.setRepeats(false);
        CoilModel.values().forEach(models::addElement);
        modelChoice.setName("refrigerant.model");
        modelChoice.setRenderer(Form.renderer(v -> Messages.get("conditions.model." + ((CoilModel) v).id())));
        Fluids.names().forEach(fluids::addElement);
        Fluids.blendNames().forEach(fluids::addElement);
        Fluids.unsupported().keySet().forEach(fluids::addElement);
        fluid.setName("refrigerant.fluid");
        fluid.setMaximumRowCount(24);
        fluid.setRenderer(new FluidRenderer());
        duty.setName("refrigerant.duty");
        duty.setRenderer(Form.renderer(v -> ((Duty) v).id(), v -> Messages.get("conditions.duty." + ((Duty) v).id())));
        convention.setName("refrigerant.saturationConvention");
        convention.setRenderer(Form.renderer(v -> Messages.get("conditions.convention." + ((SaturationConvention) v)
                .name())));
        target.setName("refrigerant.target");
        target.setRenderer(Form.renderer(v -> Messages.get("conditions.target." + ((TargetKind) v).name())));
        marks.put("refrigerant.model", modelChoice);
        marks.put("refrigerant.fluid", fluid);
        marks.put("refrigerant.duty", duty);
        marks.put("refrigerant.saturationConvention", convention);
        marks.put("refrigerant.target", target);
        byVelocity.setName("air.byVelocity");
        byFlow.setName("air.byFlow");
        ButtonGroup g = new ButtonGroup();
        g.add(byVelocity);
        g.add(byFlow);
        Form f = new Form();
        overridden.setName("conditions.overridden");
        f.wide(overridden);
        f.group(Messages.get("conditions.group.air"));
        f.field(Messages.get("conditions.inletTemperature"), q("air.inletTemperature", Dimension.TEMPERATURE), null);
        JPanel mode = new JPanel(new BorderLayout());
        mode.add(byVelocity, BorderLayout.WEST);
        mode.add(byFlow, BorderLayout.CENTER);
        f.field(Messages.get("conditions.airflowGiven"), mode, null);
        f.field(Messages.get("conditions.faceVelocity"), q("air.faceVelocity", Dimension.VELOCITY),
                Messages.get("conditions.faceVelocity.help"));
        f.field(Messages.get("conditions.volumeFlow"), q("air.volumeFlow", Dimension.VOLUME_FLOW), null);
        f.field(Messages.get("conditions.pressure"), q("air.pressure", Dimension.PRESSURE),
                Messages.get("conditions.pressure.help"));
        f.field(Messages.get("conditions.relativeHumidity"), q("air.relativeHumidity", Dimension.DIMENSIONLESS),
                Messages.get("conditions.relativeHumidity.help"));
        f.group(Messages.get("conditions.group.refrigerant"));
        f.field(Messages.get("conditions.model"), modelChoice, Messages.get("conditions.model.help"));
        f.field(Messages.get("conditions.fluid"), fluid, Messages.get("conditions.fluid.help"));
        f.field(Messages.get("conditions.duty"), duty, null);
        f.field(Messages.get("conditions.saturationTemperature"),
                q("refrigerant.saturationTemperature", Dimension.TEMPERATURE),
                Messages.get("conditions.saturationTemperature.help"));
        f.field(Messages.get("conditions.convention"), convention, Messages.get("conditions.convention.help"));
        f.field(Messages.get("conditions.liquidTemperature"), q("refrigerant.liquidTemperature",
                Dimension.TEMPERATURE), Messages.get("conditions.liquidTemperature.help"));
        f.field(Messages.get("conditions.gasTemperature"), q("refrigerant.inletTemperature", Dimension.TEMPERATURE),
                Messages.get("conditions.gasTemperature.help"));
        f.field(Messages.get("conditions.target"), target, Messages.get("conditions.target.help"));
        f.field(Messages.get("conditions.superheat"), q("refrigerant.superheat", Dimension.TEMPERATURE_DIFFERENCE),
                Messages.get("conditions.superheat.help"));
        f.field(Messages.get("conditions.subcooling"), q("refrigerant.subcooling", Dimension.TEMPERATURE_DIFFERENCE),
                Messages.get("conditions.subcooling.help"));
        f.field(Messages.get("conditions.massFlow"), q("refrigerant.massFlow", Dimension.MASS_FLOW), null);
        f.field(Messages.get("conditions.requiredCapacity"), q("refrigerant.requiredCapacity", Dimension.HEAT_FLOW),
                Messages.get("conditions.requiredCapacity.help"));
        f.field(Messages.get("conditions.segments"), q("refrigerant.segments", Dimension.DIMENSIONLESS, true),
                Messages.get("conditions.segments.help"));
        f.field(Messages.get("conditions.insideCoefficient"),
                q("refrigerant.insideCoefficient", Dimension.HEAT_TRANSFER_COEFFICIENT),
                Messages.get("conditions.insideCoefficient.help"));
        fields.get("refrigerant.insideCoefficient").putClientProperty(FlatClientProperties.PLACEHOLDER_TEXT,
                Messages.get("conditions.insideCoefficient.hint"));
        fields.get("refrigerant.liquidTemperature").putClientProperty(FlatClientProperties.PLACEHOLDER_TEXT,
                Messages.get("conditions.notGiven"));
        fields.get("refrigerant.inletTemperature").putClientProperty(FlatClientProperties.PLACEHOLDER_TEXT,
                Messages.get("conditions.notGiven"));
        f.group(Messages.get("conditions.group.fouling"));
        f.field(Messages.get("conditions.foulingAir"), q("fouling.airSide", Dimension.FOULING_RESISTANCE),
                Messages.get("conditions.foulingAir.help"));
        f.field(Messages.get("conditions.foulingInside"), q("fouling.inside", Dimension.FOULING_RESISTANCE), null);
        f.field(Messages.get("conditions.contact"), q("fouling.contact", Dimension.FOULING_RESISTANCE),
                Messages.get("conditions.contact.help"));
        JTextArea contactNote = new JTextArea(Messages.get("conditions.contact.help"));
        contactNote.setName("conditions.contactNote");
        contactNote.setEditable(false);
        contactNote.setLineWrap(true);
        contactNote.setWrapStyleWord(true);
        contactNote.setOpaque(false);
        contactNote.setFocusable(false);
        contactNote.setColumns(30);
        f.wide(contactNote);
        status.setName("conditions.status");
        status.setPreferredSize(new java.awt.Dimension(com.formdev.flatlaf.util.UIScale.scale(120),
                status.getPreferredSize().height));
        status.setForeground(Theme.color("Finstack.error", status.getForeground()));
        f.wide(status);
        add(f.end(), BorderLayout.CENTER);
        byVelocity.addActionListener(e -> modeChanged());
        byFlow.addActionListener(e -> modeChanged());
        fluid.addActionListener(e -> fluidChosen());
        for (JComboBox<?> c : List.of(modelChoice, duty, convention, target)) {
            c.addActionListener(e -> {
                if (!loading) {
                    enableFields();
                    commit();
                }
            });
        }
        load();
    }

    private QuantityField q(String key, Dimension d) {
        return q(key, d, false);
    }

    private QuantityField q(String key, Dimension d, boolean whole) {
        QuantityField f = new QuantityField(key, d, whole);
        fields.put(key, f);
        marks.put(key, f);
        Form.onEdit(f, () -> {
            if (!loading) {
                commitTimer.restart();
            }
        });
        f.addActionListener(e -> commit());
        return f;
    }

    /** @param key a field path @return the field, or null */
    QuantityField field(String key) {
        return fields.get(key);
    }

    /** @return the model chooser's list, shared with the toolbar's chooser */
    DefaultComboBoxModel<CoilModel> models() {
        return models;
    }

    /** @param key a field or chooser path @return the reason it is marked, or null */
    String markOf(String key) {
        JComponent c = marks.get(key);
        if (c instanceof QuantityField q) {
            return q.error();
        }
        return c == null || c.getClientProperty(FlatClientProperties.OUTLINE) == null ? null : c.getToolTipText();
    }

    /** @return whether every entry is valid */
    boolean isValidInput() {
        return valid;
    }

    /** @return the reason the form is refused, or null */
    String errorMessage() {
        return valid ? null : message;
    }

    /** @return the conditions the selected option is rated at */
    private Conditions shown() {
        return model.option().conditions(model.project().conditions());
    }

    /** Shows the selected option's conditions. */
    void load() {
        loading = true;
        try {
            Conditions c = shown();
            var u = model.units();
            AirInlet a = c.air();
            double faceArea = model.option().coil().derive().faceArea();
            fields.get("air.inletTemperature").showIfChanged(a.temperature(), u);
            boolean velocity = a.faceVelocity() > 0;
            byVelocity.setSelected(velocity);
            byFlow.setSelected(!velocity);
            fields.get("air.faceVelocity").showIfChanged(velocity ? a.faceVelocity() : a.volumeFlow() / faceArea, u);
            fields.get("air.volumeFlow").showIfChanged(velocity ? a.faceVelocity() * faceArea : a.volumeFlow(), u);
            fields.get("air.faceVelocity").setEnabled(velocity);
            fields.get("air.volumeFlow").setEnabled(!velocity);
            fields.get("air.pressure").showIfChanged(a.pressure(), u);
            fields.get("air.relativeHumidity").showIfChanged(a.relativeHumidity(), u);
            RefrigerantSide r = c.refrigerant();
            models.setSelectedItem(new CoilModel(r.model()));
            selectFluid(r.fluid());
            duty.setSelectedItem(r.duty());
            convention.setSelectedItem(r.convention());
            target.setSelectedItem(TargetKind.of(r.target()));
            fields.get("refrigerant.saturationTemperature").showIfChanged(r.saturationTemperature(), u);
            optional("refrigerant.liquidTemperature", r.liquidTemperature());
            optional("refrigerant.inletTemperature", r.inletTemperature());
            optional("refrigerant.insideCoefficient", r.insideCoefficient());
            fields.get("refrigerant.segments").showIfChanged(r.segments(), u);
            Target t = r.target();
            if (t instanceof Target.Superheat s) {
                fields.get("refrigerant.superheat").showIfChanged(s.kelvin(), u);
            } else if (t instanceof Target.Subcooling s) {
                fields.get("refrigerant.subcooling").showIfChanged(s.kelvin(), u);
            } else if (t instanceof Target.MassFlow m) {
                fields.get("refrigerant.massFlow").showIfChanged(m.kgPerSecond(), u);
            } else if (t instanceof Target.Capacity q) {
                fields.get("refrigerant.requiredCapacity").showIfChanged(q.watts(), u);
                fields.get(r.duty() == Duty.EVAPORATOR ? "refrigerant.superheat" : "refrigerant.subcooling")
                        .showIfChanged(q.outletK(), u);
            }
            FoulingResistances fo = c.fouling();
            fields.get("fouling.airSide").showIfChanged(fo.airSide(), u);
            fields.get("fouling.inside").showIfChanged(fo.inside(), u);
            fields.get("fouling.contact").showIfChanged(fo.contact(), u);
            Overrides ov = model.option().overrides();
            List<String> own = new ArrayList<>();
            if (ov.air() != null) {
                own.add(Messages.get("conditions.part.air"));
            }
            if (ov.refrigerant() != null) {
                own.add(Messages.get("conditions.part.refrigerant"));
            }
            if (ov.fouling() != null) {
                own.add(Messages.get("conditions.part.fouling"));
            }
            overridden.setText(own.isEmpty() ? " "
                    : Messages.format("conditions.overridden", model.option().name(), String.join(", ", own)));
            clearMarks();
            enableFields();
            setValid(true, null);
        } finally {
            loading = false;
        }
    }

    /** Shows an optional value: blank when not given (0). */
    private void optional(String key, double si) {
        QuantityField f = fields.get(key);
        if (si == 0) {
            if (!f.getText().isBlank()) {
                f.setText("");
            }
            f.clearError();
        } else {
            f.showIfChanged(si, model.units());
        }
    }

    private void selectFluid(String name) {
        loadedFluid = name;
        String key = normalise(name);
        for (int i = 0; i < fluids.getSize(); i++) {
            if (normalise(fluids.getElementAt(i)).equals(key)) {
                fluids.setSelectedItem(fluids.getElementAt(i));
                lastFluid = fluids.getElementAt(i);
                return;
            }
        }
        fluids.addElement(name);
        fluids.setSelectedItem(name);
        lastFluid = name;
    }

    private static String normalise(String name) {
        return name == null ? "" : name.strip().toLowerCase(Locale.ROOT).replace("-", "").replace(" ", "")
                .replace("_", "");
    }

    /** A refrigerant Finstack refuses cannot be chosen: the choice returns and the reason is shown. */
    private void fluidChosen() {
        if (loading) {
            return;
        }
        String chosen = (String) fluid.getSelectedItem();
        String reason = chosen == null ? null : Fluids.unsupported().get(chosen);
        if (reason != null) {
            loading = true;
            try {
                fluid.setSelectedItem(lastFluid);
            } finally {
                loading = false;
            }
            mark(fluid, "refrigerant.fluid: " + reason);
            status.setText("\u26a0 " + reason);
            return;
        }
        lastFluid = chosen;
        commit();
    }

    /** Converts every field to the model's unit system. */
    void convertUnits() {
        loading = true;
        try {
            fields.values().forEach(f -> {
                if (!f.getText().isBlank()) {
                    f.convert(model.units());
                }
            });
        } finally {
            loading = false;
        }
    }

    private void modeChanged() {
        fields.get("air.faceVelocity").setEnabled(byVelocity.isSelected());
        fields.get("air.volumeFlow").setEnabled(byFlow.isSelected());
        commit();
    }

    /** Enables the fields the chosen model, duty and target use. */
    private void enableFields() {
        TargetKind t = (TargetKind) target.getSelectedItem();
        boolean evaporator = duty.getSelectedItem() == Duty.EVAPORATOR;
        CoilModel m = (CoilModel) models.getSelectedItem();
        fields.get("refrigerant.liquidTemperature").setEnabled(evaporator);
        fields.get("refrigerant.inletTemperature").setEnabled(!evaporator);
        fields.get("refrigerant.superheat").setEnabled(t == TargetKind.SUPERHEAT
                || t == TargetKind.CAPACITY && evaporator);
        fields.get("refrigerant.subcooling").setEnabled(t == TargetKind.SUBCOOLING
                || t == TargetKind.CAPACITY && !evaporator);
        fields.get("refrigerant.massFlow").setEnabled(t == TargetKind.MASS_FLOW);
        fields.get("refrigerant.requiredCapacity").setEnabled(t == TargetKind.CAPACITY);
        fields.get("refrigerant.segments").setEnabled(m != null && m.kind() == RefrigerantSide.Model.TUBES);
    }

    /** Reads the form; valid conditions become an edit of the project (or of the option's own parts). */
    void commit() {
        commitTimer.stop();
        Conditions c = build();
        if (c == null) {
            return;
        }
        Project p = model.project();
        int i = model.selected();
        Option o = model.option();
        Overrides ov = o.overrides();
        Conditions base = p.conditions();
        Conditions shared = new Conditions(ov.air() == null ? c.air() : base.air(),
                ov.refrigerant() == null ? c.refrigerant() : base.refrigerant(),
                ov.fouling() == null ? c.fouling() : base.fouling());
        Overrides own = new Overrides(ov.air() == null ? null : c.air(),
                ov.refrigerant() == null ? null : c.refrigerant(), ov.fouling() == null ? null : c.fouling());
        Project next = p.withConditions(shared);
        if (!own.equals(ov)) {
            next = next.withOption(i, o.withOverrides(own));
        }
        if (!next.equals(p)) {
            model.edit(next, i);
        }
    }

    /** @return the conditions the form describes, or null after marking the offending field */
    Conditions build() {
        clearMarks();
        String part = "air";
        try {
            AirInlet a = new AirInlet(read("air.inletTemperature"),
                    byVelocity.isSelected() ? read("air.faceVelocity") : 0,
                    byFlow.isSelected() ? read("air.volumeFlow") : 0, read("air.pressure"),
                    read("air.relativeHumidity"));
            part = "refrigerant";
            RefrigerantSide r = refrigerant();
            part = "fouling";
            FoulingResistances fo = new FoulingResistances(read("fouling.airSide"), read("fouling.inside"),
                    read("fouling.contact"));
            setValid(true, null);
            return new Conditions(a, r, fo);
        } catch (InputException e) {
            String key = e.field().contains(".") ? e.field() : part + "." + e.field();
            String text = key + ": " + e.msg().format(e.args());
            markKey(key, text);
            setValid(false, text);
            return null;
        }
    }

    private RefrigerantSide refrigerant() {
        Duty d = (Duty) duty.getSelectedItem();
        boolean evaporator = d == Duty.EVAPORATOR;
        TargetKind kind = (TargetKind) target.getSelectedItem();
        double tSat = read("refrigerant.saturationTemperature");
        double liquid = evaporator ? optionalValue("refrigerant.liquidTemperature") : 0;
        double gas = evaporator ? 0 : optionalValue("refrigerant.inletTemperature");
        double h = optionalValue("refrigerant.insideCoefficient");
        CoilModel m = (CoilModel) models.getSelectedItem();
        int segments = m.kind() == RefrigerantSide.Model.TUBES ? (int) read("refrigerant.segments")
                : (int) Math.max(1, Math.min(RefrigerantSide.MAX_SEGMENTS, fields.get("refrigerant.segments").value()));
        Target t = switch (kind) {
            case NONE -> new Target.None();
            case SUPERHEAT -> new Target.Superheat(read("refrigerant.superheat"));
            case SUBCOOLING -> new Target.Subcooling(read("refrigerant.subcooling"));
            case MASS_FLOW -> new Target.MassFlow(read("refrigerant.massFlow"));
            case CAPACITY -> new Target.Capacity(read("refrigerant.requiredCapacity"),
                    read(evaporator ? "refrigerant.superheat" : "refrigerant.subcooling"));
        };
        String name = Objects.toString(fluid.getSelectedItem(), "").strip();
        if (normalise(name).equals(normalise(loadedFluid))) {
            name = loadedFluid;
        }
        return new RefrigerantSide(name, d, tSat, (SaturationConvention) convention.getSelectedItem(), h, liquid, gas,
                t, m.kind(), segments);
    }

    private double optionalValue(String key) {
        QuantityField f = fields.get(key);
        return f.getText().isBlank() ? 0 : f.read();
    }

    /**
     * Marks a field refused by the rating itself (e.g. a saturation temperature on the wrong
     * side of the air for the duty, or a model not in this build).
     *
     * @param e the refusal
     * @return whether a field of this form was marked
     */
    boolean markRatingError(InputException e) {
        String key = e.field().contains(".") ? e.field() : "refrigerant." + e.field();
        return markKey(key, e.getMessage());
    }

    /** Marks the component of a key; a target value whose field is not in use marks the target chooser. */
    private boolean markKey(String key, String text) {
        JComponent c = marks.get(key);
        if (c == null) {
            return false;
        }
        mark(c, text);
        if (!c.isEnabled() && List.of("refrigerant.superheat", "refrigerant.subcooling", "refrigerant.massFlow",
                "refrigerant.requiredCapacity").contains(key)) {
            mark(target, text);
        }
        return true;
    }

    private static void mark(JComponent c, String text) {
        if (c instanceof QuantityField q) {
            q.showError(text);
        } else {
            c.putClientProperty(FlatClientProperties.OUTLINE, FlatClientProperties.OUTLINE_ERROR);
            c.setToolTipText(text);
        }
    }

    private void clearMarks() {
        for (JComponent c : marks.values()) {
            if (c instanceof QuantityField q) {
                q.clearError();
            } else if (c.getClientProperty(FlatClientProperties.OUTLINE) != null) {
                c.putClientProperty(FlatClientProperties.OUTLINE, null);
                c.setToolTipText(null);
            }
        }
    }

    private double read(String key) {
        return fields.get(key).read();
    }

    private void setValid(boolean v, String text) {
        boolean changed = v != valid || !Objects.equals(text, message);
        message = text;
        status.setText(text == null ? " " : "\u26a0 " + text);
        status.setToolTipText(text);
        valid = v;
        if (changed) {
            validityChanged.run();
        }
    }

    /** Shows the refrigerants Finstack refuses greyed, with their reason. */
    private static final class FluidRenderer extends DefaultListCellRenderer {

        private static final long serialVersionUID = 1L;

        @Override
        public java.awt.Component getListCellRendererComponent(javax.swing.JList<?> list, Object value, int index,
                boolean selected, boolean focus) {
            String name = Objects.toString(value, "");
            String reason = Fluids.unsupported().get(name);
            String text = name;
            if (index >= 0 && Fluids.blendNames().contains(name)) {
                text = Messages.format("conditions.fluid.blend", name);
            }
            if (reason != null && index >= 0) {
                text = Messages.format("conditions.fluid.unsupported", name);
            }
            super.getListCellRendererComponent(list, text, index, reason == null && selected, focus);
            setEnabled(reason == null);
            setToolTipText(reason);
            return this;
        }
    }
}
