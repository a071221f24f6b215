package org.finstack.ui;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Component;
import java.awt.Font;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.OptionalDouble;
import java.util.function.Function;
import javax.swing.BorderFactory;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.table.AbstractTableModel;
import javax.swing.table.DefaultTableCellRenderer;
import org.finstack.geometry.CoilGeometry;
import org.finstack.study.compare.Comparison;
import org.finstack.study.compare.OptionResult;
import org.finstack.study.pressure.ChargeScreeningResult;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;

/**
 * The full comparison side by side ({@link Comparison}): one column per entry of the project in
 * the file's order (a damaged entry or an option that could not be rated shows its reason), one
 * row per quantity: the coil's dimensions and materials, capacity and its ratio to the existing
 * coil, the capacity band, sensible and latent capacity, leaving air, air pressure drop, the fan's
 * airflow and the capacity there (with a fan curve), refrigerant pressure drop and saturation
 * penalty, charge and its screen, metal mass, design-pressure margin and the warnings.
 *
 * <p>A cell that differs from the reference column (the existing coil, or without one the first
 * rated option) is marked in Finstack's own way: a tinted fill, bold text, the signed change and a
 * stripe down its left edge whose colour says whether the change helps (more capacity or margin;
 * less pressure drop, charge or mass), hurts, or is neither (a material or a dimension).
 */
final class ComparePanel extends JPanel {

    private static final long serialVersionUID = 1L;
    /** Relative change below which two numbers count as equal. */
    private static final double SAME = 5e-4;

    /** Whether a larger value is the better one. */
    enum Better {
        /** More is better (capacity, margin). */
        MORE,
        /** Less is better (pressure drop, charge, mass). */
        LESS,
        /** Neither: a dimension or a material. */
        NEITHER,
        /** Not compared against the reference (ratios, bands, texts that always differ). */
        NONE
    }

    /**
     * One row: its label key, how its numbers are written, the direction that counts as better,
     * and its value for a result (a Double, an Integer, a String, or null for "-").
     */
    private record Row(String key, Dimension dim, Better better, Function<OptionResult, Object> value) {
    }

    /**
     * A capacity band's ends.
     *
     * @param p10 10th percentile [W]
     * @param p90 90th percentile [W]
     */
    record Band(double p10, double p90) {
    }

    /** What the cell's mark says. */
    enum Mark {
        /** Same as the reference, or not compared. */
        SAME,
        /** Differs; neither better nor worse. */
        CHANGED,
        /** Differs for the better. */
        BETTER,
        /** Differs for the worse. */
        WORSE,
        /** The option could not be read or rated. */
        ERROR
    }

    /**
     * One cell.
     *
     * @param text the text shown
     * @param mark how it is marked
     * @param tip  a longer text for the tooltip, or null
     */
    record Cell(String text, Mark mark, String tip) {

        /** @return whether the cell differs from the reference column */
        boolean changed() {
            return mark == Mark.CHANGED || mark == Mark.BETTER || mark == Mark.WORSE;
        }

        @Override
        public String toString() {
            return text;
        }
    }

    private final Model tableModel = new Model();
    private final JTable table = new JTable(tableModel) {
        private static final long serialVersionUID = 1L;

        @Override
        public String getToolTipText(java.awt.event.MouseEvent e) {
            int r = rowAtPoint(e.getPoint());
            int c = columnAtPoint(e.getPoint());
            if (r >= 0 && c >= 0 && getValueAt(r, c) instanceof Cell cell && cell.tip() != null) {
                return cell.tip();
            }
            return null;
        }
    };
    private final JLabel basis = new JLabel(" ");
    private Comparison shown;

    ComparePanel() {
        super(new BorderLayout());
        setBorder(BorderFactory.createEmptyBorder(8, 10, 8, 10));
        table.setName("compare.table");
        table.setRowSelectionAllowed(false);
        table.setDefaultRenderer(Object.class, new Renderer());
        table.getTableHeader().setReorderingAllowed(false);
        basis.setName("compare.basis");
        JPanel top = new JPanel(new BorderLayout());
        top.add(new JLabel(Messages.get("compare.note")), BorderLayout.NORTH);
        top.add(basis, BorderLayout.SOUTH);
        add(top, BorderLayout.NORTH);
        add(new JScrollPane(table), BorderLayout.CENTER);
    }

    /**
     * @param c the comparison, or null while none is known
     * @param u the unit system
     */
    void show(Comparison c, UnitSystem u) {
        shown = c;
        if (c == null) {
            tableModel.set(List.of(), List.of());
            basis.setText(Messages.get("compare.pending"));
            return;
        }
        List<Row> rows = rows(c);
        List<OptionResult> all = c.options();
        OptionResult ref = c.existing().orElse(all.stream().filter(OptionResult::rated).findFirst().orElse(null));
        List<String> cols = new ArrayList<>();
        cols.add(Messages.get("compare.quantity"));
        for (OptionResult o : all) {
            cols.add("#" + (o.index() + 1) + " " + o.name() + (o == ref ? " " + Messages.get("compare.reference")
                    : o.existing() ? " " + Messages.get("compare.existing") : ""));
        }
        List<List<Cell>> cells = new ArrayList<>();
        for (Row row : rows) {
            List<Cell> line = new ArrayList<>();
            line.add(new Cell(Messages.get("compare.row." + row.key()), Mark.SAME, null));
            Object refValue = ref == null ? null : row.value().apply(ref);
            for (OptionResult o : all) {
                line.add(cell(row, o, o == ref ? null : refValue, u));
            }
            cells.add(line);
        }
        tableModel.set(cols, cells);
        String text = Messages.format("compare.basisText", Quantities.format(c.basis().designTemperature(),
                Dimension.TEMPERATURE, u), c.basis().description());
        if (c.withBand()) {
            OptionResult any = all.stream().filter(o -> o.band() != null).findFirst().orElseThrow();
            text += "  " + Messages.format("compare.bandText", any.band().samples(), any.band().seed());
        }
        basis.setText(text);
    }

    /** @return the comparison shown, or null */
    Comparison comparison() {
        return shown;
    }

    /** @return the table (for tests) */
    JTable table() {
        return table;
    }

    private static List<Row> rows(Comparison c) {
        List<Row> rows = new ArrayList<>();
        rows.add(new Row("status", null, Better.NONE, o -> o.rated() ? Messages.format("compare.rated",
                o.rating().model()) : null));
        rows.add(new Row("capacity", Dimension.HEAT_FLOW, Better.MORE, o -> rated(o, x -> x.rating().capacity())));
        rows.add(new Row("capacityRatio", Dimension.DIMENSIONLESS, Better.NONE,
                o -> rated(o, x -> optional(x.capacityRatio()))));
        rows.add(new Row("capacityBand", null, Better.NONE, o -> !o.rated() ? null : o.band() != null
                ? new Band(o.band().capacityP10(), o.band().capacityP90())
                : o.bandNote() != null ? Messages.get("compare.bandFailed") : Messages.get("compare.bandOff")));
        rows.add(new Row("sensible", Dimension.HEAT_FLOW, Better.NEITHER,
                o -> rated(o, x -> x.rating().moisture().sensibleCapacity())));
        rows.add(new Row("latent", Dimension.HEAT_FLOW, Better.NEITHER,
                o -> rated(o, x -> x.rating().moisture().latentCapacity())));
        rows.add(new Row("airOut", Dimension.TEMPERATURE, Better.NEITHER,
                o -> rated(o, x -> x.rating().airOutletTemperature())));
        rows.add(new Row("airPressureDrop", Dimension.PRESSURE_DIFFERENCE, Better.LESS,
                o -> rated(o, x -> x.rating().airPressureDrop())));
        rows.add(new Row("airflow", Dimension.VOLUME_FLOW, Better.MORE, o -> rated(o, x -> x.rating().airVolumeFlow())));
        if (c.withFan()) {
            rows.add(new Row("fanAirflow", Dimension.VOLUME_FLOW, Better.MORE, o -> rated(o, x -> x.fan() != null
                    && x.fan().found() ? x.fan().airflow() : Messages.get("compare.noFanPoint"))));
            rows.add(new Row("fanCapacity", Dimension.HEAT_FLOW, Better.MORE, o -> rated(o, x -> x.fan() != null
                    && x.fan().found() ? x.fan().capacity() : Messages.get("compare.noFanPoint"))));
            rows.add(new Row("fanPressure", Dimension.PRESSURE_DIFFERENCE, Better.NEITHER, o -> rated(o,
                    x -> x.fan() != null && x.fan().found() ? x.fan().staticPressure() : null)));
        }
        rows.add(new Row("refrigerantPressureDrop", Dimension.PRESSURE_DIFFERENCE, Better.LESS,
                o -> rated(o, x -> notComputed(x.refrigerantPressureDrop()))));
        rows.add(new Row("saturationPenalty", Dimension.TEMPERATURE_DIFFERENCE, Better.LESS,
                o -> rated(o, x -> notComputed(x.saturationTemperaturePenalty()))));
        rows.add(new Row("charge", Dimension.MASS, Better.LESS, o -> rated(o, x -> notComputed(x.chargeKg()))));
        rows.add(new Row("chargeScreen", null, Better.NONE, o -> rated(o, ComparePanel::screen)));
        rows.add(new Row("metalMass", Dimension.MASS, Better.LESS, o -> rated(o, x -> x.rating().geometry().metalMass())));
        rows.add(new Row("pressureMargin", Dimension.DIMENSIONLESS, Better.MORE,
                o -> rated(o, x -> x.pressureMargin().isPresent() ? (Object) x.pressureMargin().getAsDouble()
                        : Messages.get("compare.unknown"))));
        rows.add(new Row("tubeMaterial", null, Better.NEITHER, o -> coil(o, g -> g.tubeMaterial().id())));
        rows.add(new Row("finMaterial", null, Better.NEITHER, o -> coil(o, g -> g.finMaterial().id())));
        rows.add(new Row("coating", null, Better.NEITHER, o -> coil(o, g -> g.coating() == null ? "-"
                : g.coating().id())));
        rows.add(new Row("rows", null, Better.NEITHER, o -> coil(o, CoilGeometry::rows)));
        rows.add(new Row("tubesPerRow", null, Better.NEITHER, o -> coil(o, CoilGeometry::tubesPerRow)));
        rows.add(new Row("tubeOuterDiameter", Dimension.LENGTH, Better.NEITHER,
                o -> coil(o, CoilGeometry::tubeOuterDiameter)));
        rows.add(new Row("tubeWall", Dimension.LENGTH, Better.NEITHER, o -> coil(o, CoilGeometry::tubeWall)));
        rows.add(new Row("finPitch", Dimension.FIN_PITCH, Better.NEITHER, o -> coil(o, CoilGeometry::finPitch)));
        rows.add(new Row("finThickness", Dimension.LENGTH, Better.NEITHER, o -> coil(o, CoilGeometry::finThickness)));
        rows.add(new Row("finnedLength", Dimension.LENGTH, Better.NEITHER, o -> coil(o, CoilGeometry::finnedLength)));
        rows.add(new Row("depth", Dimension.LENGTH, Better.NEITHER, o -> coil(o, g -> g.rows() * g.rowPitch())));
        rows.add(new Row("circuits", null, Better.NEITHER, o -> coil(o, CoilGeometry::circuits)));
        rows.add(new Row("ua", Dimension.UA, Better.MORE, o -> rated(o, x -> x.rating().ua())));
        rows.add(new Row("finEfficiency", Dimension.DIMENSIONLESS, Better.MORE,
                o -> rated(o, x -> x.rating().finEfficiency())));
        rows.add(new Row("warnings", null, Better.NONE, o -> o.rated() ? String.join("\n", o.warnings()) : null));
        return rows;
    }

    private static Object rated(OptionResult o, Function<OptionResult, Object> f) {
        return o.rated() ? f.apply(o) : null;
    }

    private static Object coil(OptionResult o, Function<CoilGeometry, Object> f) {
        return o.ratedCase() == null ? null : f.apply(o.coil());
    }

    private static Object optional(OptionalDouble v) {
        return v.isPresent() ? (Object) v.getAsDouble() : null;
    }

    private static Object notComputed(OptionalDouble v) {
        return v.isPresent() ? (Object) v.getAsDouble() : Messages.get("compare.notComputed");
    }

    private static Object screen(OptionResult o) {
        ChargeScreeningResult s = o.charge() == null ? null : o.charge().screening();
        if (s == null) {
            return o.charge() != null && o.charge().safety() != null
                    && !o.charge().safety().safetyClass().flammable() && !o.charge().safety().safetyClass()
                            .higherToxicity() ? Messages.get("compare.screenNotNeeded") : Messages.get("compare.screenNone");
        }
        return s.within() ? Messages.get("compare.screenWithin") : Messages.get("compare.screenOver");
    }

    /** The text of a cell, as {@link #cell} writes it (package-private for the tests). */
    static String text(Dimension dim, Object v, UnitSystem u) {
        if (v == null) {
            return "-";
        }
        if (v instanceof Double d && dim != null) {
            return dim == Dimension.DIMENSIONLESS ? String.format(Locale.ROOT, "%.3f", d) : Quantities.format(d, dim, u);
        }
        if (v instanceof Band b) {
            return Quantities.format(b.p10(), Dimension.HEAT_FLOW, u) + " \u2013 "
                    + Quantities.format(b.p90(), Dimension.HEAT_FLOW, u);
        }
        return String.valueOf(v);
    }

    private static Cell cell(Row row, OptionResult o, Object ref, UnitSystem u) {
        Object v = row.value().apply(o);
        if (row.key().equals("status") && !o.rated()) {
            return new Cell(o.ratedCase() == null ? Messages.get("compare.notRead") : Messages.get("compare.notRated"),
                    Mark.ERROR, o.error());
        }
        if (row.key().equals("warnings")) {
            if (!o.rated()) {
                return new Cell(o.error(), Mark.ERROR, o.error());
            }
            List<String> w = o.warnings();
            return new Cell(w.isEmpty() ? Messages.get("compare.noWarnings") : Messages.format("compare.warningCount",
                    w.size(), w.get(0)), Mark.SAME, w.isEmpty() ? null : "<html>" + String.join("<br>",
                            w.stream().map(ComparePanel::html).toList()) + "</html>");
        }
        String text = text(row.dim(), v, u);
        if (row.key().equals("pressureMargin") && v instanceof Double && o.pressure() != null && o.pressure().known()) {
            text += " " + o.pressure().margin().verdict().name().toLowerCase(Locale.ROOT).replace('_', ' ');
        }
        if (row.key().equals("chargeScreen") && o.charge() != null && o.charge().screening() != null) {
            text += " " + Quantities.format(o.charge().screening().governing().maxCharge(), Dimension.MASS, u);
        }
        String tip = row.key().equals("chargeScreen") && o.charge() != null && !o.charge().notes().isEmpty()
                ? String.join(" ", o.charge().notes()) : row.key().equals("capacityBand") ? o.bandNote() : null;
        if (ref == null || v == null || row.better() == Better.NONE) {
            return new Cell(text, Mark.SAME, tip);
        }
        if (v instanceof Number n && ref instanceof Number rn) {
            double a = n.doubleValue();
            double b = rn.doubleValue();
            if (Math.abs(a - b) <= SAME * Math.max(Math.abs(a), Math.abs(b))) {
                return new Cell(text, Mark.SAME, tip);
            }
            Mark mark = row.better() == Better.NEITHER ? Mark.CHANGED
                    : (a > b) == (row.better() == Better.MORE) ? Mark.BETTER : Mark.WORSE;
            if (row.dim() == Dimension.TEMPERATURE || row.dim() == Dimension.TEMPERATURE_DIFFERENCE) {
                String delta = Quantities.format(Math.abs(a - b), Dimension.TEMPERATURE_DIFFERENCE, u);
                return new Cell(text + "   " + (a > b ? "\u25b2 +" : "\u25bc \u2212") + delta, mark, tip);
            }
            double pct = b == 0 ? 0 : 100 * (a - b) / Math.abs(b);
            return new Cell(text + "   " + String.format(Locale.ROOT, "%s%+.1f %%", a > b ? "\u25b2 " : "\u25bc ", pct)
                    .replace("-", "\u2212"), mark, tip);
        }
        return new Cell(text, Objects.equals(v, ref) ? Mark.SAME : Mark.CHANGED, tip);
    }

    private static String html(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }

    private static final class Model extends AbstractTableModel {

        private static final long serialVersionUID = 1L;
        private List<String> columns = List.of();
        private List<List<Cell>> cells = List.of();

        void set(List<String> cols, List<List<Cell>> rows) {
            boolean structure = !cols.equals(columns);
            columns = List.copyOf(cols);
            cells = List.copyOf(rows);
            if (structure) {
                fireTableStructureChanged();
            } else {
                fireTableDataChanged();
            }
        }

        @Override
        public int getRowCount() {
            return cells.size();
        }

        @Override
        public int getColumnCount() {
            return columns.size();
        }

        @Override
        public String getColumnName(int c) {
            return columns.get(c);
        }

        @Override
        public Object getValueAt(int r, int c) {
            return cells.get(r).get(c);
        }
    }

    /**
     * Our own mark for a changed cell: a tinted fill, bold text, and a stripe at the left whose
     * colour says better (teal), worse (rust) or just different (sand); an error cell in the
     * error colour.
     */
    private static final class Renderer extends DefaultTableCellRenderer {

        private static final long serialVersionUID = 1L;

        @Override
        public Component getTableCellRendererComponent(JTable t, Object value, boolean selected, boolean focus,
                int row, int column) {
            JLabel l = (JLabel) super.getTableCellRendererComponent(t, value, selected, focus, row, column);
            Mark mark = value instanceof Cell c ? c.mark() : Mark.SAME;
            if (mark == Mark.ERROR) {
                l.setBackground(t.getBackground());
                l.setForeground(Theme.color("Finstack.error", Color.RED.darker()));
                l.setBorder(BorderFactory.createEmptyBorder(0, 8, 0, 2));
                l.setFont(l.getFont().deriveFont(Font.BOLD));
            } else if (mark != Mark.SAME) {
                Color stripe = switch (mark) {
                    case BETTER -> Theme.color("Finstack.compare.betterStripe", new Color(0x2F8F7B));
                    case WORSE -> Theme.color("Finstack.compare.worseStripe", new Color(0xB0483A));
                    default -> Theme.color("Finstack.compare.changedStripe", new Color(0xB0683A));
                };
                l.setBackground(Theme.color("Finstack.compare.changedBackground", new Color(0xF6E7C1)));
                l.setForeground(Theme.color("Finstack.compare.changedForeground", t.getForeground()));
                l.setBorder(BorderFactory.createCompoundBorder(BorderFactory.createMatteBorder(0, 4, 0, 0, stripe),
                        BorderFactory.createEmptyBorder(0, 4, 0, 2)));
                l.setFont(l.getFont().deriveFont(Font.BOLD));
            } else {
                l.setBackground(column == 0 ? Theme.color("Finstack.compare.labelBackground", t.getBackground())
                        : t.getBackground());
                l.setForeground(t.getForeground());
                l.setBorder(BorderFactory.createEmptyBorder(0, 8, 0, 2));
            }
            return l;
        }
    }
}
