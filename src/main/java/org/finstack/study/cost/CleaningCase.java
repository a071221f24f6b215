package org.finstack.study.cost;

import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

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

    /** @return the dirty plant's evaporating temperature [K] */
    public double dirtyEvaporatingTemperature() {
        return coil == FouledCoil.EVAPORATOR ? evaporatingTemperature - saturationShift : evaporatingTemperature;
    }

    /** @return the dirty plant's condensing temperature [K] */
    public double dirtyCondensingTemperature() {
        return coil == FouledCoil.CONDENSER ? condensingTemperature + saturationShift : condensingTemperature;
    }
}
