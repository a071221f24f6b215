package org.finstack.ui;

import com.formdev.flatlaf.FlatClientProperties;
import com.formdev.flatlaf.FlatLaf;
import com.formdev.flatlaf.util.UIScale;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.Rectangle;
import java.awt.Toolkit;
import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import javax.swing.AbstractAction;
import javax.swing.Action;
import javax.swing.BorderFactory;
import javax.swing.ButtonGroup;
import javax.swing.DefaultListModel;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JFileChooser;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JRadioButtonMenuItem;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTabbedPane;
import javax.swing.JTextArea;
import javax.swing.JToggleButton;
import javax.swing.JToolBar;
import javax.swing.KeyStroke;
import javax.swing.ListSelectionModel;
import javax.swing.SwingUtilities;
import javax.swing.Timer;
import javax.swing.WindowConstants;
import javax.swing.filechooser.FileNameExtensionFilter;
import org.finstack.coil.CoilCase;
import org.finstack.core.Citation;
import org.finstack.core.FinstackException;
import org.finstack.core.InputException;
import org.finstack.io.CaseFiles;
import org.finstack.io.ProjectFiles;
import org.finstack.material.Materials;
import org.finstack.study.CoilModel;
import org.finstack.study.Conditions;
import org.finstack.study.Option;
import org.finstack.study.Overrides;
import org.finstack.study.Project;
import org.finstack.study.compare.BandSettings;
import org.finstack.study.compare.Comparison;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;

/**
 * The workbench window: the options of the project at the left (with any entries of the file that
 * could not be read, and their errors); tabs for the coil (form and drawing), the conditions, the
 * results, the full comparison side by side and the sweeps; a status bar with the rating's
 * progress and Cancel. Every edit re-rates after a pause, off the event thread, and then compares
 * the options, with each option's capacity band unless the toolbar's toggle is off.
 */
public final class WorkbenchFrame extends JFrame {

    private static final long serialVersionUID = 1L;

    private final ProjectModel model;
    private final UiPreferences prefs;
    private final boolean exitOnClose;
    private final RatingRunner runner;
    private final CoilForm coilForm;
    private final ConditionsForm conditionsForm;
    private final DrawingPanel drawing;
    private final ResultsPanel results = new ResultsPanel();
    private final ComparePanel compare = new ComparePanel();
    private final CoilMapPanel coilMap = new CoilMapPanel();
    private final SweepPanel sweep;
    private final JTabbedPane tabs = new JTabbedPane();
    private final DefaultListModel<String> optionNames = new DefaultListModel<>();
    private final JList<String> optionList = new JList<>(optionNames);
    private final JProgressBar progress = new JProgressBar(0, 100);
    private final JButton cancelButton = new JButton();
    private final JLabel status = new JLabel(" ");
    private final JToggleButton si = new JToggleButton("SI");
    private final JToggleButton us = new JToggleButton("US");
    private final JMenu recentMenu = new JMenu(Messages.get("menu.file.recent"));
    private final Timer rateTimer;
    private final List<Action> actions = new ArrayList<>();
    private List<RatingRunner.Outcome> outcomes = List.of();
    /** The latest comparison of the project's options, or null while it is being worked out. */
    private Comparison comparison;
    private final JCheckBox bandToggle = new JCheckBox(Messages.get("toolbar.band"), true);
    private final JTextArea damagedNote = new JTextArea();
    private boolean syncingList;
    /** A re-rate is due: set when the timer is started, cleared when the rating is started. */
    private boolean ratePending;

    private final Action openAction;
    private final Action saveAction;
    private final Action saveAsAction;
    private final Action importAction;
    private final Action rateAction;
    private final Action cancelAction;
    private final Action undoAction;
    private final Action redoAction;
    private final Action duplicateAction;
    private final Action removeAction;
    private final Action renameAction;
    private final Action unitsAction;
    private final Action cautionsAction;
    private final Action aboutAction;
    private final Action quitAction;
    private final Action exportDrawingAction;

    WorkbenchFrame(Project project, Path file, UiPreferences prefs, boolean exitOnClose) {
        super(Messages.get("app.title"));
        this.prefs = prefs;
        this.exitOnClose = exitOnClose;
        this.model = new ProjectModel(project, file, prefs.units());
        setName("workbench");
        runner = new RatingRunner((running, pct) -> {
            progress.setVisible(running);
            progress.setValue(pct);
            cancelButton.setEnabled(running);
            status.setText(running ? Messages.get("status.rating") : Messages.get("status.ready"));
        });
        rateTimer = new Timer(300, e -> rateNow());
        rateTimer.setRepeats(false);
        coilForm = new CoilForm(model, this::validityChanged);
        conditionsForm = new ConditionsForm(model, this::validityChanged);
        drawing = new DrawingPanel(() -> model.option().coil(), model::units);
        sweep = new SweepPanel(() -> model.project().caseOf(model.selected()),
                () -> CoilModel.of(model.project().caseOf(model.selected())), model::units);
        sweep.onFailure(this::failure);

        int mask = Toolkit.getDefaultToolkit().getMenuShortcutKeyMaskEx();
        openAction = action("open", KeyStroke.getKeyStroke(KeyEvent.VK_O, mask), e -> chooseAndOpen());
        saveAction = action("save", KeyStroke.getKeyStroke(KeyEvent.VK_S, mask), e -> save());
        saveAsAction = action("saveAs", KeyStroke.getKeyStroke(KeyEvent.VK_S, mask | KeyEvent.SHIFT_DOWN_MASK),
                e -> saveAs());
        importAction = action("import", KeyStroke.getKeyStroke(KeyEvent.VK_I, mask), e -> chooseAndImport());
        rateAction = action("rate", KeyStroke.getKeyStroke(KeyEvent.VK_R, mask), e -> rateNow());
        cancelAction = action("cancel", KeyStroke.getKeyStroke(KeyEvent.VK_PERIOD, mask), e -> runner.cancel());
        undoAction = action("undo", KeyStroke.getKeyStroke(KeyEvent.VK_Z, mask), e -> model.undo());
        redoAction = action("redo", KeyStroke.getKeyStroke(KeyEvent.VK_Z, mask | KeyEvent.SHIFT_DOWN_MASK),
                e -> model.redo());
        duplicateAction = action("duplicate", KeyStroke.getKeyStroke(KeyEvent.VK_D, mask), e -> duplicateSelected());
        removeAction = action("remove", null, e -> removeSelected());
        renameAction = action("rename", KeyStroke.getKeyStroke(KeyEvent.VK_F2, 0), e -> renameSelected());
        unitsAction = action("units", KeyStroke.getKeyStroke(KeyEvent.VK_U, mask), e -> model.units(
                model.units() == UnitSystem.SI ? UnitSystem.US : UnitSystem.SI));
        cautionsAction = action("cautions", null, e -> showCautions());
        aboutAction = action("about", null, e -> showText(Messages.get("about.title"), aboutText()));
        quitAction = action("quit", KeyStroke.getKeyStroke(KeyEvent.VK_Q, mask), e -> close());
        exportDrawingAction = action("exportDrawing", null, e -> exportDrawing());
        cancelButton.setAction(cancelAction);
        cancelButton.setName("status.cancel");
        cancelAction.setEnabled(true);
        cancelButton.setEnabled(false);

        setJMenuBar(menus());
        JPanel content = new JPanel(new BorderLayout());
        content.add(toolbar(), BorderLayout.NORTH);
        JSplitPane coilSplit = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, new JScrollPane(coilForm), drawing);
        coilSplit.setResizeWeight(0.45);
        tabs.setName("tabs");
        tabs.addTab(Messages.get("tab.coil"), coilSplit);
        tabs.addTab(Messages.get("tab.conditions"), new JScrollPane(conditionsForm));
        tabs.addTab(Messages.get("tab.results"), new JScrollPane(results));
        tabs.addTab(Messages.get("tab.coilMap"), coilMap);
        tabs.addTab(Messages.get("tab.compare"), compare);
        tabs.addTab(Messages.get("tab.sweeps"), sweep);
        tabs.addTab(Messages.get("study.tab.search"), new SearchPanel(model));
        tabs.addTab(Messages.get("study.tab.sensitivity"), new SensitivityPanel(model));
        tabs.addTab(Messages.get("field.tab.fouling"), new FoulingPanel(model));
        tabs.addTab(Messages.get("field.tab.diagnosis"), new DiagnosisPanel(model));
        JPanel right = new JPanel(new BorderLayout());
        JPanel summaryRow = new JPanel(new BorderLayout());
        summaryRow.setBorder(BorderFactory.createCompoundBorder(BorderFactory.createMatteBorder(0, 0, 1, 0,
                Theme.color("Finstack.summary.rule", java.awt.Color.LIGHT_GRAY)),
                BorderFactory.createEmptyBorder(6, 10, 6, 10)));
        summaryRow.add(results.summary(), BorderLayout.CENTER);
        right.add(summaryRow, BorderLayout.NORTH);
        right.add(tabs, BorderLayout.CENTER);
        JSplitPane main = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, optionsPanel(), right);
        main.setResizeWeight(0.0);
        main.setDividerLocation(UIScale.scale(270));
        content.add(main, BorderLayout.CENTER);
        content.add(statusBar(), BorderLayout.SOUTH);
        setContentPane(content);

        model.addListener(this::changed);
        refreshOptionList();
        refreshTitle();
        refreshUndo();
        setDefaultCloseOperation(WindowConstants.DO_NOTHING_ON_CLOSE);
        addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent e) {
                close();
            }
        });
        Rectangle b = prefs.bounds();
        if (b != null) {
            setBounds(b);
        } else {
            setSize(UIScale.scale(1280), UIScale.scale(820));
            setLocationByPlatform(true);
        }
        rebuildRecent();
        scheduleRate();
    }

    private Action action(String key, KeyStroke accelerator, Consumer<ActionEvent> body) {
        Action a = new AbstractAction(Messages.get("action." + key)) {
            private static final long serialVersionUID = 1L;

            @Override
            public void actionPerformed(ActionEvent e) {
                body.accept(e);
            }
        };
        a.putValue(Action.ACTION_COMMAND_KEY, key);
        if (accelerator != null) {
            a.putValue(Action.ACCELERATOR_KEY, accelerator);
        }
        String tip = "action." + key + ".tip";
        if (Messages.has(tip)) {
            a.putValue(Action.SHORT_DESCRIPTION, Messages.get(tip));
        }
        actions.add(a);
        return a;
    }

    private JMenuBar menus() {
        JMenuBar bar = new JMenuBar();
        JMenu file = new JMenu(Messages.get("menu.file"));
        file.add(openAction);
        file.add(recentMenu);
        file.add(action("openDemo", null, e -> openProject(null)));
        file.addSeparator();
        file.add(saveAction);
        file.add(saveAsAction);
        file.addSeparator();
        file.add(importAction);
        file.add(exportDrawingAction);
        file.add(ReportExport.menuItem(this, model, this::bandSettings, status::setText));
        file.addSeparator();
        file.add(quitAction);
        JMenu edit = new JMenu(Messages.get("menu.edit"));
        edit.add(undoAction);
        edit.add(redoAction);
        edit.addSeparator();
        edit.add(duplicateAction);
        edit.add(renameAction);
        edit.add(removeAction);
        JMenu rate = new JMenu(Messages.get("menu.rate"));
        rate.add(rateAction);
        rate.add(cancelAction);
        JMenu view = new JMenu(Messages.get("menu.view"));
        view.add(unitsAction);
        view.addSeparator();
        ButtonGroup themes = new ButtonGroup();
        for (Theme t : Theme.values()) {
            JRadioButtonMenuItem item = new JRadioButtonMenuItem(Messages.get("menu.view.theme." + t.name()));
            item.setName("theme." + t.name());
            item.setSelected(prefs.theme() == t);
            item.addActionListener(e -> theme(t));
            themes.add(item);
            view.add(item);
        }
        JMenu help = new JMenu(Messages.get("menu.help"));
        help.add(cautionsAction);
        help.add(aboutAction);
        bar.add(file);
        bar.add(edit);
        bar.add(rate);
        bar.add(view);
        bar.add(help);
        return bar;
    }

    private JToolBar toolbar() {
        JToolBar t = new JToolBar();
        t.setFloatable(false);
        for (Action a : List.of(openAction, saveAction, undoAction, redoAction, duplicateAction, rateAction)) {
            JButton b = t.add(a);
            b.setName("toolbar." + a.getValue(Action.ACTION_COMMAND_KEY));
            b.setHideActionText(false);
        }
        t.addSeparator();
        t.add(new JLabel(Messages.get("toolbar.model") + " "));
        // the same list as the conditions form's chooser: choosing here edits the refrigerant side's model
        JComboBox<CoilModel> models = new JComboBox<>(conditionsForm.models());
        models.setName("toolbar.model");
        models.setToolTipText(Messages.get("toolbar.model.tip"));
        models.setRenderer(Form.renderer(v -> Messages.get("conditions.model." + ((CoilModel) v).id())));
        models.setMaximumSize(models.getPreferredSize());
        t.add(models);
        t.addSeparator();
        bandToggle.setName("toolbar.band");
        bandToggle.setToolTipText(Messages.get("toolbar.band.tip"));
        bandToggle.addActionListener(e -> scheduleRate());
        t.add(bandToggle);
        t.addSeparator();
        t.add(new JLabel(Messages.get("toolbar.units") + " "));
        si.setName("units.SI");
        us.setName("units.US");
        ButtonGroup g = new ButtonGroup();
        g.add(si);
        g.add(us);
        si.putClientProperty(FlatClientProperties.BUTTON_TYPE, FlatClientProperties.BUTTON_TYPE_TOOLBAR_BUTTON);
        us.putClientProperty(FlatClientProperties.BUTTON_TYPE, FlatClientProperties.BUTTON_TYPE_TOOLBAR_BUTTON);
        si.addActionListener(e -> model.units(UnitSystem.SI));
        us.addActionListener(e -> model.units(UnitSystem.US));
        (model.units() == UnitSystem.US ? us : si).setSelected(true);
        si.setToolTipText(Messages.get("toolbar.units.tip"));
        us.setToolTipText(Messages.get("toolbar.units.tip"));
        t.add(si);
        t.add(us);
        return t;
    }

    private JPanel optionsPanel() {
        JPanel p = new JPanel(new BorderLayout());
        p.setBorder(BorderFactory.createEmptyBorder(6, 6, 6, 6));
        JLabel title = new JLabel(Messages.get("options.title"));
        title.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        optionList.setName("options.list");
        optionList.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        optionList.addListSelectionListener(e -> {
            if (!e.getValueIsAdjusting() && !syncingList && optionList.getSelectedIndex() >= 0) {
                model.select(optionList.getSelectedIndex());
            }
        });
        JPanel buttons = new JPanel(new java.awt.GridLayout(0, 1, 0, UIScale.scale(4)));
        for (Action a : List.of(duplicateAction, renameAction, removeAction)) {
            JButton b = new JButton(a);
            b.setName("options." + a.getValue(Action.ACTION_COMMAND_KEY));
            buttons.add(b);
        }
        p.add(title, BorderLayout.NORTH);
        JScrollPane scroll = new JScrollPane(optionList);
        scroll.setPreferredSize(new Dimension(UIScale.scale(230), UIScale.scale(300)));
        p.add(scroll, BorderLayout.CENTER);
        damagedNote.setName("options.damaged");
        damagedNote.setEditable(false);
        damagedNote.setLineWrap(true);
        damagedNote.setWrapStyleWord(true);
        damagedNote.setRows(6);
        damagedNote.setForeground(Theme.color("Finstack.error", damagedNote.getForeground()));
        damagedNote.setBorder(BorderFactory.createCompoundBorder(BorderFactory.createMatteBorder(0, UIScale.scale(4),
                0, 0, Theme.color("Finstack.compare.worseStripe", java.awt.Color.ORANGE)),
                BorderFactory.createEmptyBorder(4, 6, 4, 4)));
        JPanel south = new JPanel(new BorderLayout(0, UIScale.scale(6)));
        south.add(damagedNote, BorderLayout.CENTER);
        south.add(buttons, BorderLayout.SOUTH);
        p.add(south, BorderLayout.SOUTH);
        return p;
    }

    private JPanel statusBar() {
        JPanel p = new JPanel(new BorderLayout(UIScale.scale(8), 0));
        p.setBorder(BorderFactory.createEmptyBorder(3, 8, 3, 8));
        status.setName("status.text");
        progress.setName("status.progress");
        progress.setVisible(false);
        p.add(status, BorderLayout.CENTER);
        JPanel right = new JPanel(new BorderLayout(UIScale.scale(6), 0));
        right.add(progress, BorderLayout.CENTER);
        right.add(cancelButton, BorderLayout.EAST);
        p.add(right, BorderLayout.EAST);
        return p;
    }

    private void changed(ProjectModel.Change c) {
        switch (c) {
            case PROJECT -> {
                coilForm.load();
                conditionsForm.load();
                refreshOptionList();
                drawing.repaint();
                refreshUndo();
                scheduleRate();
            }
            case SELECTION -> {
                coilForm.load();
                conditionsForm.load();
                refreshOptionList();
                drawing.repaint();
                showOutcomes();
            }
            case UNITS -> {
                coilForm.convertUnits();
                conditionsForm.convertUnits();
                coilMap.refresh(model.units());
                sweep.convertUnits();
                showOutcomes();
                drawing.repaint();
                (model.units() == UnitSystem.US ? us : si).setSelected(true);
                prefs.units(model.units());
            }
            case FILE -> refreshTitle();
            default -> throw new IllegalStateException("unknown change " + c);
        }
    }

    private void refreshOptionList() {
        syncingList = true;
        try {
            Project p = model.project();
            List<Option> all = p.allOptions();
            List<String> names = new ArrayList<>();
            for (int i = 0; i < all.size(); i++) {
                names.add((p.isExisting(i) ? Messages.get("options.existingMark") + " " : "") + all.get(i).name());
            }
            boolean same = optionNames.size() == names.size();
            for (int i = 0; same && i < names.size(); i++) {
                same = optionNames.get(i).equals(names.get(i));
            }
            if (!same) {
                optionNames.clear();
                names.forEach(optionNames::addElement);
            }
            optionList.setSelectedIndex(model.selected());
            removeAction.setEnabled(all.size() > 1);
            List<String> damaged = new ArrayList<>();
            for (Project.Damaged d : p.damaged()) {
                damaged.add(Messages.format("options.damagedEntry", d.name(), d.field(), d.error()));
            }
            damagedNote.setText(damaged.isEmpty() ? "" : Messages.get("options.damagedTitle") + "\n"
                    + String.join("\n", damaged));
            damagedNote.setVisible(!damaged.isEmpty());
        } finally {
            syncingList = false;
        }
    }

    private void refreshTitle() {
        String file = model.file() == null ? Messages.get("app.untitled") : model.file().getFileName().toString();
        setTitle((model.dirty() ? "\u2022 " : "") + model.project().name() + " \u2014 " + file + " \u2014 "
                + Messages.get("app.title"));
    }

    private void refreshUndo() {
        undoAction.setEnabled(model.canUndo());
        redoAction.setEnabled(model.canRedo());
    }

    private void validityChanged() {
        if (!coilForm.isValidInput() || !conditionsForm.isValidInput()) {
            rateTimer.stop();
            ratePending = false;
            runner.cancel();
            results.showInvalid(inputError());
        } else {
            scheduleRate();
        }
    }

    private String inputError() {
        String e = coilForm.errorMessage() != null ? coilForm.errorMessage() : conditionsForm.errorMessage();
        return e == null ? Messages.get("results.fixFields") : Messages.format("results.fixThis", e);
    }

    /** Re-rates after a pause (one-shot timer), unless an entry is invalid. */
    private void scheduleRate() {
        if (!coilForm.isValidInput() || !conditionsForm.isValidInput()) {
            results.showInvalid(inputError());
            return;
        }
        ratePending = true;
        rateTimer.restart();
    }

    /** Rates every option now, in the background. */
    void rateNow() {
        rateTimer.stop();
        ratePending = false;
        if (!coilForm.isValidInput() || !conditionsForm.isValidInput()) {
            results.showInvalid(inputError());
            return;
        }
        results.headline(Messages.get("status.rating"));
        runner.rate(model.project(), bandSettings(), list -> {
            outcomes = list;
            comparison = null;
            showOutcomes();
        }, c -> {
            comparison = c;
            showComparison();
        });
    }

    /** @return the capacity band's settings: the comparison's default when the toolbar's toggle is on */
    private BandSettings bandSettings() {
        return bandToggle.isSelected() ? BandSettings.DEFAULT : BandSettings.OFF;
    }

    /** Shows the comparison in the side-by-side table and the selected option's band in the results. */
    private void showComparison() {
        compare.show(comparison, model.units());
        results.band(bandText());
    }

    /** @return the selected option's capacity band in words, from the latest comparison */
    private String bandText() {
        if (!bandToggle.isSelected()) {
            return Messages.get("results.bandOff");
        }
        if (comparison == null || comparison.project() != model.project()) {
            return Messages.get("results.bandPending");
        }
        List<Project.Entry> entries = comparison.project().entries();
        for (int place = 0; place < entries.size(); place++) {
            if (entries.get(place).option() == model.selected()) {
                var o = comparison.options().get(place);
                if (o.band() != null) {
                    return Messages.format("results.bandValue", Quantities.format(o.band().capacityP10(),
                            org.finstack.units.Dimension.HEAT_FLOW, model.units()), Quantities.format(
                                    o.band().capacityP90(), org.finstack.units.Dimension.HEAT_FLOW, model.units()));
                }
                return o.bandNote() != null ? Messages.format("results.bandFailed", o.bandNote()) : "-";
            }
        }
        return "-";
    }

    private void showOutcomes() {
        List<RatingRunner.Outcome> list = outcomes;
        int i = model.selected();
        if (i < list.size()) {
            RatingRunner.Outcome o = list.get(i);
            if (o.rating() != null) {
                results.show(model.option().name(), o.ratedCase(), o.rating(), model.units(), o.cautions());
            } else if (o.error() != null) {
                results.showInvalid(o.error().getMessage());
                if (o.error() instanceof InputException ie) {
                    conditionsForm.markRatingError(ie);
                }
            }
            coilMap.show(o.ratedCase(), o.rating(), model.units());
        }
        compare.show(comparison, model.units());
        results.band(bandText());
    }

    private void chooseAndOpen() {
        if (!confirmDiscard()) {
            return;
        }
        JFileChooser fc = chooser();
        if (fc.showOpenDialog(this) == JFileChooser.APPROVE_OPTION) {
            openProject(fc.getSelectedFile().toPath());
        }
    }

    private JFileChooser chooser() {
        JFileChooser fc = new JFileChooser(model.file() == null ? null : model.file().toAbsolutePath().getParent()
                .toFile());
        fc.setFileFilter(new FileNameExtensionFilter(Messages.get("file.filter"), "json"));
        return fc;
    }

    /**
     * Opens a project; a damaged or newer file is refused with a message and nothing changes. An
     * entry of the file that cannot be read (a bad value in one option) does not refuse the file:
     * it is listed under the options with its error and written back as it was when saving.
     *
     * @param file the file, or null for the demo project
     * @return whether it was opened
     */
    boolean openProject(Path file) {
        try {
            Project p = file == null ? Workbench.demo() : ProjectFiles.read(file);
            runner.cancel();
            outcomes = List.of();
            comparison = null;
            model.load(p, file);
            if (file != null) {
                prefs.addRecent(file);
                rebuildRecent();
            }
            return true;
        } catch (FinstackException e) {
            JOptionPane.showMessageDialog(this, Messages.format("file.openFailed", file, e.getMessage()),
                    Messages.get("app.title"), JOptionPane.ERROR_MESSAGE);
            return false;
        }
    }

    private void chooseAndImport() {
        JFileChooser fc = chooser();
        if (fc.showOpenDialog(this) == JFileChooser.APPROVE_OPTION) {
            importCase(fc.getSelectedFile().toPath());
        }
    }

    /**
     * Adds a case file's coil as a new option; where its conditions differ from the project's,
     * they become the option's own.
     *
     * @param file a case file
     * @return whether it was added
     */
    boolean importCase(Path file) {
        try {
            CoilCase c = CaseFiles.read(file);
            Conditions base = model.project().conditions();
            Overrides o = new Overrides(c.air().equals(base.air()) ? null : c.air(),
                    c.refrigerant().equals(base.refrigerant()) ? null : c.refrigerant(),
                    c.fouling().equals(base.fouling()) ? null : c.fouling());
            String name = file.getFileName().toString().replaceFirst("\\.json$", "");
            Project next = model.project().addOption(new Option(name, c.coil(), o));
            model.edit(next, next.allOptions().size() - 1);
            return true;
        } catch (FinstackException e) {
            JOptionPane.showMessageDialog(this, Messages.format("file.importFailed", file, e.getMessage()),
                    Messages.get("app.title"), JOptionPane.ERROR_MESSAGE);
            return false;
        }
    }

    private void save() {
        if (model.file() == null) {
            saveAs();
        } else {
            saveTo(model.file());
        }
    }

    private void saveAs() {
        JFileChooser fc = chooser();
        fc.setSelectedFile(new java.io.File(model.project().name().replaceAll("[^A-Za-z0-9._-]+", "-")
                .toLowerCase(Locale.ROOT) + ProjectFiles.EXTENSION));
        if (fc.showSaveDialog(this) == JFileChooser.APPROVE_OPTION) {
            Path p = fc.getSelectedFile().toPath();
            if (!p.getFileName().toString().endsWith(".json")) {
                p = p.resolveSibling(p.getFileName() + ProjectFiles.EXTENSION);
            }
            saveTo(p);
        }
    }

    /**
     * Saves the project atomically (the old file kept as NAME.bak).
     *
     * @param file where
     * @return whether it was saved
     */
    boolean saveTo(Path file) {
        try {
            ProjectFiles.write(file, model.project());
            model.saved(file);
            prefs.addRecent(file);
            rebuildRecent();
            status.setText(Messages.format("status.saved", file.getFileName()));
            return true;
        } catch (UncheckedIOException | FinstackException e) {
            JOptionPane.showMessageDialog(this, Messages.format("file.saveFailed", file, e.getMessage()),
                    Messages.get("app.title"), JOptionPane.ERROR_MESSAGE);
            return false;
        }
    }

    private void rebuildRecent() {
        recentMenu.removeAll();
        for (Path p : prefs.recent()) {
            JMenuItem item = new JMenuItem(p.getFileName() + "  \u2014  " + p.getParent());
            item.addActionListener(e -> {
                if (confirmDiscard()) {
                    openProject(p);
                }
            });
            recentMenu.add(item);
        }
        recentMenu.setEnabled(recentMenu.getItemCount() > 0);
    }

    /** Duplicates the selected option as a new candidate and selects it. */
    void duplicateSelected() {
        Project p = model.project();
        String name = Messages.format("options.copyName", model.option().name());
        Project next = p.duplicate(model.selected(), name);
        model.edit(next, next.allOptions().size() - 1);
    }

    private void removeSelected() {
        if (model.project().allOptions().size() < 2) {
            return;
        }
        int i = model.selected();
        model.edit(model.project().remove(i), Math.max(0, i - 1));
    }

    private void renameSelected() {
        Object name = JOptionPane.showInputDialog(this, Messages.get("options.renamePrompt"),
                Messages.get("app.title"), JOptionPane.PLAIN_MESSAGE, null, null, model.option().name());
        if (name != null && !name.toString().isBlank()) {
            model.edit(model.project().withOption(model.selected(), model.option().withName(name.toString().strip())),
                    model.selected());
        }
    }

    private void exportDrawing() {
        JFileChooser fc = new JFileChooser();
        fc.setSelectedFile(new java.io.File("coil.png"));
        if (fc.showSaveDialog(this) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        try {
            java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
            javax.imageio.ImageIO.write(drawing.image(900, 1100), "png", out);
            org.finstack.io.AtomicFiles.write(fc.getSelectedFile().toPath(), out.toByteArray());
        } catch (IOException e) {
            JOptionPane.showMessageDialog(this, Messages.format("file.saveFailed", fc.getSelectedFile(), e.getMessage()),
                    Messages.get("app.title"), JOptionPane.ERROR_MESSAGE);
        }
    }

    private void theme(Theme t) {
        prefs.theme(t);
        t.install();
        FlatLaf.updateUI();
        repaint();
    }

    private void showText(String title, String text) {
        JTextArea area = new JTextArea(text, 24, 80);
        area.setEditable(false);
        area.setLineWrap(true);
        area.setWrapStyleWord(true);
        area.setCaretPosition(0);
        area.setName("dialog.text");
        JOptionPane.showMessageDialog(this, new JScrollPane(area), title, JOptionPane.INFORMATION_MESSAGE);
    }

    /** @return the about text: the program, the published methods with references, the data sources */
    String aboutText() {
        StringBuilder b = new StringBuilder(Messages.get("about.intro")).append("\n\n");
        b.append(Messages.get("about.methods")).append("\n");
        List<Citation> methods = new ArrayList<>();
        outcomes.stream().filter(o -> o.rating() != null).findFirst().ifPresent(o -> methods.addAll(o.rating().methods()));
        if (methods.isEmpty()) {
            b.append("  ").append(Messages.get("about.notRated")).append("\n");
        }
        methods.forEach(c -> b.append("\u2022 ").append(c.key()).append(": ").append(c.reference()).append("\n"));
        b.append("\n").append(Messages.get("about.data")).append("\n");
        b.append("\u2022 ").append(Quantities.SOURCE.key()).append(": ").append(Quantities.SOURCE.reference()).append("\n");
        Materials.library().references().values().forEach(c -> b.append("\u2022 ").append(c.key()).append(": ")
                .append(c.reference()).append("\n"));
        b.append("\u2022 ").append(Messages.get("about.safety")).append("\n");
        return b.toString();
    }

    private boolean confirmDiscard() {
        if (!model.dirty()) {
            return true;
        }
        int a = JOptionPane.showConfirmDialog(this, Messages.get("file.unsaved"), Messages.get("app.title"),
                JOptionPane.YES_NO_CANCEL_OPTION, JOptionPane.WARNING_MESSAGE);
        if (a == JOptionPane.YES_OPTION) {
            save();
            return !model.dirty();
        }
        return a == JOptionPane.NO_OPTION;
    }

    private void close() {
        if (!confirmDiscard()) {
            return;
        }
        runner.cancel();
        prefs.bounds(getBounds());
        dispose();
        if (exitOnClose) {
            System.exit(0);
        }
    }

    /** Gathers every refrigerant's cautions off the event thread (it loads the fluids' data), then shows them. */
    private void showCautions() {
        new javax.swing.SwingWorker<String, Void>() {
            @Override
            protected String doInBackground() {
                return Cautions.full();
            }

            @Override
            protected void done() {
                try {
                    showText(Messages.get("cautions.title"), get());
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (java.util.concurrent.ExecutionException e) {
                    failure(e.getCause());
                }
            }
        }.execute();
    }

    private void failure(Throwable t) {
        Thread th = Thread.currentThread();
        th.getUncaughtExceptionHandler().uncaughtException(th, t);
    }

    // --- access for the tests (package-private) ---

    /** @return the model */
    ProjectModel model() {
        return model;
    }

    CoilForm coilForm() {
        return coilForm;
    }

    ConditionsForm conditionsForm() {
        return conditionsForm;
    }

    ResultsPanel results() {
        return results;
    }

    ComparePanel compare() {
        return compare;
    }

    CoilMapPanel coilMap() {
        return coilMap;
    }

    SweepPanel sweep() {
        return sweep;
    }

    RatingRunner runner() {
        return runner;
    }

    DrawingPanel drawing() {
        return drawing;
    }

    JTabbedPane tabs() {
        return tabs;
    }

    List<RatingRunner.Outcome> outcomes() {
        return outcomes;
    }

    /** @return the latest comparison, or null while it is worked out */
    Comparison comparison() {
        return comparison;
    }

    /** @return the capacity band's toggle */
    JCheckBox bandToggle() {
        return bandToggle;
    }

    /** @return the note listing the entries not read from the file */
    JTextArea damagedNote() {
        return damagedNote;
    }

    /** @return whether a rating is waiting on the timer or running */
    boolean busy() {
        return ratePending || runner.running();
    }

    /** @return the actions, for the shortcut test */
    List<Action> actions() {
        return List.copyOf(actions);
    }

    /** Brings up the window on the event thread. */
    void showWindow() {
        SwingUtilities.invokeLater(() -> setVisible(true));
    }
}
