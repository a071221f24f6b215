package org.finstack.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.finstack.coil.CoilCase;
import org.finstack.core.Check;

/**
 * A project: one site's conditions, the existing coil, the candidates offered to replace it, the
 * limits a replacement must respect and free notes. Options are addressed by index into
 * {@link #allOptions()}: the existing coil (if any) first, then the candidates in order.
 *
 * @param version     file format version
 * @param name        project name
 * @param conditions  the operating conditions shared by all options
 * @param existing    the coil in place, or null for a new installation
 * @param options     the candidates
 * @param constraints limits on a replacement
 * @param notes       free text
 */
public record Project(int version, String name, Conditions conditions, Option existing, List<Option> options,
        Constraints constraints, String notes) {

    /** Newest project format version. */
    public static final int VERSION = 1;

    /** Validates and copies. */
    public Project {
        Check.atLeastOne("version", version);
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(conditions, "conditions");
        options = options == null ? List.of() : List.copyOf(options);
        constraints = constraints == null ? Constraints.NONE : constraints;
        notes = notes == null ? "" : notes;
    }

    /** @return the existing coil (if any) followed by the candidates */
    public List<Option> allOptions() {
        List<Option> all = new ArrayList<>();
        if (existing != null) {
            all.add(existing);
        }
        all.addAll(options);
        return List.copyOf(all);
    }

    /**
     * @param index an index into {@link #allOptions()}
     * @return whether it addresses the existing coil
     */
    public boolean isExisting(int index) {
        return existing != null && index == 0;
    }

    /**
     * @param index an index into {@link #allOptions()}
     * @return the case that option is rated as
     */
    public CoilCase caseOf(int index) {
        return allOptions().get(index).caseUnder(conditions);
    }

    /**
     * @param index  an index into {@link #allOptions()}
     * @param option its replacement
     * @return this project with that option replaced
     */
    public Project withOption(int index, Option option) {
        Objects.requireNonNull(option, "option");
        if (isExisting(index)) {
            return new Project(version, name, conditions, option, options, constraints, notes);
        }
        List<Option> list = new ArrayList<>(options);
        list.set(index - (existing == null ? 0 : 1), option);
        return new Project(version, name, conditions, existing, list, constraints, notes);
    }

    /**
     * @param index   an index into {@link #allOptions()}
     * @param newName the copy's name
     * @return this project with a copy of that option appended to the candidates
     */
    public Project duplicate(int index, String newName) {
        List<Option> list = new ArrayList<>(options);
        list.add(allOptions().get(index).withName(newName));
        return new Project(version, name, conditions, existing, list, constraints, notes);
    }

    /**
     * @param index an index into {@link #allOptions()} that is a candidate
     * @return this project without that candidate
     */
    public Project remove(int index) {
        if (isExisting(index)) {
            return new Project(version, name, conditions, null, options, constraints, notes);
        }
        List<Option> list = new ArrayList<>(options);
        list.remove(index - (existing == null ? 0 : 1));
        return new Project(version, name, conditions, existing, list, constraints, notes);
    }

    /**
     * @param c other conditions
     * @return this project with other conditions
     */
    public Project withConditions(Conditions c) {
        return new Project(version, name, c, existing, options, constraints, notes);
    }

    /**
     * @param n another name
     * @return this project renamed
     */
    public Project withName(String n) {
        return new Project(version, n, conditions, existing, options, constraints, notes);
    }

    /**
     * @param text other notes
     * @return this project with other notes
     */
    public Project withNotes(String text) {
        return new Project(version, name, conditions, existing, options, constraints, text);
    }
}
