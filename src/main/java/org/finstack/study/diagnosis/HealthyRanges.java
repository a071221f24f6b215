package org.finstack.study.diagnosis;

import java.util.List;
import org.finstack.coil.Duty;

/**
 * The ranges a healthy coil of each duty shows in the field, set beside each reading so that
 * odd readings stand out. All are common practice of refrigeration service (rules of thumb,
 * not published limits): a reading outside is worth a second look, not proof of a fault.
 *
 * <ul>
 * <li>Evaporator (walk-in cooler / unit cooler): air temperature drop 3 to 6 K; superheat 4 to
 *     8 K with a thermostatic expansion valve; temperature difference, entering air minus
 *     saturation, 4 to 10 K; face velocity 1.5 to 3 m/s.</li>
 * <li>Air-cooled condenser: air temperature rise 8 to 15 K; subcooling 3 to 8 K; temperature
 *     difference, saturation minus entering air, 8 to 17 K; face velocity 2 to 3.5 m/s.</li>
 * </ul>
 */
public final class HealthyRanges {

    /** What every range rests on. */
    public static final String BASIS = "common practice";

    private HealthyRanges() {
    }

    /**
     * @param m        the readings
     * @param faceArea the coil's face area [m2]
     * @return each reading's check, in a fixed order
     */
    public static List<RangeCheck> check(Measurements m, double faceArea) {
        double tIn = m.airInletTemperature().value();
        double tOut = m.airOutletTemperature().value();
        double tSat = m.saturationTemperature().value();
        double face = m.volumeFlow().value() / faceArea;
        if (m.duty() == Duty.EVAPORATOR) {
            return List.of(
                    RangeCheck.of("air temperature drop", tIn - tOut, 3, 6, "K"), // common practice
                    RangeCheck.of("superheat", m.outletCondition().value(), 4, 8, "K"), // common practice (TXV)
                    RangeCheck.of("temperature difference", tIn - tSat, 4, 10, "K"), // common practice
                    RangeCheck.of("face velocity", face, 1.5, 3, "m/s")); // common practice
        }
        return List.of(
                RangeCheck.of("air temperature rise", tOut - tIn, 8, 15, "K"), // common practice
                RangeCheck.of("subcooling", m.outletCondition().value(), 3, 8, "K"), // common practice
                RangeCheck.of("temperature difference", tSat - tIn, 8, 17, "K"), // common practice
                RangeCheck.of("face velocity", face, 2, 3.5, "m/s")); // common practice
    }

    /**
     * One reading against its healthy range.
     *
     * @param name   what is checked
     * @param value  the reading [unit]
     * @param low    lower end of the healthy range [unit]
     * @param high   upper end [unit]
     * @param unit   the unit
     * @param status {@code typical}, {@code low} or {@code high}
     */
    public record RangeCheck(String name, double value, double low, double high, String unit, String status) {

        static RangeCheck of(String name, double value, double low, double high, String unit) {
            String status = value < low ? "low" : value > high ? "high" : "typical";
            return new RangeCheck(name, value, low, high, unit, status);
        }

        /** @return whether the reading lies in the healthy range */
        public boolean typical() {
            return status.equals("typical");
        }
    }
}
