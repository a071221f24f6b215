package org.finstack.ui;

import java.awt.BorderLayout;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import javax.swing.ButtonGroup;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JRadioButton;
import javax.swing.JTextArea;
import javax.swing.Timer;
import org.finstack.coil.AirInlet;
import org.finstack.coil.Duty;
import org.finstack.coil.FoulingResistances;
import org.finstack.coil.RefrigerantSide;
import org.finstack.core.InputException;
import org.finstack.study.Conditions;
import org.finstack.units.Dimension;

/**
 * The project's operating conditions: the entering air (temperature, face velocity or volume
 * flow, pressure, relative humidity), the refrigerant side (name, duty, saturation temperature,
 * inside coefficient) and the added resistances, with the note that the correlations already
 * contain a sound collar's contact resistance.
 */
final class ConditionsForm extends JPanel {

    private static final long serialVersionUID = 1L;

    private final ProjectModel model;
    private final Runnable validityChanged;
    private final Map<String, QuantityField> fields = new LinkedHashMap<>();
    private final JRadioButton byVelocity = new JRadioButton(Messages.get("conditions.byVelocity"));
    private final JRadioButton byFlow = new JRadioButton(Messages.get("conditions.byFlow"));
    private final JComboBox<String> fluid = new JComboBox<>();
    private final JComboBox<Duty> duty = new JComboBox<>(Duty.values());
    private final JLabel status = new JLabel(" ");
    private final JLabel overridden = new JLabel(" ");
    private final Timer commitTimer;
    private boolean loading;
    private boolean valid = true;
    private String message;

    ConditionsForm(ProjectModel model, Runnable validityChanged) {
        super(new BorderLayout());
        this.model = model;
        this.validityChanged = validityChanged;
        commitTimer = new Timer(300, e -> commit());
        commitTimer.setRepeats(false);
        fluid.setEditable(true);
        RefrigerantSafety.table().keySet().forEach(fluid::addItem);
        fluid.setName("refrigerant.fluid");
        duty.setName("refrigerant.duty");
        duty.setRenderer(Form.renderer(v -> ((Duty) v).id(), v -> Messages.get("conditions.duty." + ((Duty) v).id())));
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
        f.field(Messages.get("conditions.fluid"), fluid, Messages.get("conditions.fluid.help"));
        f.field(Messages.get("conditions.duty"), duty, null);
        f.field(Messages.get("conditions.saturationTemperature"),
                q("refrigerant.saturationTemperature", Dimension.TEMPERATURE), null);
        f.field(Messages.get("conditions.insideCoefficient"),
                q("refrigerant.insideCoefficient", Dimension.HEAT_TRANSFER_COEFFICIENT),
                Messages.get("conditions.insideCoefficient.help"));
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
        fluid.addActionListener(e -> {
            if (!loading) {
                commit();
            }
        });
        duty.addActionListener(e -> {
            if (!loading) {
                commit();
            }
        });
        load();
    }

    private QuantityField q(String key, Dimension d) {
        QuantityField f = new QuantityField(key, d, false);
        fields.put(key, f);
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

    /** @return whether every entry is valid */
    boolean isValidInput() {
        return valid;
    }

    /** @return the reason the form is refused, or null */
    String errorMessage() {
        return valid ? null : message;
    }

    /** Shows the project's conditions. */
    void load() {
        loading = true;
        try {
            Conditions c = model.project().conditions();
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
            fluid.setSelectedItem(r.fluid());
            duty.setSelectedItem(r.duty());
            fields.get("refrigerant.saturationTemperature").showIfChanged(r.saturationTemperature(), u);
            fields.get("refrigerant.insideCoefficient").showIfChanged(r.insideCoefficient(), u);
            FoulingResistances fo = c.fouling();
            fields.get("fouling.airSide").showIfChanged(fo.airSide(), u);
            fields.get("fouling.inside").showIfChanged(fo.inside(), u);
            fields.get("fouling.contact").showIfChanged(fo.contact(), u);
            overridden.setText(model.option().overrides().isEmpty() ? " "
                    : Messages.format("conditions.overridden", model.option().name()));
            setValid(true, null);
        } finally {
            loading = false;
        }
    }

    /** Converts every field to the model's unit system. */
    void convertUnits() {
        loading = true;
        try {
            fields.values().forEach(f -> f.convert(model.units()));
        } finally {
            loading = false;
        }
    }

    private void modeChanged() {
        fields.get("air.faceVelocity").setEnabled(byVelocity.isSelected());
        fields.get("air.volumeFlow").setEnabled(byFlow.isSelected());
        commit();
    }

    /** Reads the form; valid conditions become an edit of the project. */
    void commit() {
        commitTimer.stop();
        Conditions c = build();
        if (c != null && !c.equals(model.project().conditions())) {
            model.edit(model.project().withConditions(c), model.selected());
        }
    }

    /** @return the conditions the form describes, or null after marking the offending field */
    Conditions build() {
        fields.values().forEach(QuantityField::clearError);
        String part = "air";
        try {
            AirInlet a = new AirInlet(read("air.inletTemperature"),
                    byVelocity.isSelected() ? read("air.faceVelocity") : 0,
                    byFlow.isSelected() ? read("air.volumeFlow") : 0, read("air.pressure"),
                    read("air.relativeHumidity"));
            part = "refrigerant";
            RefrigerantSide r = new RefrigerantSide(Objects.toString(fluid.getSelectedItem(), "").strip(),
                    (Duty) duty.getSelectedItem(), read("refrigerant.saturationTemperature"),
                    read("refrigerant.insideCoefficient"));
            part = "fouling";
            FoulingResistances fo = new FoulingResistances(read("fouling.airSide"), read("fouling.inside"),
                    read("fouling.contact"));
            setValid(true, null);
            return new Conditions(a, r, fo);
        } catch (InputException e) {
            String key = e.field().contains(".") ? e.field() : part + "." + e.field();
            String message = key + ": " + e.msg().format(e.args());
            QuantityField f = fields.get(key);
            if (f != null) {
                f.showError(message);
            }
            setValid(false, message);
            return null;
        }
    }

    /**
     * Marks a field refused by the rating itself (e.g. a saturation temperature on the wrong
     * side of the air for the duty).
     *
     * @param e the refusal
     * @return whether a field of this form was marked
     */
    boolean markRatingError(InputException e) {
        QuantityField f = fields.get(e.field());
        if (f == null) {
            return false;
        }
        f.showError(e.getMessage());
        return true;
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
}
