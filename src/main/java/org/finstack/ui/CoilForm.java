package org.finstack.ui;

import java.awt.BorderLayout;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import javax.swing.DefaultComboBoxModel;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.Timer;
import org.finstack.airside.AirSideCorrelations;
import org.finstack.core.InputException;
import org.finstack.geometry.Arrangement;
import org.finstack.geometry.CoilGeometry;
import org.finstack.material.Coating;
import org.finstack.material.Material;
import org.finstack.material.Materials;
import org.finstack.study.Option;
import org.finstack.units.Dimension;

/**
 * The coil as a person measures it, in five groups: tubes; fins; face and depth; circuits;
 * materials and coating. A generic pattern fills the tube size, pitches, wall and fin thickness.
 * Edits are read after a pause (a one-shot ~300 ms timer); a valid coil becomes an undoable edit
 * of the project, an invalid one marks the field with the reason and nothing is rated.
 */
final class CoilForm extends JPanel {

    private static final long serialVersionUID = 1L;
    private static final String NO_COATING = "none";

    private final ProjectModel model;
    private final Runnable validityChanged;
    private final Map<String, QuantityField> fields = new LinkedHashMap<>();
    private final JComboBox<String> tubeMaterial = new JComboBox<>();
    private final JComboBox<String> finMaterial = new JComboBox<>();
    private final JComboBox<String> coating = new JComboBox<>();
    private final JComboBox<Arrangement> arrangement = new JComboBox<>(Arrangement.values());
    private final JComboBox<String> finType = new JComboBox<>(AirSideCorrelations.FIN_TYPES.toArray(new String[0]));
    private final JComboBox<Patterns.Pattern> patterns = new JComboBox<>();
    private final JLabel status = new JLabel(" ");
    private final Timer commitTimer;
    private boolean loading;
    private boolean valid = true;
    private String message;

    CoilForm(ProjectModel model, Runnable validityChanged) {
        super(new BorderLayout());
        this.model = model;
        this.validityChanged = validityChanged;
        commitTimer = new Timer(300, e -> commit());
        commitTimer.setRepeats(false);
        Materials lib = Materials.library();
        for (Material m : lib.materials()) {
            if (m.forTubes()) {
                tubeMaterial.addItem(m.id());
            }
            if (m.forFins()) {
                finMaterial.addItem(m.id());
            }
        }
        coating.addItem(NO_COATING);
        lib.coatings().forEach(c -> coating.addItem(c.id()));
        patterns.setModel(new DefaultComboBoxModel<>(Patterns.load().toArray(new Patterns.Pattern[0])));
        patterns.setName("coil.pattern");
        tubeMaterial.setName("coil.tubeMaterial");
        finMaterial.setName("coil.finMaterial");
        coating.setName("coil.coating");
        arrangement.setName("coil.arrangement");
        finType.setName("coil.finType");
        arrangement.setRenderer(Form.renderer(v -> ((Arrangement) v).id(),
                v -> Messages.get("coil.arrangement." + ((Arrangement) v).id())));
        patterns.setRenderer(Form.renderer(v -> ((Patterns.Pattern) v).id(), v -> ((Patterns.Pattern) v).id()
                + "  \u2014  " + ((Patterns.Pattern) v).description()));
        patterns.setPrototypeDisplayValue(patterns.getItemAt(0));
        JButton apply = new JButton(Messages.get("coil.pattern.apply"));
        apply.setName("coil.pattern.apply");
        apply.addActionListener(e -> applyPattern());
        JPanel patternRow = new JPanel(new BorderLayout(6, 0));
        patternRow.add(patterns, BorderLayout.CENTER);
        patternRow.add(apply, BorderLayout.EAST);
        patterns.setToolTipText(Messages.get("coil.pattern.help"));

        Form f = new Form();
        f.group(Messages.get("coil.group.pattern")).field(Messages.get("coil.pattern"), patternRow,
                Messages.get("coil.pattern.help"));
        f.group(Messages.get("coil.group.tubes"));
        f.field(Messages.get("coil.tubeOuterDiameter"), q("coil.tubeOuterDiameter", Dimension.LENGTH, false),
                Messages.get("coil.tubeOuterDiameter.help"));
        f.field(Messages.get("coil.tubeWall"), q("coil.tubeWall", Dimension.LENGTH, false), null);
        f.group(Messages.get("coil.group.fins"));
        f.field(Messages.get("coil.finType"), finType, Messages.get("coil.finType.help"));
        f.field(Messages.get("coil.finPitch"), q("coil.finPitch", Dimension.FIN_PITCH, false),
                Messages.get("coil.finPitch.help"));
        f.field(Messages.get("coil.finThickness"), q("coil.finThickness", Dimension.LENGTH, false), null);
        f.group(Messages.get("coil.group.face"));
        f.field(Messages.get("coil.finnedLength"), q("coil.finnedLength", Dimension.LENGTH, false),
                Messages.get("coil.finnedLength.help"));
        f.field(Messages.get("coil.tubesPerRow"), q("coil.tubesPerRow", Dimension.DIMENSIONLESS, true), null);
        f.field(Messages.get("coil.rows"), q("coil.rows", Dimension.DIMENSIONLESS, true), null);
        f.field(Messages.get("coil.transversePitch"), q("coil.transversePitch", Dimension.LENGTH, false),
                Messages.get("coil.transversePitch.help"));
        f.field(Messages.get("coil.rowPitch"), q("coil.rowPitch", Dimension.LENGTH, false),
                Messages.get("coil.rowPitch.help"));
        f.field(Messages.get("coil.arrangement"), arrangement, null);
        f.group(Messages.get("coil.group.circuits"));
        f.field(Messages.get("coil.circuits"), q("coil.circuits", Dimension.DIMENSIONLESS, true),
                Messages.get("coil.circuits.help"));
        f.group(Messages.get("coil.group.materials"));
        f.field(Messages.get("coil.tubeMaterial"), tubeMaterial, null);
        f.field(Messages.get("coil.finMaterial"), finMaterial, null);
        f.field(Messages.get("coil.coating"), coating, null);
        f.field(Messages.get("coil.coatingThickness"), q("coil.coatingThickness", Dimension.LENGTH, false),
                Messages.get("coil.coatingThickness.help"));
        status.setName("coil.status");
        status.setPreferredSize(new java.awt.Dimension(com.formdev.flatlaf.util.UIScale.scale(120),
                status.getPreferredSize().height));
        status.setForeground(Theme.color("Finstack.error", status.getForeground()));
        f.wide(status);
        add(f.end(), BorderLayout.CENTER);
        for (JComboBox<?> c : List.of(tubeMaterial, finMaterial, coating, arrangement, finType)) {
            c.addActionListener(e -> {
                if (!loading) {
                    commit();
                }
            });
        }
        load();
    }

    private QuantityField q(String key, Dimension d, boolean whole) {
        QuantityField f = new QuantityField(key, d, whole);
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

    /** Shows the selected option's coil. */
    void load() {
        loading = true;
        try {
            CoilGeometry g = model.option().coil();
            var u = model.units();
            fields.get("coil.tubeOuterDiameter").showIfChanged(g.tubeOuterDiameter(), u);
            fields.get("coil.tubeWall").showIfChanged(g.tubeWall(), u);
            fields.get("coil.finPitch").showIfChanged(g.finPitch(), u);
            fields.get("coil.finThickness").showIfChanged(g.finThickness(), u);
            fields.get("coil.finnedLength").showIfChanged(g.finnedLength(), u);
            fields.get("coil.tubesPerRow").showIfChanged(g.tubesPerRow(), u);
            fields.get("coil.rows").showIfChanged(g.rows(), u);
            fields.get("coil.transversePitch").showIfChanged(g.transversePitch(), u);
            fields.get("coil.rowPitch").showIfChanged(g.rowPitch(), u);
            fields.get("coil.circuits").showIfChanged(g.circuits(), u);
            fields.get("coil.coatingThickness").showIfChanged(g.coatingThickness(), u);
            tubeMaterial.setSelectedItem(g.tubeMaterial().id());
            finMaterial.setSelectedItem(g.finMaterial().id());
            coating.setSelectedItem(g.coating() == null ? NO_COATING : g.coating().id());
            arrangement.setSelectedItem(g.arrangement());
            finType.setSelectedItem(g.finType());
            fields.get("coil.coatingThickness").setEnabled(g.coating() != null);
            for (int i = 0; i < patterns.getItemCount(); i++) {
                Patterns.Pattern p = patterns.getItemAt(i);
                if (Math.abs(p.tubeOuterDiameter() - g.tubeOuterDiameter()) < 1e-5) {
                    patterns.setSelectedIndex(i);
                }
            }
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

    private void applyPattern() {
        Patterns.Pattern p = (Patterns.Pattern) patterns.getSelectedItem();
        if (p == null) {
            return;
        }
        loading = true;
        try {
            var u = model.units();
            fields.get("coil.tubeOuterDiameter").show(p.tubeOuterDiameter(), u);
            fields.get("coil.tubeWall").show(p.tubeWall(), u);
            fields.get("coil.transversePitch").show(p.transversePitch(), u);
            fields.get("coil.rowPitch").show(p.rowPitch(), u);
            fields.get("coil.finThickness").show(p.finThickness(), u);
            arrangement.setSelectedItem(p.arrangement());
        } finally {
            loading = false;
        }
        commit();
    }

    /** Reads the form; a valid coil becomes an edit of the selected option. */
    void commit() {
        commitTimer.stop();
        CoilGeometry g = build();
        if (g == null) {
            return;
        }
        Option o = model.option();
        if (!o.coil().equals(g)) {
            model.edit(model.project().withOption(model.selected(), o.withCoil(g)), model.selected());
        }
    }

    /** @return the coil the form describes, or null after marking the offending field */
    CoilGeometry build() {
        fields.values().forEach(QuantityField::clearError);
        Materials lib = Materials.library();
        String coatingId = Objects.toString(coating.getSelectedItem(), NO_COATING);
        Coating c = NO_COATING.equals(coatingId) ? null : lib.coating("coil.coating", coatingId);
        QuantityField thickness = fields.get("coil.coatingThickness");
        thickness.setEnabled(c != null);
        try {
            double coatingThickness = 0;
            if (c != null) {
                coatingThickness = thickness.read();
                if (coatingThickness == 0) {
                    coatingThickness = c.typicalThickness();
                    thickness.show(coatingThickness, model.units());
                }
            }
            double ct = coatingThickness;
            CoilGeometry g = new CoilGeometry(read("coil.tubeOuterDiameter"), read("coil.tubeWall"),
                    lib.tube("coil.tubeMaterial", (String) tubeMaterial.getSelectedItem()),
                    (Arrangement) arrangement.getSelectedItem(), read("coil.transversePitch"), read("coil.rowPitch"),
                    (int) read("coil.rows"), (int) read("coil.tubesPerRow"), read("coil.finnedLength"),
                    (String) finType.getSelectedItem(), read("coil.finPitch"), read("coil.finThickness"),
                    lib.fin("coil.finMaterial", (String) finMaterial.getSelectedItem()), (int) read("coil.circuits"),
                    c, c == null ? 0 : ct);
            AirSideCorrelations.standard("coil.finType", g.finType());
            setValid(true, null);
            return g;
        } catch (InputException e) {
            String key = e.field().startsWith("coil.") ? e.field() : "coil." + e.field();
            String message = key + ": " + e.msg().format(e.args());
            QuantityField f = fields.get(key);
            if (f != null) {
                f.showError(message);
            }
            setValid(false, message);
            return null;
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
}
