package org.finstack.ui;

import com.formdev.flatlaf.util.UIScale;
import java.awt.BorderLayout;
import java.awt.event.MouseEvent;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.ListSelectionModel;
import javax.swing.table.AbstractTableModel;
import org.finstack.core.FinstackException;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.study.Option;
import org.finstack.study.Overrides;
import org.finstack.study.Project;
import org.finstack.study.search.CandidateResult;
import org.finstack.study.search.CandidateSearch;
import org.finstack.study.search.SearchResult;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;

/**
 * Searches replacement candidates for the open project ({@link CandidateSearch}: the generic tube
 * patterns within the project's constraints, rated at its conditions) in a worker, with progress
 * and a Cancel that stops the rating; lists the best of them in their ranked order and adds the
 * chosen one to the project as a new option (an edit that can be undone). When the project's
 * conditions or constraints no longer equal those the list was searched with, a line above the
 * table says the list is out of date.
 */
final class SearchPanel extends JPanel {

    private static final long serialVersionUID = 1L;

    /** The table's columns, named by their message keys ({@code study.search.column.*}). */
    static final List<String> COLUMNS = List.of("rank", "candidate", "capacity", "meets", "airPressureDrop", "charge",
            "mass", "pareto", "margin");

    private final ProjectModel model;
    private final QuantityField limit = new QuantityField("study.search.limit", Dimension.DIMENSIONLESS, true);
    private final JButton add = new JButton(Messages.get("study.search.add"));
    private final StudyRun run = new StudyRun("study.search", Messages.get("study.search.run"),
            Messages.get("study.search.cancel"), this::run);
    private final JLabel requirement = new JLabel(" ");
    private final JLabel outOfDate = new JLabel(Messages.get("study.search.outOfDate"));
    private final JTextArea notes = new JTextArea(3, 60);
    private final Rows rows = new Rows();
    private final JTable table = new JTable(rows) {
        private static final long serialVersionUID = 1L;

        @Override
        public String getToolTipText(MouseEvent e) {
            int r = rowAtPoint(e.getPoint());
            return r < 0 ? null : rows.shown.get(convertRowIndexToModel(r)).candidate().description();
        }
    };
    private SearchResult result;
    /** The project the listed result was searched for, or null. */
    private Project searched;

    SearchPanel(ProjectModel model) {
        super(new BorderLayout(0, UIScale.scale(4)));
        this.model = model;
        setName("study.search");
        limit.setColumns(5);
        limit.show(20, model.units());
        limit.setToolTipText(Messages.get("study.search.limitTip"));
        add.setName("study.search.add");
        requirement.setName("study.search.requirement");
        outOfDate.setName("study.search.outOfDate");
        outOfDate.setVisible(false);
        table.setName("study.search.table");
        notes.setName("study.search.notes");
        add.setEnabled(false);
        run.before(new JLabel(Messages.get("study.search.limit")), limit).after(add)
                .whenCancelled(this::cancelled);
        run.say(Messages.get("study.search.intro"));
        JPanel north = new JPanel(new BorderLayout());
        north.add(run, BorderLayout.NORTH);
        JPanel lines = new JPanel(new java.awt.GridLayout(2, 1));
        lines.setBorder(BorderFactory.createEmptyBorder(0, UIScale.scale(8), UIScale.scale(4), UIScale.scale(8)));
        lines.add(run.status());
        lines.add(requirement);
        north.add(lines, BorderLayout.SOUTH);
        add(north, BorderLayout.NORTH);
        table.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        table.setAutoCreateRowSorter(false);
        table.getColumnModel().getColumn(1).setPreferredWidth(UIScale.scale(360));
        table.getSelectionModel().addListSelectionListener(e -> add.setEnabled(selected() != null));
        JPanel listed = new JPanel(new BorderLayout(0, UIScale.scale(4)));
        outOfDate.setBorder(BorderFactory.createEmptyBorder(0, UIScale.scale(8), 0, UIScale.scale(8)));
        listed.add(outOfDate, BorderLayout.NORTH);
        listed.add(new JScrollPane(table), BorderLayout.CENTER);
        add(listed, BorderLayout.CENTER);
        notes.setEditable(false);
        notes.setLineWrap(true);
        notes.setWrapStyleWord(true);
        notes.setText(Messages.get("study.search.caution"));
        add(new JScrollPane(notes), BorderLayout.SOUTH);
        add.addActionListener(e -> addSelected());
        model.addListener(c -> {
            if (c == ProjectModel.Change.PROJECT) {
                markOutOfDate();
            } else if (c == ProjectModel.Change.UNITS) {
                limit.convert(model.units());
                rows.fireTableDataChanged();
                if (result != null) {
                    showRequirement();
                }
            }
        });
    }

    /** Starts the search of the open project, listing as many candidates as the limit field says. */
    void run() {
        int max;
        try {
            limit.clearError();
            double v = limit.read();
            if (v < 0) {
                throw new InputException(limit.key(), Msg.NEGATIVE, v);
            }
            max = (int) v;
        } catch (FinstackException e) {
            limit.showError(e.getMessage());
            run.problem(e.getMessage());
            return;
        }
        Project project = model.project();
        run.start(Messages.get("study.search.running"), p -> CandidateSearch.run(project, p),
                r -> show(r, max, project),
                e -> run.problem(Messages.format("study.search.failed", e.getMessage())));
    }

    /** Stops the search under way, if any: its workers stop between candidates and nothing is listed. */
    void cancel() {
        run.cancel();
    }

    /** @return whether a search is under way */
    boolean running() {
        return run.running();
    }

    /** @return the last search's full result, or null */
    SearchResult result() {
        return result;
    }

    /** @return whether the list is marked out of date (conditions or constraints changed since the search) */
    boolean outOfDate() {
        return outOfDate.isVisible();
    }

    /** @return the candidates listed, in their ranked order */
    List<CandidateResult> shown() {
        return List.copyOf(rows.shown);
    }

    /** @return the candidate chosen in the table, or null */
    CandidateResult selected() {
        int r = table.getSelectedRow();
        return r < 0 ? null : rows.shown.get(table.convertRowIndexToModel(r));
    }

    /** Adds the chosen candidate to the project as a new option and selects it (undo removes it). */
    void addSelected() {
        CandidateResult c = selected();
        if (c == null) {
            return;
        }
        Project next = model.project().addOption(new Option(c.candidate().name(), c.candidate().coil(),
                Overrides.NONE));
        model.edit(next, next.allOptions().size() - 1);
        run.say(Messages.format("study.search.added", c.candidate().name()));
    }

    private void show(SearchResult r, int max, Project project) {
        result = r;
        searched = project;
        markOutOfDate();
        List<CandidateResult> all = r.candidates();
        rows.shown = max == 0 || max >= all.size() ? all : all.subList(0, max);
        rows.fireTableDataChanged();
        add.setEnabled(false);
        showRequirement();
        run.say(Messages.format("study.search.summary", r.generated(), r.rated(), r.failed(), r.meeting(),
                r.paretoOptimal(), rows.shown.size(), String.format(Locale.ROOT, "%.2f", r.seconds())));
        StringBuilder b = new StringBuilder(Messages.get("study.search.caution"));
        r.notes().forEach(n -> b.append('\n').append(Messages.format("study.search.note", n)));
        r.failures().forEach(f -> b.append('\n').append(Messages.format("study.search.failures", f.count(),
                f.field().isEmpty() ? "-" : f.field(), f.example())));
        notes.setText(b.toString());
        notes.setCaretPosition(0);
    }

    /** A cancelled search lists nothing: the rows of a search before would read as its result. */
    private void cancelled() {
        result = null;
        searched = null;
        rows.shown = List.of();
        rows.fireTableDataChanged();
        add.setEnabled(false);
        requirement.setText(" ");
        notes.setText("");
        markOutOfDate();
        run.say(Messages.get("study.search.cancelled"));
    }

    /**
     * Marks the list when what it was searched for has changed: the conditions, the constraints,
     * or the existing coil where its capacity was the requirement.
     */
    private void markOutOfDate() {
        Project now = model.project();
        boolean requirementFromExisting = searched != null && searched.constraints().requiredCapacity() <= 0;
        outOfDate.setVisible(searched != null && !(searched.conditions().equals(now.conditions())
                && searched.constraints().equals(now.constraints())
                && (!requirementFromExisting || Objects.equals(searched.existing(), now.existing()))));
    }

    private void showRequirement() {
        SearchResult.Requirement q = result.requirement();
        requirement.setText(q.capacity() > 0 ? Messages.format("study.search.requirement",
                Quantities.format(q.capacity(), Dimension.HEAT_FLOW, model.units()), q.basis())
                : Messages.format("study.search.noRequirement", q.basis()));
    }

    /** The candidates listed, as text in the current units. */
    private final class Rows extends AbstractTableModel {
        private static final long serialVersionUID = 1L;
        private transient List<CandidateResult> shown = List.of();

        @Override
        public int getRowCount() {
            return shown.size();
        }

        @Override
        public int getColumnCount() {
            return COLUMNS.size();
        }

        @Override
        public String getColumnName(int column) {
            return Messages.get("study.search.column." + COLUMNS.get(column));
        }

        @Override
        public Object getValueAt(int row, int column) {
            CandidateResult c = shown.get(row);
            var u = model.units();
            return switch (COLUMNS.get(column)) {
                case "rank" -> Integer.toString(c.rank());
                case "candidate" -> c.candidate().name();
                case "capacity" -> Quantities.format(c.capacity(), Dimension.HEAT_FLOW, u);
                case "meets" -> Messages.get(c.meetsRequirement() ? "study.search.yes" : "study.search.no");
                case "airPressureDrop" -> Quantities.format(c.airPressureDrop(), Dimension.PRESSURE_DIFFERENCE, u);
                case "charge" -> c.charge() == null ? Messages.get("study.search.none")
                        : Quantities.format(c.charge(), Dimension.MASS, u);
                case "mass" -> Quantities.format(c.metalMass(), Dimension.MASS, u);
                case "pareto" -> c.paretoOptimal() ? Messages.get("study.search.front") : "";
                case "margin" -> c.pressureMargin() == null ? Messages.get("study.search.none")
                        : String.format(Locale.ROOT, "%.2f", c.pressureMargin().margin());
                default -> throw new IllegalStateException("unknown column " + column);
            };
        }
    }
}
