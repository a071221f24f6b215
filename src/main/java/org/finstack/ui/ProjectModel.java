package org.finstack.ui;

import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.finstack.coil.CoilCase;
import org.finstack.core.FinstackException;
import org.finstack.study.Option;
import org.finstack.study.Project;
import org.finstack.units.UnitSystem;

/**
 * The workbench's state, used on the event thread only: the project (an immutable record; every
 * edit replaces it), the selected option, the file and the unit system, with undo and redo of
 * edits (the rating model is part of the refrigerant side, so choosing it is an edit too). Listeners hear of each change once.
 */
public final class ProjectModel {

    /** What changed. */
    public enum Change {
        /** The project's content. */
        PROJECT,
        /** The selected option. */
        SELECTION,
        /** The unit system. */
        UNITS,
        /** The file or its saved state. */
        FILE
    }

    /** Hears of changes. */
    @FunctionalInterface
    public interface Listener {
        /** @param change what changed */
        void changed(Change change);
    }

    private record Snapshot(Project project, int selected) {
    }

    private static final int UNDO_LIMIT = 200;

    private final List<Listener> listeners = new ArrayList<>();
    private final Deque<Snapshot> undo = new ArrayDeque<>();
    private final Deque<Snapshot> redo = new ArrayDeque<>();
    private Project project;
    private volatile Project published;
    private int selected;
    private Path file;
    private boolean dirty;
    private UnitSystem units;

    /**
     * @param project the project to start with
     * @param file    its file, or null
     * @param units   the unit system
     */
    public ProjectModel(Project project, Path file, UnitSystem units) {
        this.project = Objects.requireNonNull(project, "project");
        this.published = project;
        this.file = file;
        this.units = Objects.requireNonNull(units, "units");
    }

    /** @param l a listener */
    public void addListener(Listener l) {
        listeners.add(l);
    }

    private void fire(Change c) {
        for (Listener l : List.copyOf(listeners)) {
            l.changed(c);
        }
    }

    /** @return the project */
    public Project project() {
        return project;
    }

    /** @return the latest project, readable from any thread (for saving a recovery copy) */
    public Project latest() {
        return published;
    }

    /** @return the selected option's index in {@link Project#allOptions()} */
    public int selected() {
        return selected;
    }

    /** @return the selected option */
    public Option option() {
        return project.allOptions().get(selected);
    }

    /**
     * @return the selected option's case under the project's conditions, or empty while it cannot be
     *         built (a damaged option or a bad override; the panels that rate it say why)
     */
    public Optional<CoilCase> selectedCase() {
        try {
            return Optional.of(project.caseOf(selected));
        } catch (FinstackException e) {
            return Optional.empty();
        }
    }

    /** @return the project's file, or null when never saved */
    public Path file() {
        return file;
    }

    /** @return whether there are unsaved edits */
    public boolean dirty() {
        return dirty;
    }

    /** @return the unit system */
    public UnitSystem units() {
        return units;
    }

    /** @param u the unit system to show */
    public void units(UnitSystem u) {
        if (u != units) {
            units = u;
            fire(Change.UNITS);
        }
    }

    /** @param index the option to select */
    public void select(int index) {
        int i = Math.max(0, Math.min(index, project.allOptions().size() - 1));
        if (i != selected) {
            selected = i;
            fire(Change.SELECTION);
        }
    }

    /**
     * Applies an edit that can be undone.
     *
     * @param next        the edited project
     * @param newSelected the option to select afterwards
     */
    public void edit(Project next, int newSelected) {
        if (next.equals(project) && newSelected == selected) {
            return;
        }
        undo.push(new Snapshot(project, selected));
        while (undo.size() > UNDO_LIMIT) {
            undo.removeLast();
        }
        redo.clear();
        boolean selectionChanged = set(next, newSelected);
        dirty = true;
        fire(Change.PROJECT);
        if (selectionChanged) {
            fire(Change.SELECTION);
        }
        fire(Change.FILE);
    }

    private boolean set(Project next, int newSelected) {
        project = next;
        published = next;
        int s = Math.max(0, Math.min(newSelected, next.allOptions().size() - 1));
        boolean changed = s != selected;
        selected = s;
        return changed;
    }

    /** @return whether there is an edit to undo */
    public boolean canUndo() {
        return !undo.isEmpty();
    }

    /** @return whether there is an undone edit to redo */
    public boolean canRedo() {
        return !redo.isEmpty();
    }

    /** Undoes the last edit. */
    public void undo() {
        if (undo.isEmpty()) {
            return;
        }
        redo.push(new Snapshot(project, selected));
        restore(undo.pop());
    }

    /** Redoes the last undone edit. */
    public void redo() {
        if (redo.isEmpty()) {
            return;
        }
        undo.push(new Snapshot(project, selected));
        restore(redo.pop());
    }

    private void restore(Snapshot s) {
        boolean selectionChanged = set(s.project(), s.selected());
        dirty = true;
        fire(Change.PROJECT);
        if (selectionChanged) {
            fire(Change.SELECTION);
        }
        fire(Change.FILE);
    }

    /**
     * Replaces the whole project (a file opened): clears undo and redo.
     *
     * @param p the project
     * @param f its file, or null
     */
    public void load(Project p, Path f) {
        undo.clear();
        redo.clear();
        set(p, 0);
        selected = 0;
        file = f;
        dirty = false;
        fire(Change.PROJECT);
        fire(Change.SELECTION);
        fire(Change.FILE);
    }

    /** @param f the file the project was just saved to */
    public void saved(Path f) {
        file = f;
        dirty = false;
        fire(Change.FILE);
    }
}
