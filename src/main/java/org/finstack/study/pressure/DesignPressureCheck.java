package org.finstack.study.pressure;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.Numbers;

/**
 * Compares a tube's allowable gauge pressure with the pressure a refrigerant reaches at the
 * highest expected condensing temperature.
 *
 * <pre>
 *   required = max(p_sat - p_ambient, 105 kPa)        [Pa gauge]
 *   margin   = allowable / required                    [-]
 * </pre>
 *
 * <ul>
 *   <li>{@code p_sat} saturation pressure [Pa absolute] at the highest expected condensing
 *       temperature (see {@link DesignTemperatureLevel} for the levels the codes name); for R-744
 *       above its critical point pass the gas-cooler design pressure instead;</li>
 *   <li>{@code p_ambient} ambient pressure [Pa absolute], 101325 Pa by default;</li>
 *   <li>105 kPa is the minimum design gauge pressure of ASME B31.5 para. 501.2.4 ("not less than
 *       15 psi (105 kPa)", read).</li>
 * </ul>
 *
 * <p>Verdict bands (Finstack's screening choice, see {@link DesignPressureMargin.Verdict}):
 * below 1.0 {@code BELOW_REQUIRED}, 1.0 to below 1.3 {@code CAUTION}, 1.3 and above
 * {@code ADEQUATE}. Every result carries {@link #CAUTION}.
 *
 * <p>Worked example: allowable 7.0715 MPa gauge (9.525 mm x 0.762 mm annealed copper at 100 F),
 * saturation pressure 3.0 MPa absolute, ambient 101325 Pa: required 2.898675 MPa gauge,
 * margin 7.0715 / 2.898675 = 2.4396, ADEQUATE.
 */
public final class DesignPressureCheck {

    /** Source of the minimum design pressure. */
    public static final Citation SOURCE = Citation.of("ASME B31.5 para. 501.2.4",
            "ASME B31.5-2016, Refrigeration Piping and Heat Transfer Components, para. 501.2.4 Minimum Design "
                    + "Pressure: not less than 15 psi (105 kPa) gauge and not less than the saturation pressure "
                    + "of the refrigerant at the stated temperatures (read)");

    /** Minimum design gauge pressure of ASME B31.5 para. 501.2.4 [Pa] (read: 15 psi, 105 kPa). */
    public static final double MINIMUM_DESIGN_GAUGE = 105e3;

    /** Standard atmosphere [Pa] (ISO 2533), the default ambient pressure. */
    public static final double STANDARD_ATMOSPHERE = 101325;

    /** Margin at and above which the verdict is ADEQUATE (Finstack's screening choice). */
    public static final double ADEQUATE_FROM = 1.3;

    /** The statement that goes with every result. */
    public static final String CAUTION = "Estimate only. The coil's rated design pressure from its maker, the "
            + "pressure-equipment and refrigeration safety codes in force (such as EN 378-2, ASME B31.5, "
            + "ASHRAE 15) and licensed practice govern. High-pressure refrigerants such as R-410A, R-32 and "
            + "R-744 need coils built and rated for them: do not fit one to a coil rated for a lower-pressure "
            + "refrigerant on the strength of this estimate.";

    private DesignPressureCheck() {
    }

    /**
     * The margin at standard atmospheric ambient pressure.
     *
     * @param allowableGauge        allowable gauge pressure of the tube [Pa]
     * @param saturationPressureAbs saturation pressure at the highest expected condensing
     *                              temperature [Pa absolute]
     * @return the margin and verdict
     */
    public static DesignPressureMargin margin(double allowableGauge, double saturationPressureAbs) {
        return margin(allowableGauge, saturationPressureAbs, STANDARD_ATMOSPHERE);
    }

    /**
     * The margin of a tube's allowable pressure over the required pressure.
     *
     * @param allowableGauge        allowable gauge pressure of the tube [Pa]
     * @param saturationPressureAbs saturation pressure at the highest expected condensing
     *                              temperature [Pa absolute]
     * @param ambient               ambient pressure [Pa absolute]
     * @return the margin and verdict
     * @throws org.finstack.core.InputException naming the offending argument
     */
    public static DesignPressureMargin margin(double allowableGauge, double saturationPressureAbs, double ambient) {
        Check.positive("allowableGauge", allowableGauge);
        Check.positive("saturationPressure", saturationPressureAbs);
        Check.positive("ambientPressure", ambient);
        List<String> notes = new ArrayList<>();
        double gauge = saturationPressureAbs - ambient;
        double required;
        if (gauge < MINIMUM_DESIGN_GAUGE) {
            required = MINIMUM_DESIGN_GAUGE;
            notes.add(String.format(Locale.ROOT, "Saturation pressure %s kPa gauge is below the ASME B31.5 minimum "
                    + "design pressure; 105 kPa gauge is required instead.", Numbers.brief(gauge / 1e3)));
        } else {
            required = gauge;
            notes.add(String.format(Locale.ROOT, "Required pressure: saturation %s kPa less ambient %s kPa = %s kPa "
                    + "gauge.", Numbers.brief(saturationPressureAbs / 1e3), Numbers.brief(ambient / 1e3),
                    Numbers.brief(gauge / 1e3)));
        }
        double margin = allowableGauge / required;
        DesignPressureMargin.Verdict verdict = margin < 1 ? DesignPressureMargin.Verdict.BELOW_REQUIRED
                : margin < ADEQUATE_FROM ? DesignPressureMargin.Verdict.CAUTION
                : DesignPressureMargin.Verdict.ADEQUATE;
        if (verdict != DesignPressureMargin.Verdict.ADEQUATE) {
            notes.add("Check the coil maker's rated design pressure before going further: the calculated tube "
                    + "rating is conservative for thin-wall coil tube, but only the maker's rating settles it.");
        }
        return new DesignPressureMargin(allowableGauge, required, margin, verdict, CAUTION, notes);
    }
}
