package org.finstack.units;

import static org.finstack.units.Dimension.AREA;
import static org.finstack.units.Dimension.CONDUCTIVITY;
import static org.finstack.units.Dimension.DENSITY;
import static org.finstack.units.Dimension.ENERGY;
import static org.finstack.units.Dimension.FIN_PITCH;
import static org.finstack.units.Dimension.FOULING_RESISTANCE;
import static org.finstack.units.Dimension.HEAT_FLOW;
import static org.finstack.units.Dimension.HEAT_TRANSFER_COEFFICIENT;
import static org.finstack.units.Dimension.LENGTH;
import static org.finstack.units.Dimension.MASS;
import static org.finstack.units.Dimension.MASS_FLOW;
import static org.finstack.units.Dimension.POWER;
import static org.finstack.units.Dimension.PRESSURE;
import static org.finstack.units.Dimension.PRESSURE_DIFFERENCE;
import static org.finstack.units.Dimension.SPECIFIC_ENTHALPY;
import static org.finstack.units.Dimension.SPECIFIC_HEAT;
import static org.finstack.units.Dimension.TEMPERATURE;
import static org.finstack.units.Dimension.TEMPERATURE_DIFFERENCE;
import static org.finstack.units.Dimension.THERMAL_RESISTANCE;
import static org.finstack.units.Dimension.TIME;
import static org.finstack.units.Dimension.UA;
import static org.finstack.units.Dimension.VELOCITY;
import static org.finstack.units.Dimension.VISCOSITY;
import static org.finstack.units.Dimension.VOLUME;
import static org.finstack.units.Dimension.VOLUME_FLOW;

import java.math.BigDecimal;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/**
 * Every conversion factor against the value NIST Special Publication 811 (2008), Appendix B.8
 * ("Factors for units listed alphabetically") prints for it. A printed value with n significant
 * digits is checked to half a unit in its last digit; a value NIST marks exact, to 1e-15.
 */
class Nist811ConversionTest {

    private static final double EXACT = 1e-15;

    /** Checks the SI value of one unit against a printed NIST value, to half its last digit. */
    private static void nist(String printed, Dimension dim, String unit) {
        BigDecimal p = new BigDecimal(printed);
        double halfLastDigit = 0.5 * Math.pow(10, -p.scale()) / p.abs().doubleValue();
        Reference.assertRelative(p.doubleValue(), Quantities.fromUnit(1, dim, unit), halfLastDigit,
                "NIST SP 811, Appendix B.8: 1 " + unit + " = " + printed + " (" + dim.siUnit() + ")");
    }

    private static void exact(double expected, Dimension dim, String unit, String context) {
        Reference.assertRelative(expected, Quantities.fromUnit(1, dim, unit), EXACT, context);
    }

    @Test
    void lengthsAreTheInternationalInchAndFoot() {
        exact(2.54e-2, LENGTH, "in", "NIST SP 811, Appendix B.8: inch = 2.54 E-02 m, exact");
        exact(3.048e-1, LENGTH, "ft", "NIST SP 811, Appendix B.8: foot = 3.048 E-01 m, exact");
        exact(1e-6, LENGTH, "µm", "NIST SP 811, Appendix B.8: micron = 1.0 E-06 m, exact");
        exact(6.4516e-4, AREA, "in2", "NIST SP 811, Appendix B.8: square inch = 6.4516 E-04 m2, exact");
        exact(9.290304e-2, AREA, "ft2", "NIST SP 811, Appendix B.8: square foot = 9.290304 E-02 m2, exact");
    }

    @Test
    void volumes() {
        nist("1.638706E-05", VOLUME, "in3"); // NIST SP 811, Appendix B.8: cubic inch
        nist("2.831685E-02", VOLUME, "ft3"); // NIST SP 811, Appendix B.8: cubic foot
        nist("3.785412E-03", VOLUME, "gal"); // NIST SP 811, Appendix B.8: gallon (U.S.)
        exact(1e-3, VOLUME, "L", "NIST SP 811, Appendix B.8: liter = 1.0 E-03 m3, exact");
    }

    @Test
    void masses() {
        exact(4.5359237e-1, MASS, "lb", "NIST SP 811, Appendix B.8, note 22: pound (avoirdupois) = 0.45359237 kg, exact");
        nist("2.834952E-02", MASS, "oz"); // NIST SP 811, Appendix B.8: ounce (avoirdupois)
    }

    @Test
    void pressures() {
        nist("6.894757E+03", PRESSURE, "psia"); // NIST SP 811, Appendix B.8: pound-force per square inch
        exact(1.01325e5, PRESSURE, "atm", "NIST SP 811, Appendix B.8: atmosphere, standard = 1.01325 E+05 Pa, exact");
        exact(1e5, PRESSURE, "bar", "NIST SP 811, Appendix B.8: bar = 1.0 E+05 Pa, exact");
        exact(1e2, PRESSURE, "mbar", "NIST SP 811, Appendix B.8: millibar = 1.0 E+02 Pa, exact");
        nist("6.894757E+03", PRESSURE_DIFFERENCE, "psi"); // NIST SP 811, Appendix B.8: psi
        nist("2.49082E+02", PRESSURE_DIFFERENCE, "in. w.c."); // NIST SP 811, Appendix B.8: inch of water (39.2 °F)
        nist("9.80638", PRESSURE_DIFFERENCE, "mm w.c."); // NIST SP 811, Appendix B.8: centimeter of water (4 °C) 9.80638 E+01 Pa, ÷ 10
    }

    @Test
    void gaugePressureAddsTheStandardAtmosphere() {
        // NIST SP 811, Appendix B.8: 1 psi = 6.894757 E+03 Pa, standard atmosphere 1.01325 E+05 Pa (exact)
        Reference.assertRelative(101325 + 6.894757e3, Quantities.fromUnit(1, PRESSURE, "psig"), 5e-8,
                "1 psig = 1 psi + 1 atm (NIST SP 811, Appendix B.8)");
        Reference.assertRelative(101325 + 1e5, Quantities.fromUnit(1, PRESSURE, "barg"), EXACT,
                "1 barg = 1 bar + 1 atm (NIST SP 811, Appendix B.8)");
    }

    @Test
    void energiesAndPowers() {
        exact(1.05505585262e3, ENERGY, "Btu", "NIST SP 811, Appendix B.8, note 9: Btu_IT = 1.05505585262 E+03 J, exact");
        exact(4.1868e3, ENERGY, "kcal", "NIST SP 811, Appendix B.8: kilocalorie_IT = 4.1868 E+03 J, exact");
        exact(3.6e6, ENERGY, "kWh", "NIST SP 811, Appendix B.8: kilowatt hour = 3.6 E+06 J, exact");
        exact(3.6e3, ENERGY, "Wh", "NIST SP 811, Appendix B.8: watt hour = 3.6 E+03 J, exact");
        nist("2.930711E-01", HEAT_FLOW, "Btu/h"); // NIST SP 811, Appendix B.8: Btu_IT per hour
        nist("3.516853E+03", HEAT_FLOW, "TR"); // NIST SP 811, Appendix B.8: ton of refrigeration (12 000 Btu_IT/h)
        nist("2.930711E+02", HEAT_FLOW, "MBH"); // NIST SP 811, Appendix B.8: Btu_IT per hour, × 1000
        nist("7.456999E+02", POWER, "hp"); // NIST SP 811, Appendix B.8: horsepower (550 ft·lbf/s)
        // kilocalorie_IT per hour: NIST SP 811, Appendix B.8 kilocalorie_IT 4.1868 E+03 J (exact) / 3600 s = 1.163 W
        Reference.assertRelative(1.163, Quantities.fromUnit(1, HEAT_FLOW, "kcal/h"), 1e-14,
                "NIST SP 811, Appendix B.8: kilocalorie_IT / hour = 1.163 W");
    }

    @Test
    void flowsAndVelocities() {
        nist("4.719474E-04", VOLUME_FLOW, "cfm"); // NIST SP 811, Appendix B.8: cubic foot per minute
        nist("6.30902E-05", VOLUME_FLOW, "gpm"); // NIST SP 811, Appendix B.8: gallon (U.S.) per minute
        exact(5.08e-3, VELOCITY, "ft/min", "NIST SP 811, Appendix B.8: foot per minute = 5.08 E-03 m/s, exact");
        exact(3.048e-1, VELOCITY, "ft/s", "NIST SP 811, Appendix B.8: foot per second = 3.048 E-01 m/s, exact");
        nist("2.777778E-01", VELOCITY, "km/h"); // NIST SP 811, Appendix B.8: kilometer per hour
        nist("1.259979E-04", MASS_FLOW, "lb/h"); // NIST SP 811, Appendix B.8: pound per hour
        nist("7.559873E-03", MASS_FLOW, "lb/min"); // NIST SP 811, Appendix B.8: pound per minute
        nist("4.535924E-01", MASS_FLOW, "lb/s"); // NIST SP 811, Appendix B.8: pound per second
    }

    @Test
    void thermalUnits() {
        nist("5.678263", HEAT_TRANSFER_COEFFICIENT, "Btu/(h·ft2·°F)"); // NIST SP 811, Appendix B.8: Btu_IT/(h·ft2·°F)
        nist("1.730735", CONDUCTIVITY, "Btu/(h·ft·°F)"); // NIST SP 811, Appendix B.8: Btu_IT·ft/(h·ft2·°F)
        nist("1.761102E-01", FOULING_RESISTANCE, "h·ft2·°F/Btu"); // NIST SP 811, Appendix B.8: °F·h·ft2/Btu_IT
        nist("1.895634", THERMAL_RESISTANCE, "°F·h/Btu"); // NIST SP 811, Appendix B.8: °F·h/Btu_IT
        // NIST SP 811, Appendix B.8: Btu_IT per degree Fahrenheit = 1.899101 E+03 J/K; per hour ÷ 3600 s
        Reference.assertRelative(1.899101e3 / 3600, Quantities.fromUnit(1, UA, "Btu/(h·°F)"), 3e-7,
                "NIST SP 811, Appendix B.8: Btu_IT/°F = 1.899101 E+03 J/K, divided by 3600 s/h");
        exact(2.326e3, SPECIFIC_ENTHALPY, "Btu/lb", "NIST SP 811, Appendix B.8: Btu_IT per pound = 2.326 E+03 J/kg, exact");
        exact(4.1868e3, SPECIFIC_HEAT, "Btu/(lb·°F)",
                "NIST SP 811, Appendix B.8: Btu_IT per pound degree Fahrenheit = 4.1868 E+03 J/(kg·K), exact");
        nist("1.601846E+01", DENSITY, "lb/ft3"); // NIST SP 811, Appendix B.8: pound per cubic foot
        exact(1e3, DENSITY, "g/cm3", "NIST SP 811, Appendix B.8: gram per cubic centimeter = 1.0 E+03 kg/m3, exact");
        nist("4.133789E-04", VISCOSITY, "lb/(ft·h)"); // NIST SP 811, Appendix B.8: pound per foot hour
        exact(1e-3, VISCOSITY, "cP", "NIST SP 811, Appendix B.8: centipoise = 1.0 E-03 Pa·s, exact");
        exact(3600, TIME, "h", "NIST SP 811, Appendix B.8: hour = 3.6 E+03 s, exact");
    }

    @Test
    void temperatureScales() {
        // NIST SP 811, Appendix B.8/B.9: T/K = t/°C + 273.15; T/K = (t/°F + 459.67)/1.8; T/K = (T/°R)/1.8
        Reference.assertRelative(273.15, Quantities.fromUnit(0, TEMPERATURE, "°C"), EXACT, "0 °C (NIST SP 811, B.8)");
        Reference.assertRelative((100 + 459.67) / 1.8, Quantities.fromUnit(100, TEMPERATURE, "°F"), 1e-15,
                "100 °F (NIST SP 811, Appendix B.8)");
        Reference.assertRelative(100 / 1.8, Quantities.fromUnit(100, TEMPERATURE, "°R"), 1e-15,
                "100 °R (NIST SP 811, Appendix B.8)");
        nist("5.555556E-01", TEMPERATURE_DIFFERENCE, "°F"); // NIST SP 811, Appendix B.8: degree Fahrenheit (interval)
        nist("5.555556E-01", TEMPERATURE_DIFFERENCE, "R"); // NIST SP 811, Appendix B.8: degree Rankine (interval)
        exact(1, TEMPERATURE_DIFFERENCE, "°C", "NIST SP 811, Appendix B.8: degree Celsius (interval) = 1.0 K, exact");
    }

    @Test
    void finDensityUsesTheInternationalInch() {
        // NIST SP 811, Appendix B.8: inch = 2.54 E-02 m, exact; 1 fpi is one fin per inch
        exact(2.54e-2, FIN_PITCH, "fpi", "1 fpi = pitch of 1 inch (NIST SP 811, Appendix B.8)");
    }

    @Test
    void commonPracticeCheckValues() {
        // NIST SP 811, Appendix B.8: foot pound-force = 1.355818 J; 1 Btu ~ 778.17 ft·lbf (common practice)
        double ftLbf = 1.355818;
        Reference.assertRelative(778, Quantities.fromUnit(1, ENERGY, "Btu") / ftLbf, 1e-3,
                "1 Btu ~ 778 ft·lbf (common practice)");
        Reference.assertRelative(4190, Quantities.fromUnit(1, ENERGY, "kcal"), 1e-3, "1 kcal ~ 4.19 kJ (common practice)");
        Reference.assertRelative(3517, Quantities.fromUnit(1, HEAT_FLOW, "ton"), 1e-4,
                "1 ton of refrigeration ~ 3.517 kW (common practice)");
        Reference.assertRelative(12000 * Quantities.fromUnit(1, HEAT_FLOW, "Btu/h"),
                Quantities.fromUnit(1, HEAT_FLOW, "TR"), 1e-15, "1 TR = 12 000 Btu/h (common practice)");
    }
}
