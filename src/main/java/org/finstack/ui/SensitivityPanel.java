package org.finstack.ui;

import com.formdev.flatlaf.util.UIScale;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.swing.BorderFactory;
import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.table.AbstractTableModel;
import org.finstack.coil.CoilCase;
import org.finstack.core.FinstackException;
import org.finstack.study.explain.Explanation;
import org.finstack.study.explain.Sensitivity;
import org.finstack.ui.draw.Tornado;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;

/**
 * How the selected option's capacity and air pressure drop answer to a step in each input
 * ({@link Sensitivity}), worked out in a worker with progress and a Cancel that stops the rating:
 * a tornado chart of the capacity change, largest effect first; a table of each step with its
 * capacity and air pressure drop changes; and the trade-offs in plain words
 * ({@link Explanation#forCoil}).
 */
final class SensitivityPanel extends JPanel {

    private static final long serialVersionUID = 1L;

    /** The table's columns, named by their message keys ({@code study.sensitivity.column.*}). */
    static final List<String> COLUMNS = List.of("input", "step", "capacity", "airPressureDrop");

    private final ProjectModel model;
    private final StudyRun run = new StudyRun("study.sensitivity", Messages.get("study.sensitivity.run"),
            Messages.get("study.sensitivity.cancel"), this::run);
    private final Chart chart = new Chart();
    private final Rows rows = new Rows();
    private final JTable table = new JTable(rows);
    private final JTextArea words = new JTextArea(5, 60);
    private Sensitivity.Result result;
    private String optionName;

    SensitivityPanel(ProjectModel model) {
        super(new BorderLayout(0, UIScale.scale(4)));
        this.model = model;
        setName("study.sensitivity");
        table.setName("study.sensitivity.table");
        words.setName("study.sensitivity.explanation");
        chart.setName("study.sensitivity.tornado");
        run.progressOnlyWhileRunning().whenCancelled(this::cancelled);
        run.say(Messages.get("study.sensitivity.intro"));
        JPanel north = new JPanel(new BorderLayout());
        north.add(run, BorderLayout.NORTH);
        run.status().setBorder(BorderFactory.createEmptyBorder(0, UIScale.scale(8), UIScale.scale(4),
                UIScale.scale(8)));
        north.add(run.status(), BorderLayout.SOUTH);
        add(north, BorderLayout.NORTH);
        words.setEditable(false);
        words.setLineWrap(true);
        words.setWrapStyleWord(true);
        JPanel below = new JPanel(new BorderLayout(0, UIScale.scale(4)));
        table.getColumnModel().getColumn(1).setPreferredWidth(UIScale.scale(340));
        below.add(new JScrollPane(table), BorderLayout.CENTER);
        below.add(new JScrollPane(words), BorderLayout.SOUTH);
        JSplitPane split = new JSplitPane(JSplitPane.VERTICAL_SPLIT, chart, below);
        split.setResizeWeight(0.5);
        add(split, BorderLayout.CENTER);
        model.addListener(c -> {
            if (c == ProjectModel.Change.UNITS) {
                rows.fireTableDataChanged();
                if (result != null) {
                    run.say(baseLine(result));
                }
            }
        });
    }

    /** Steps each input of the selected option's case, in a worker. */
    void run() {
        String name = model.option().name();
        CoilCase base;
        try {
            base = model.project().caseOf(model.selected());
        } catch (FinstackException e) {
            run.cancel();
            run.problem(Messages.format("study.sensitivity.failed", name, e.getMessage()));
            return;
        }
        run.start(Messages.format("study.sensitivity.running", name), p -> Sensitivity.of(base, p),
                r -> show(name, r),
                e -> run.problem(Messages.format("study.sensitivity.failed", name, e.getMessage())));
    }

    /**
     * Stops the run under way, if any: its rating stops before the next step, and the tab shows no
     * result, not even an earlier one, until the steps are run again.
     */
    void cancel() {
        run.cancel();
    }

    /** @return whether a run is under way (its result still to be shown) */
    boolean running() {
        return run.running();
    }

    /** @return the last result, or null */
    Sensitivity.Result result() {
        return result;
    }

    /** @return the tornado's bars, in the order drawn (largest effect first) */
    List<Tornado.Bar> bars() {
        return chart.bars;
    }

    /**
     * @param input an input stepped
     * @return its name as shown
     */
    static String label(Sensitivity.Input input) {
        return Messages.get("study.sensitivity.input." + input.name());
    }

    private void show(String name, Sensitivity.Result r) {
        result = r;
        optionName = name;
        List<Tornado.Bar> bars = new ArrayList<>();
        for (Sensitivity.Effect e : r.effects()) {
            if (e.rated() && Double.isFinite(e.capacityFraction())) {
                bars.add(new Tornado.Bar(label(e.input()), 100 * e.capacityFraction(), percent(e.capacityFraction())));
            }
        }
        chart.bars = Tornado.sorted(bars);
        chart.setPreferredSize(new Dimension(UIScale.scale(600), Tornado.preferredHeight(chart.bars)));
        chart.revalidate();
        chart.repaint();
        rows.fireTableDataChanged();
        run.say(baseLine(r));
        List<String> lines = Explanation.forCoil(r);
        words.setText(Messages.get("study.sensitivity.inWords") + "\n\u2022 " + String.join("\n\u2022 ", lines));
        words.setCaretPosition(0);
    }

    private String baseLine(Sensitivity.Result r) {
        UnitSystem u = model.units();
        return Messages.format("study.sensitivity.base", optionName, Quantities.format(r.baseRating().capacity(),
                org.finstack.units.Dimension.HEAT_FLOW, u), Quantities.format(r.baseRating().airPressureDrop(),
                        org.finstack.units.Dimension.PRESSURE_DIFFERENCE, u), r.baseRating().model());
    }

    private void cancelled() {
        result = null;
        chart.bars = List.of();
        chart.repaint();
        rows.fireTableDataChanged();
        words.setText("");
        run.say(Messages.get("study.sensitivity.cancelled"));
    }

    private static String percent(double fraction) {
        return Double.isFinite(fraction) ? String.format(Locale.ROOT, "%+.2f %%", 100 * fraction)
                : Messages.get("study.sensitivity.none");
    }

    private static String signed(double si, org.finstack.units.Dimension dim, UnitSystem u) {
        String t = Quantities.format(si, dim, u);
        return si > 0 ? "+" + t : t;
    }

    /** The tornado chart of the capacity changes. */
    private final class Chart extends JComponent {
        private static final long serialVersionUID = 1L;
        private transient List<Tornado.Bar> bars = List.of();

        Chart() {
            setPreferredSize(new Dimension(UIScale.scale(600), UIScale.scale(260)));
        }

        @Override
        protected void paintComponent(Graphics g) {
            Tornado.paint((Graphics2D) g, new Rectangle2D.Double(0, 0, getWidth(), getHeight()), bars,
                    Messages.get("study.sensitivity.chartTitle"), Theme.palette());
        }
    }

    /** The steps and their effects, as text in the current units. */
    private final class Rows extends AbstractTableModel {
        private static final long serialVersionUID = 1L;

        @Override
        public int getRowCount() {
            return result == null ? 0 : result.effects().size();
        }

        @Override
        public int getColumnCount() {
            return COLUMNS.size();
        }

        @Override
        public String getColumnName(int column) {
            return Messages.get("study.sensitivity.column." + COLUMNS.get(column));
        }

        @Override
        public Object getValueAt(int row, int column) {
            Sensitivity.Effect e = result.effects().get(row);
            UnitSystem u = model.units();
            String col = COLUMNS.get(column);
            if (!e.rated() && (col.equals("capacity") || col.equals("airPressureDrop"))) {
                return Messages.format("study.sensitivity.notRated", e.error());
            }
            return switch (col) {
                case "input" -> label(e.input());
                case "step" -> e.step();
                case "capacity" -> Messages.format("study.sensitivity.change", signed(e.capacityChange(),
                        org.finstack.units.Dimension.HEAT_FLOW, u), percent(e.capacityFraction()));
                case "airPressureDrop" -> Messages.format("study.sensitivity.change", signed(e.airPressureDropChange(),
                        org.finstack.units.Dimension.PRESSURE_DIFFERENCE, u), percent(e.airPressureDropFraction()));
                default -> throw new IllegalStateException("unknown column " + column);
            };
        }
    }
}
