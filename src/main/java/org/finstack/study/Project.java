package org.finstack.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.finstack.coil.CoilCase;
import org.finstack.core.Check;

/**
 * A project: one site's conditions, the existing coil, the candidates offered to replace it, the
 * limits a replacement must respect (with the room a leak can reach) and free notes. Options are
 * addressed by index into {@link #allOptions()}: the existing coil (if any) first, then the
 * candidates in order.
 *
 * <p>An entry of a project file that could not be read (a bad value in one option) is kept as a
 * {@link Damaged} entry beside the options, with its error and its original JSON text, so the
 * other options can still be rated and saving the project never loses it. Damaged entries are
 * not options: {@link #allOptions()} holds the readable ones only; {@link #entries()} gives both
 * in the file's order.
 *
 * @param version     file format version the project was read from (or is to be written in)
 * @param name        project name
 * @param conditions  the operating conditions shared by all options
 * @param existing    the coil in place, or null for a new installation (or when its entry is damaged)
 * @param options     the candidates
 * @param constraints limits on a replacement
 * @param notes       free text
 * @param damaged     entries of the file that could not be read, in the file's order
 */
public record Project(int version, String name, Conditions conditions, Option existing, List<Option> options,
        Constraints constraints, String notes, List<Damaged> damaged) {

    /**
     * Newest project format version: 2 added {@code constraints.room}; version 1 files are read
     * as they are.
     */
    public static final int VERSION = 2;

    /** Validates and copies. */
    public Project {
        Check.atLeastOne("version", version);
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(conditions, "conditions");
        options = options == null ? List.of() : List.copyOf(options);
        constraints = constraints == null ? Constraints.NONE : constraints;
        notes = notes == null ? "" : notes;
        damaged = damaged == null ? List.of() : List.copyOf(damaged);
    }

    /**
     * A project without damaged entries.
     *
     * @param version     file format version
     * @param name        project name
     * @param conditions  the operating conditions shared by all options
     * @param existing    the coil in place, or null
     * @param options     the candidates
     * @param constraints limits on a replacement
     * @param notes       free text
     */
    public Project(int version, String name, Conditions conditions, Option existing, List<Option> options,
            Constraints constraints, String notes) {
        this(version, name, conditions, existing, options, constraints, notes, List.of());
    }

    /**
     * An entry of a project file that could not be read, kept as it was written.
     *
     * @param field where it stood in the file: {@code existing} or {@code options[i]}
     * @param slot  its place in the file's {@code options} list, or -1 for {@code existing}
     * @param name  its {@code name} when that could be read, else {@code field}
     * @param error the reason, naming the field ({@code options[1].coil.finPitch: ...})
     * @param json  the entry's original JSON text, verbatim
     */
    public record Damaged(String field, int slot, String name, String error, String json) {

        /** Checks the parts are present. */
        public Damaged {
            Objects.requireNonNull(field, "field");
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(error, "error");
            Objects.requireNonNull(json, "json");
            if (slot < -1) {
                throw new IllegalArgumentException("slot " + slot);
            }
        }

        /** @return whether it stood in the file as the existing coil */
        public boolean existing() {
            return slot < 0;
        }
    }

    /**
     * One entry of the project in the file's order: a readable option or a damaged entry.
     *
     * @param option  index into {@link #allOptions()}, or -1 for a damaged entry
     * @param damaged the damaged entry, or null
     */
    public record Entry(int option, Damaged damaged) {

        /** @return whether the entry is a readable option */
        public boolean readable() {
            return damaged == null;
        }
    }

    /**
     * Every entry in the file's order: the existing coil's place first (readable or damaged), then
     * the candidates with each damaged entry at its {@link Damaged#slot()} (after the readable
     * candidates when the list has since become shorter).
     *
     * @return the entries
     */
    public List<Entry> entries() {
        List<Entry> out = new ArrayList<>();
        int next = 0;
        if (existing != null) {
            out.add(new Entry(next++, null));
        }
        damaged.stream().filter(Damaged::existing).forEach(d -> out.add(new Entry(-1, d)));
        List<Damaged> waiting = new ArrayList<>(damaged.stream().filter(d -> !d.existing()).toList());
        waiting.sort(java.util.Comparator.comparingInt(Damaged::slot));
        int slot = 0;
        int candidate = 0;
        while (candidate < options.size() || !waiting.isEmpty()) {
            if (!waiting.isEmpty() && (waiting.get(0).slot() <= slot || candidate >= options.size())) {
                out.add(new Entry(-1, waiting.remove(0)));
            } else {
                out.add(new Entry(next++, null));
                candidate++;
            }
            slot++;
        }
        return List.copyOf(out);
    }

    /**
     * @param option a new candidate
     * @return this project with it appended to the candidates
     */
    public Project addOption(Option option) {
        Objects.requireNonNull(option, "option");
        List<Option> list = new ArrayList<>(options);
        list.add(option);
        return new Project(version, name, conditions, existing, list, constraints, notes, damaged);
    }

    /**
     * @param k other limits
     * @return this project with other limits
     */
    public Project withConstraints(Constraints k) {
        return new Project(version, name, conditions, existing, options, k, notes, damaged);
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
            return new Project(version, name, conditions, option, options, constraints, notes, damaged);
        }
        List<Option> list = new ArrayList<>(options);
        list.set(index - (existing == null ? 0 : 1), option);
        return new Project(version, name, conditions, existing, list, constraints, notes, damaged);
    }

    /**
     * @param index   an index into {@link #allOptions()}
     * @param newName the copy's name
     * @return this project with a copy of that option appended to the candidates
     */
    public Project duplicate(int index, String newName) {
        List<Option> list = new ArrayList<>(options);
        list.add(allOptions().get(index).withName(newName));
        return new Project(version, name, conditions, existing, list, constraints, notes, damaged);
    }

    /**
     * @param index an index into {@link #allOptions()} that is a candidate
     * @return this project without that candidate
     */
    public Project remove(int index) {
        if (isExisting(index)) {
            return new Project(version, name, conditions, null, options, constraints, notes, damaged);
        }
        List<Option> list = new ArrayList<>(options);
        list.remove(index - (existing == null ? 0 : 1));
        return new Project(version, name, conditions, existing, list, constraints, notes, damaged);
    }

    /**
     * @param c other conditions
     * @return this project with other conditions
     */
    public Project withConditions(Conditions c) {
        return new Project(version, name, c, existing, options, constraints, notes, damaged);
    }

    /**
     * @param n another name
     * @return this project renamed
     */
    public Project withName(String n) {
        return new Project(version, n, conditions, existing, options, constraints, notes, damaged);
    }

    /**
     * @param text other notes
     * @return this project with other notes
     */
    public Project withNotes(String text) {
        return new Project(version, name, conditions, existing, options, constraints, text, damaged);
    }
}
