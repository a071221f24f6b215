package org.finstack.study.compare;

import java.util.List;
import org.finstack.study.pressure.ChargeScreeningResult;
import org.finstack.study.pressure.RefrigerantSafety;

/**
 * The refrigerant held in a coil's tubes and, for a flammable or toxic refrigerant, what the
 * charge screen says about it.
 *
 * @param computed  whether the rating model computed the charge (the isothermal model does not)
 * @param charge    refrigerant held in the coil's tubes [kg] (0 when not computed)
 * @param safety    the refrigerant's safety data, or null when the safety table does not hold it
 * @param screening the EN 378-1 screen of the coil's charge against the room, or null when no
 *                  room was given, the charge is not known or the refrigerant needs no screen
 * @param notes     what was and was not screened, as sentences
 */
public record ChargeResult(boolean computed, double charge, RefrigerantSafety safety,
        ChargeScreeningResult screening, List<String> notes) {

    /** Freezes the notes. */
    public ChargeResult {
        notes = List.copyOf(notes);
    }
}
