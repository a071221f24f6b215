package org.finstack.study.diagnosis;

import org.finstack.coil.Duty;
import org.finstack.coil.Rating;
import org.finstack.core.Citation;
import org.finstack.fluid.psychro.MoistAirState;
import org.finstack.fluid.psychro.Psychrometrics;

/**
 * The coil's duty from the air-side readings, with the moist-air relations of ASHRAE
 * Handbook&mdash;Fundamentals (2017) Ch. 1:
 * <pre>
 *   m_da = V rho_in / (1 + W_in)                               dry-air mass flow [kg/s]
 *   sensible: Q_s = m_da (h(T_in, W_in) - h(T_out, W_in))     = m_da (1006 + 1860 W_in) (T_in - T_out)
 *   total:    Q   = m_da (h(T_in, W_in) - h(T_out, W_out))    (needs the leaving humidity)
 * </pre>
 * with h = 1006 t + W (2 501 000 + 1860 t) [J/kg dry air] (eq. 32). The condensate's own
 * enthalpy is neglected (under 0.5 % of the duty). On a condenser, and on an evaporator whose
 * leaving humidity is not measured, the sensible duty is the one matched: the rating model's
 * sensible capacity is defined the same way. With the leaving humidity measured, the total.
 *
 * <p>Worked example: 1.5 m3/s of air at 30 °C, dry, 101 325 Pa, leaving at 40 °C: rho_in =
 * 1.16443 kg/m3, m_da = 1.74665 kg/s, Q = 17571.3 W.
 */
public final class MeasuredDuty {

    /** The moist-air relations. */
    public static final Citation SOURCE = Psychrometrics.SOURCE;

    private MeasuredDuty() {
    }

    /** What is matched between readings and model. */
    public enum Basis {
        /** The sensible heat, m_da cp (T_in - T_out). */
        SENSIBLE,
        /** The total heat, from the enthalpies in and out. */
        TOTAL;

        /** @return the name shown in results */
        public String id() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }

        /**
         * @param r a rating
         * @return the rating's value on this basis [W]
         */
        public double of(Rating r) {
            return this == TOTAL ? r.capacity() : r.moisture().sensibleCapacity();
        }
    }

    /**
     * @param m the readings
     * @return the basis a diagnosis matches on
     */
    public static Basis basis(Measurements m) {
        return m.duty() == Duty.EVAPORATOR && m.airOutletRelativeHumidity() != null ? Basis.TOTAL : Basis.SENSIBLE;
    }

    /**
     * @param m the readings
     * @return dry-air mass flow [kg/s]
     */
    public static double dryAirMassFlow(Measurements m) {
        MoistAirState in = inlet(m);
        return m.volumeFlow().value() * in.density() / (1 + in.humidityRatio());
    }

    /**
     * @param m     the readings
     * @param basis sensible or total
     * @return the measured duty, positive [W]
     */
    public static double of(Measurements m, Basis basis) {
        MoistAirState in = inlet(m);
        double tOut = m.airOutletTemperature().value();
        double wOut = basis == Basis.TOTAL
                ? Psychrometrics.humidityRatioFromRelativeHumidity(tOut, m.airOutletRelativeHumidity().value(), m.pressure())
                : in.humidityRatio();
        double dh = in.enthalpy() - Psychrometrics.enthalpy(tOut, wOut);
        return Math.abs(dryAirMassFlow(m) * dh);
    }

    private static MoistAirState inlet(Measurements m) {
        return MoistAirState.fromRelativeHumidity(m.airInletTemperature().value(), m.airInletRelativeHumidity().value(),
                m.pressure());
    }
}
