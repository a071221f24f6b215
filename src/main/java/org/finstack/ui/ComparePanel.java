package org.finstack.ui;

import java.awt.BorderLayout;
import java.awt.Component;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.function.BiFunction;
import javax.swing.BorderFactory;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.table.AbstractTableModel;
import javax.swing.table.DefaultTableCellRenderer;
import org.finstack.coil.Rating;
import org.finstack.geometry.CoilGeometry;
import org.finstack.study.Option;
import org.finstack.study.Project;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;

/**
 * The options side by side: coil dimensions and results in rows, one column per option. Each
 * cell that differs from the existing coil (or, without one, from the first option) is marked:
 * a stripe down its left edge, a tinted fill and, for numbers, the signed change in per cent.
 */
final class ComparePanel extends JPanel {

    private static final long serialVersionUID = 1L;
    /** Relative change below which two numbers count as equal. */
    private static final double SAME = 5e-4;

    private record Row(String key, Dimension dim, BiFunction<Option, Rating, Object> value) {
    }

    private static final List<Row> ROWS = List.of(
            new Row("rows", null, (o, r) -> o.coil().rows()),
            new Row("tubesPerRow", null, (o, r) -> o.coil().tubesPerRow()),
            new Row("tubeOuterDiameter", Dimension.LENGTH, (o, r) -> o.coil().tubeOuterDiameter()),
            new Row("tubeWall", Dimension.LENGTH, (o, r) -> o.coil().tubeWall()),
            new Row("tubeMaterial", null, (o, r) -> o.coil().tubeMaterial().id()),
            new Row("finPitch", Dimension.FIN_PITCH, (o, r) -> o.coil().finPitch()),
            new Row("finThickness", Dimension.LENGTH, (o, r) -> o.coil().finThickness()),
            new Row("finMaterial", null, (o, r) -> o.coil().finMaterial().id()),
            new Row("coating", null, (o, r) -> o.coil().coating() == null ? "-" : o.coil().coating().id()),
            new Row("finnedLength", Dimension.LENGTH, (o, r) -> o.coil().finnedLength()),
            new Row("depth", Dimension.LENGTH, (o, r) -> o.coil().rows() * o.coil().rowPitch()),
            new Row("circuits", null, (o, r) -> o.coil().circuits()),
            new Row("capacity", Dimension.HEAT_FLOW, (o, r) -> r == null ? null : r.capacity()),
            new Row("airOut", Dimension.TEMPERATURE, (o, r) -> r == null ? null : r.airOutletTemperature()),
            new Row("airPressureDrop", Dimension.PRESSURE_DIFFERENCE, (o, r) -> r == null ? null : r.airPressureDrop()),
            new Row("airflow", Dimension.VOLUME_FLOW, (o, r) -> r == null ? null : r.airVolumeFlow()),
            new Row("ua", Dimension.UA, (o, r) -> r == null ? null : r.ua()),
            new Row("finEfficiency", Dimension.DIMENSIONLESS, (o, r) -> r == null ? null : r.finEfficiency()),
            new Row("metalMass", Dimension.MASS, (o, r) -> r == null ? null : r.geometry().metalMass()));

    /** One cell: its text and whether it differs from the reference. */
    record Cell(String text, boolean changed) {
        @Override
        public String toString() {
            return text;
        }
    }

    private final Model tableModel = new Model();
    private final JTable table = new JTable(tableModel);

    ComparePanel() {
        super(new BorderLayout());
        setBorder(BorderFactory.createEmptyBorder(8, 10, 8, 10));
        table.setName("compare.table");
        table.setRowSelectionAllowed(false);
        table.setDefaultRenderer(Object.class, new Renderer());
        table.getTableHeader().setReorderingAllowed(false);
        JLabel note = new JLabel(Messages.get("compare.note"));
        add(note, BorderLayout.NORTH);
        add(new JScrollPane(table), BorderLayout.CENTER);
    }

    /**
     * @param project the project
     * @param ratings one rating per option (null where an option could not be rated)
     * @param u       the unit system
     */
    void show(Project project, List<Rating> ratings, UnitSystem u) {
        tableModel.set(project, ratings, u);
    }

    /** @return the table (for tests) */
    JTable table() {
        return table;
    }

    private static final class Model extends AbstractTableModel {

        private static final long serialVersionUID = 1L;
        private List<String> columns = List.of();
        private List<List<Cell>> cells = List.of();

        void set(Project p, List<Rating> ratings, UnitSystem u) {
            List<Option> options = p.allOptions();
            List<String> cols = new ArrayList<>();
            cols.add(Messages.get("compare.quantity"));
            for (int i = 0; i < options.size(); i++) {
                cols.add(options.get(i).name() + (i == 0 ? " " + Messages.get("compare.reference") : ""));
            }
            List<List<Cell>> rows = new ArrayList<>();
            for (Row row : ROWS) {
                List<Cell> line = new ArrayList<>();
                line.add(new Cell(Messages.get("compare.row." + row.key()), false));
                Object ref = options.isEmpty() ? null
                        : row.value().apply(options.get(0), ratings.size() > 0 ? ratings.get(0) : null);
                for (int i = 0; i < options.size(); i++) {
                    Rating r = i < ratings.size() ? ratings.get(i) : null;
                    Object v = row.value().apply(options.get(i), r);
                    line.add(cell(row, v, i == 0 ? null : ref, u));
                }
                rows.add(line);
            }
            boolean structure = !cols.equals(columns);
            columns = cols;
            cells = rows;
            if (structure) {
                fireTableStructureChanged();
            } else {
                fireTableDataChanged();
            }
        }

        private static Cell cell(Row row, Object v, Object ref, UnitSystem u) {
            if (v == null) {
                return new Cell("-", false);
            }
            String text;
            if (v instanceof Double d && row.dim() != null) {
                text = row.dim() == Dimension.DIMENSIONLESS ? String.format(Locale.ROOT, "%.3f", d)
                        : Quantities.format(d, row.dim(), u);
            } else {
                text = String.valueOf(v);
            }
            if (ref == null) {
                return new Cell(text, false);
            }
            if (v instanceof Number n && ref instanceof Number rn) {
                double a = n.doubleValue();
                double b = rn.doubleValue();
                if (Math.abs(a - b) <= SAME * Math.max(Math.abs(a), Math.abs(b))) {
                    return new Cell(text, false);
                }
                if (row.dim() == Dimension.TEMPERATURE) {
                    String delta = Quantities.format(Math.abs(a - b), Dimension.TEMPERATURE_DIFFERENCE, u);
                    return new Cell(text + "   " + (a > b ? "\u25b2 +" : "\u25bc \u2212") + delta, true);
                }
                double pct = b == 0 ? 0 : 100 * (a - b) / Math.abs(b);
                return new Cell(text + "   " + String.format(Locale.ROOT, "%s%+.1f %%",
                        a > b ? "\u25b2 " : "\u25bc ", pct).replace("-", "\u2212"), true);
            }
            return new Cell(text, !Objects.equals(v, ref));
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

    /** Our own mark for a changed cell: stripe at the left, tinted fill, bold text. */
    private static final class Renderer extends DefaultTableCellRenderer {

        private static final long serialVersionUID = 1L;

        @Override
        public Component getTableCellRendererComponent(JTable t, Object value, boolean selected, boolean focus,
                int row, int column) {
            JLabel l = (JLabel) super.getTableCellRendererComponent(t, value, selected, focus, row, column);
            boolean changed = value instanceof Cell c && c.changed();
            if (changed) {
                l.setBackground(Theme.color("Finstack.compare.changedBackground", new java.awt.Color(0xF6E7C1)));
                l.setForeground(Theme.color("Finstack.compare.changedForeground", t.getForeground()));
                l.setBorder(BorderFactory.createCompoundBorder(BorderFactory.createMatteBorder(0, 4, 0, 0,
                        Theme.color("Finstack.compare.changedStripe", new java.awt.Color(0xB0683A))),
                        BorderFactory.createEmptyBorder(0, 4, 0, 2)));
                l.setFont(l.getFont().deriveFont(java.awt.Font.BOLD));
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
