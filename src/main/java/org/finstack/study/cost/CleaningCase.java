package org.finstack.study.cost;

import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Warnings;

/**
 * What a cleaning-payback estimate needs: the plant's clean state, the shift dirt forces on one
 * saturation temperature, how long the plant runs, what energy costs and what a cleaning costs.
 *
 * @param coil                   which coil is dirty
 * @param duty                   refrigerating duty, kept the same clean and dirty [W]
 * @param evaporatingTemperature clean evaporating saturation temperature [K]
 * @param condensingTemperature  clean condensing saturation temperature [K]
 * @param saturationShift        shift of the dirty coil's saturation temperature away from the air [K]
 *                               (given, or from {@link SaturationShift#fromCapacityLoss})
 * @param secondLawEfficiency    the plant's eta_II [-], in (0, 1]
 * @param runTimePerYear         compressor running time per year [s], at most one leap year
 * @param tariff                 electricity price and currency
 * @param cleaningCost           price of one cleaning [currency]
 */
public record CleaningCase(FouledCoil coil, double duty, double evaporatingTemperature, double condensingTemperature,
        double saturationShift, double secondLawEfficiency, double runTimePerYear, Tariff tariff,
        double cleaningCost) {

    /** Seconds in one hour. */
    public static final double SECONDS_PER_HOUR = 3600;

    /** Seconds in a leap year, the longest running time per year accepted. */
    public static final double MAX_RUN_TIME = 366 * 24 * SECONDS_PER_HOUR;

    /** Validates every field. */
    public CleaningCase {
        if (coil == null) {
            throw new InputException("coil", Msg.MISSING);
        }
        Check.positive("duty", duty);
        Check.positive("evaporatingTemperature", evaporatingTemperature);
        Check.finite("condensingTemperature", condensingTemperature);
        if (!(condensingTemperature > evaporatingTemperature)) {
            throw new InputException("condensingTemperature", Msg.NOT_ABOVE, condensingTemperature,
                    evaporatingTemperature);
        }
        Check.nonNegative("saturationShift", saturationShift);
        if (coil == FouledCoil.EVAPORATOR && !(saturationShift < evaporatingTemperature)) {
            throw new InputException("saturationShift", Msg.NOT_BELOW, saturationShift, evaporatingTemperature);
        }
        Check.positive("secondLawEfficiency", secondLawEfficiency);
        Check.within("secondLawEfficiency", secondLawEfficiency, 0, 1);
        Check.within("runTimePerYear", runTimePerYear, 0, MAX_RUN_TIME);
        if (tariff == null) {
            throw new InputException("tariff", Msg.MISSING);
        }
        Check.nonNegative("cleaningCost", cleaningCost);
    }

    /**
     * The case for a coil that has lost the fraction f of its capacity at fixed temperatures, as a
     * fouling study gives it: the saturation shift dT f / (1 - f) ({@link SaturationShift}) on
     * the clean coil's mean temperature difference dT, and the refrigerating duty from the coil's
     * own duty. An evaporator's duty is the refrigerating duty; a condenser rejects the
     * refrigerating duty plus the compressor power, Q_rej = Q_evap (1 + 1/COP) (first law), so
     * Q_evap = Q_rej COP / (1 + COP) at the clean plant's COP ({@link CarnotCop}).
     *
     * <p>Worked example: a condenser rejecting 12 kW at 40 °C, clean difference 15 K, 20 % lost,
     * evaporating at -5 °C, eta_II = 0.5: COP = 2.97944, Q_evap = 8.98450 kW, shift 3.75 K.
     *
     * @param coil                       which coil is dirty
     * @param coilDuty                   the clean coil's duty: refrigerating duty for an evaporator,
     *                                   heat rejection for a condenser [W]
     * @param saturationTemperature      the dirty coil's clean saturation temperature [K]
     * @param cleanTemperatureDifference the clean coil's mean saturation-to-air difference [K]
     * @param capacityLoss               f, the fraction of capacity lost at fixed temperatures [-], in [0, 1)
     * @param otherSaturationTemperature the plant's other saturation temperature [K]: condensing for
     *                                   a dirty evaporator, evaporating for a dirty condenser
     * @param secondLawEfficiency        the plant's eta_II [-], in (0, 1]
     * @param runTimePerYear             compressor running time per year [s]
     * @param tariff                     electricity price and currency
     * @param cleaningCost               price of one cleaning [currency]
     * @return the case
     */
    public static CleaningCase fromCapacityLoss(FouledCoil coil, double coilDuty, double saturationTemperature,
            double cleanTemperatureDifference, double capacityLoss, double otherSaturationTemperature,
            double secondLawEfficiency, double runTimePerYear, Tariff tariff, double cleaningCost) {
        if (coil == null) {
            throw new InputException("coil", Msg.MISSING);
        }
        Check.positive("coilDuty", coilDuty);
        double shift = SaturationShift.fromCapacityLoss(capacityLoss, cleanTemperatureDifference);
        boolean evaporator = coil == FouledCoil.EVAPORATOR;
        double tEvap = evaporator ? saturationTemperature : otherSaturationTemperature;
        double tCond = evaporator ? otherSaturationTemperature : saturationTemperature;
        double duty = coilDuty;
        if (!evaporator) {
            double cop = CarnotCop.cop(tEvap, tCond, secondLawEfficiency, Warnings.discard());
            duty = coilDuty * cop / (1 + cop);
        }
        return new CleaningCase(coil, duty, tEvap, tCond, shift, secondLawEfficiency, runTimePerYear, tariff,
                cleaningCost);
    }

    /** @return the dirty plant's evaporating temperature [K] */
    public double dirtyEvaporatingTemperature() {
        return coil == FouledCoil.EVAPORATOR ? evaporatingTemperature - saturationShift : evaporatingTemperature;
    }

    /** @return the dirty plant's condensing temperature [K] */
    public double dirtyCondensingTemperature() {
        return coil == FouledCoil.CONDENSER ? condensingTemperature + saturationShift : condensingTemperature;
    }
}
