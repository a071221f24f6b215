package org.finstack.study.pressure;

import java.util.OptionalDouble;
import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * Flammable-refrigerant charge limit of a self-contained commercial refrigerating appliance
 * (display case, reach-in cabinet) under IEC 60335-2-89:2019.
 *
 * <pre>
 *   m_max = 13 m3 x LFL                   for class A3
 *   m_max = min(13 m3 x LFL, 1.2 kg)      for classes A2 and A2L
 * </pre>
 *
 * <ul>
 *   <li>{@code LFL} lower flammability limit [kg/m3]; {@code m_max} [kg].</li>
 * </ul>
 *
 * <p>Read: the 2019 edition raised the limit for A3 refrigerants to "approximately 500 g" and for
 * A2 and A2L to "a maximum of 1.2 kg", both from 150 g (Institute of Refrigeration 2019;
 * hydrocarbons21 2019). The factor 13 m3 x LFL is recalled (from memory); it gives 494 g for R290,
 * the "approximately 500 g" read. Class B flammable refrigerants and class-1 refrigerants are
 * not covered: the method then returns no limit. A standard's rule: no scatter to state.
 *
 * <p>Worked example: R290 (A3, LFL 0.038 kg/m3): m_max = 13 x 0.038 = 0.494 kg; R32 (A2L, LFL
 * 0.307 kg/m3): 13 x 0.307 = 3.991 kg, capped at 1.2 kg.
 */
public final class Iec60335Part2Part89 {

    /** The standard, with the reports read. */
    public static final Citation SOURCE = Citation.of("IEC 60335-2-89:2019",
            "IEC 60335-2-89:2019, Household and similar electrical appliances - Safety - Part 2-89: Particular "
                    + "requirements for commercial refrigerating appliances and ice-makers with an incorporated or "
                    + "remote refrigerant unit or motor-compressor (factor 13 m3 x LFL from memory); limits as "
                    + "reported by the Institute of Refrigeration, 'Flammable refrigerant charge size limits "
                    + "increased' (2019), and hydrocarbons21, 'New IEC standard increasing HC charge limit "
                    + "officially published' (26 June 2019) (read)");

    /** Volume factor [m3] (from memory). */
    public static final double VOLUME_FACTOR = 13;
    /** Ceiling for classes A2 and A2L [kg] (read: "a maximum of 1.2 kg"). */
    public static final double A2_CEILING = 1.2;
    /** Limit of the editions before 2019 for flammable refrigerants [kg] (read: 150 g). */
    public static final double PREVIOUS_EDITION_LIMIT = 0.150;

    private Iec60335Part2Part89() {
    }

    /**
     * @param safetyClass the refrigerant's safety class
     * @param lfl         lower flammability limit [kg/m3] (ignored for classes not covered)
     * @return the charge limit [kg], or empty when the standard's limit does not apply to the class
     */
    public static OptionalDouble maximumCharge(SafetyClass safetyClass, double lfl) {
        if (safetyClass == null) {
            throw new InputException("refrigerant.safetyClass", Msg.MISSING);
        }
        return switch (safetyClass) {
            case A3 -> OptionalDouble.of(VOLUME_FACTOR * Check.positive("refrigerant.lfl", lfl));
            case A2, A2L -> OptionalDouble.of(Math.min(VOLUME_FACTOR * Check.positive("refrigerant.lfl", lfl),
                    A2_CEILING));
            default -> OptionalDouble.empty();
        };
    }
}
