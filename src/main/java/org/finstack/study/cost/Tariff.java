package org.finstack.study.cost;

import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * An electricity price, as tariffs quote it, with the user's currency label (a plain label,
 * e.g. "EUR" or "$"; no conversion is made).
 *
 * @param pricePerKwh price of one kilowatt-hour (3.6 MJ) [currency/kWh]
 * @param currency    the currency label
 */
public record Tariff(double pricePerKwh, String currency) {

    /** Joules in one kilowatt-hour. */
    public static final double JOULES_PER_KWH = 3.6e6;

    /** Validates price and label. */
    public Tariff {
        Check.nonNegative("tariff.pricePerKwh", pricePerKwh);
        if (currency == null || currency.isBlank()) {
            throw new InputException("tariff.currency", Msg.MISSING);
        }
    }

    /**
     * @param energy energy [J]
     * @return its price [currency]
     */
    public double cost(double energy) {
        return energy / JOULES_PER_KWH * pricePerKwh;
    }
}
