package org.finstack.study.cost;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Locale;
import java.util.OptionalDouble;
import org.finstack.core.Warnings;

/**
 * What the dirt on a coil costs a year and how soon a cleaning pays for itself.
 *
 * <p>The plant keeps its refrigerating duty Q; dirt shifts one saturation temperature by the
 * given amount ({@link CleaningCase#saturationShift()}); the compressor power clean and dirty is
 * W = Q / COP with COP = eta_II T_evap / (T_cond - T_evap) ({@link CarnotCop}, Stoecker &amp; Jones
 * 1982). Then
 * <pre>
 *   extra energy per year  E = (W_dirty - W_clean) t_run           [J]
 *   cost of the dirt       C = E / 3.6e6 x price per kWh          [currency per year]
 *   payback of a cleaning  cleaning cost / C                      [years; never when C = 0]
 * </pre>
 * The estimate is approximate by construction: a constant second-law efficiency, the same
 * duty and running time clean and dirty, and no fan-power change.
 *
 * <p>Worked example: a condenser, Q = 10 kW, T_evap = -5 °C, T_cond = 40 °C, eta_II = 0.5, a
 * 20 % capacity loss on a clean difference of 15 K (shift 3.75 K), 3000 h a year at EUR 0.20 per
 * kWh and a cleaning at EUR 250: the compressor draws 279.694 W more, 839.083 kWh and
 * EUR 167.817 a year, and the cleaning pays back in 1.48972 years: "Cleaning this condenser
 * would save about 839 kWh and EUR 168 per year; at a cleaning cost of EUR 250 it pays back in
 * 18 months."
 *
 * @param cleaningCase         the inputs
 * @param cleanCompressorPower compressor power with the clean coil [W]
 * @param dirtyCompressorPower compressor power with the dirty coil [W]
 * @param extraEnergyPerYear   extra compressor energy per year [J]
 * @param costPerYear          cost of that energy [currency per year]
 * @param paybackYears         cleaning cost over cost per year [years]; empty when the dirt costs
 *                             nothing, i.e. the cleaning never pays back
 */
public record CleaningPayback(CleaningCase cleaningCase, double cleanCompressorPower, double dirtyCompressorPower,
        double extraEnergyPerYear, double costPerYear, OptionalDouble paybackYears) {

    /** Paybacks up to this many months are stated in months, longer ones in years. */
    public static final int MONTHS_SHOWN_UP_TO = 36;

    /**
     * @param c        the case
     * @param warnings where warnings of the COP approximation go
     * @return the yearly cost of the dirt and the cleaning's payback
     */
    public static CleaningPayback of(CleaningCase c, Warnings warnings) {
        double clean = CarnotCop.compressorPower(c.duty(), c.evaporatingTemperature(), c.condensingTemperature(),
                c.secondLawEfficiency(), warnings);
        double dirty = CarnotCop.compressorPower(c.duty(), c.dirtyEvaporatingTemperature(),
                c.dirtyCondensingTemperature(), c.secondLawEfficiency(), warnings);
        double extra = Math.max(0, dirty - clean) * c.runTimePerYear();
        double cost = c.tariff().cost(extra);
        OptionalDouble payback = cost > 0 ? OptionalDouble.of(c.cleaningCost() / cost) : OptionalDouble.empty();
        return new CleaningPayback(c, clean, dirty, extra, cost, payback);
    }

    /** @return extra compressor power with the dirty coil [W] */
    public double extraPower() {
        return dirtyCompressorPower - cleanCompressorPower;
    }

    /**
     * One sentence for a service manager, e.g. "Cleaning this condenser would save about 839 kWh
     * and EUR 168 per year; at a cleaning cost of EUR 250 it pays back in 18 months."
     *
     * @return the sentence; energy and money rounded to three significant figures
     */
    public String summary() {
        CleaningCase c = cleaningCase;
        String coil = c.coil().noun();
        String currency = c.tariff().currency();
        String cleaning = currency + " " + plain(c.cleaningCost());
        if (paybackYears.isEmpty()) {
            return String.format(Locale.ROOT, "Cleaning this %s would save no energy or money (the dirt costs"
                    + " nothing at these inputs); at a cleaning cost of %s it never pays back.", coil, cleaning);
        }
        double kwh = extraEnergyPerYear / Tariff.JOULES_PER_KWH;
        return String.format(Locale.ROOT, "Cleaning this %s would save about %s kWh and %s %s per year;"
                + " at a cleaning cost of %s it pays back %s.", coil, about(kwh), currency, about(costPerYear),
                cleaning, when(paybackYears.getAsDouble()));
    }

    private static String when(double years) {
        double months = 12 * years;
        if (years == 0) {
            return "at once";
        }
        if (months < 0.5) {
            return "within a month";
        }
        if (months <= MONTHS_SHOWN_UP_TO) {
            long m = Math.round(months);
            return "in " + m + (m == 1 ? " month" : " months");
        }
        return String.format(Locale.ROOT, "in about %.1f years", years);
    }

    /** Three significant figures, no exponent, no trailing zeros after the point. */
    private static String about(double v) {
        if (v == 0) {
            return "0";
        }
        return new BigDecimal(v).round(new MathContext(3)).stripTrailingZeros().toPlainString();
    }

    /** The user's own amount: whole, or to the cent. */
    private static String plain(double v) {
        if (v == Math.rint(v)) {
            return String.format(Locale.ROOT, "%.0f", v);
        }
        return String.format(Locale.ROOT, "%.2f", v);
    }
}
