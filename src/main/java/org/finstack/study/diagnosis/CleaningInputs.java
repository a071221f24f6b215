package org.finstack.study.diagnosis;

import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * What the cleaning payback needs beyond the diagnosis (the measurement file's {@code cleaning}
 * object).
 *
 * @param cost                       price of one cleaning [currency]
 * @param currency                   currency label, e.g. "EUR"
 * @param pricePerKwh                electricity price [currency/kWh]
 * @param runHours                   compressor running hours per year [h]
 * @param secondLawEfficiency        the plant's eta_II [-], in (0, 1]
 * @param otherSaturationTemperature the plant's other saturation temperature [K]: the condensing
 *                                   temperature when an evaporator is diagnosed, the evaporating
 *                                   temperature when a condenser is
 */
public record CleaningInputs(double cost, String currency, double pricePerKwh, double runHours,
        double secondLawEfficiency, double otherSaturationTemperature) {

    /** Hours in a leap year, the most running hours accepted. */
    public static final double MAX_HOURS = 366 * 24;

    /** Validates each field (named as in the file). */
    public CleaningInputs {
        Check.nonNegative("cleaning.cost", cost);
        if (currency == null || currency.isBlank()) {
            throw new InputException("cleaning.currency", Msg.MISSING);
        }
        Check.nonNegative("cleaning.energyPrice", pricePerKwh);
        Check.within("cleaning.runHours", runHours, 0, MAX_HOURS);
        Check.positive("cleaning.secondLawEfficiency", secondLawEfficiency);
        Check.within("cleaning.secondLawEfficiency", secondLawEfficiency, 0, 1);
        Check.within("cleaning.otherSaturationTemperature", otherSaturationTemperature, 173.15, 373.15);
    }
}
