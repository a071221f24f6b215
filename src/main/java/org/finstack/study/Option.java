package org.finstack.study;

import java.util.Objects;
import org.finstack.coil.CoilCase;
import org.finstack.geometry.CoilGeometry;

/**
 * One coil of a project: the existing coil or a candidate, with any conditions of its own.
 *
 * @param name      what the user calls it
 * @param coil      the coil
 * @param overrides parts of the conditions this option replaces ({@link Overrides#NONE} for none)
 */
public record Option(String name, CoilGeometry coil, Overrides overrides) {

    /** Checks the parts are present. */
    public Option {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(coil, "coil");
        overrides = overrides == null ? Overrides.NONE : overrides;
    }

    /**
     * @param project the project's conditions
     * @return the conditions this option is rated at
     */
    public Conditions conditions(Conditions project) {
        return overrides.applyTo(project);
    }

    /**
     * @param project the project's conditions
     * @return the case to rate
     */
    public CoilCase caseUnder(Conditions project) {
        return conditions(project).caseFor(coil);
    }

    /**
     * @param n another name
     * @return this option renamed
     */
    public Option withName(String n) {
        return new Option(n, coil, overrides);
    }

    /**
     * @param g another coil
     * @return this option with another coil
     */
    public Option withCoil(CoilGeometry g) {
        return new Option(name, g, overrides);
    }

    /**
     * @param o other overrides
     * @return this option with other overrides
     */
    public Option withOverrides(Overrides o) {
        return new Option(name, coil, o);
    }
}
