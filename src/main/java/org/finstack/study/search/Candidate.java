package org.finstack.study.search;

import java.util.Objects;
import org.finstack.geometry.CoilGeometry;

/**
 * One generated replacement coil.
 *
 * @param name        short name, e.g. {@code 3/8in-25.4x22 4R 10fpi plain copper/aluminium 4c}
 * @param description the same in words
 * @param patternId   the tube pattern it was built on
 * @param coil        the coil
 */
public record Candidate(String name, String description, String patternId, CoilGeometry coil) {

    /** Checks the parts are present. */
    public Candidate {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(patternId, "patternId");
        Objects.requireNonNull(coil, "coil");
    }
}
