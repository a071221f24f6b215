package org.finstack.study.pressure;

import java.util.Objects;
import java.util.OptionalDouble;
import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * The safety data of one refrigerant that charge screening needs.
 *
 * @param designation    refrigerant number, e.g. {@code R290}
 * @param safetyClass    ASHRAE 34 / ISO 817 safety class
 * @param lfl            lower flammability limit [kg/m3]; present exactly when the class is
 *                       flammable
 * @param practicalLimit practical limit (EN 378-1) [kg/m3]: the highest concentration in an
 *                       occupied space that needs no further measures
 * @param source         where the values come from
 * @param note           the values as read or recalled, with any caveat
 */
public record RefrigerantSafety(String designation, SafetyClass safetyClass, OptionalDouble lfl,
        double practicalLimit, Citation source, String note) {

    /** Validates the record: a flammable class needs a positive LFL, a class-1 refrigerant none. */
    public RefrigerantSafety {
        Objects.requireNonNull(designation, "designation");
        if (safetyClass == null) {
            throw new InputException("refrigerant.safetyClass", Msg.MISSING);
        }
        Objects.requireNonNull(lfl, "lfl");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(note, "note");
        Check.positive("refrigerant.practicalLimit", practicalLimit);
        if (safetyClass.flammable()) {
            if (lfl.isEmpty()) {
                throw new InputException("refrigerant.lfl", Msg.MISSING);
            }
            Check.positive("refrigerant.lfl", lfl.getAsDouble());
        } else if (lfl.isPresent()) {
            throw new InputException("refrigerant.lfl", Msg.IMPOSSIBLE,
                    "a class " + safetyClass + " refrigerant propagates no flame and has no LFL");
        }
    }

    /**
     * Safety data given by the caller (e.g. from a refrigerant's safety data sheet).
     *
     * @param designation    refrigerant number
     * @param safetyClass    safety class
     * @param lfl            lower flammability limit [kg/m3], or NaN for a class-1 refrigerant
     * @param practicalLimit practical limit [kg/m3]
     * @param source         where the caller took the values from
     * @return the record
     */
    public static RefrigerantSafety of(String designation, SafetyClass safetyClass, double lfl,
            double practicalLimit, Citation source) {
        OptionalDouble l = Double.isNaN(lfl) ? OptionalDouble.empty() : OptionalDouble.of(lfl);
        return new RefrigerantSafety(designation, safetyClass, l, practicalLimit, source, "given by the caller");
    }
}
