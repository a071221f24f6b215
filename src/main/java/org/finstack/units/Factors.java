package org.finstack.units;

/**
 * The defined values from which every non-SI unit of this package is built. Where NIST
 * Special Publication 811 (2008) marks a factor exact, the exact value is used and composite
 * units are derived from it, so that each composite factor agrees with the rounded value of
 * Appendix B.8 (which the tests check).
 */
final class Factors {

    private Factors() {
    }

    /** International inch [m]; exact (NIST SP 811, Appendix B.8: inch = 2.54 E-02 m). */
    static final double INCH = 0.0254;
    /** International foot [m]; exact (NIST SP 811, Appendix B.8: foot = 3.048 E-01 m). */
    static final double FOOT = 0.3048;
    /** International avoirdupois pound [kg]; exact (NIST SP 811, Appendix B.8, note 22: 0.45359237 kg). */
    static final double POUND = 0.45359237;
    /** Avoirdupois ounce = 1/16 pound [kg] (definition; NIST SP 811, Appendix B.8: 2.834952 E-02 kg). */
    static final double OUNCE = POUND / 16;
    /** US gallon = 231 in3 [m3] (definition; NIST SP 811, Appendix B.8: 3.785412 E-03 m3). */
    static final double US_GALLON = 231 * INCH * INCH * INCH;
    /** Standard acceleration of free fall [m/s2]; exact (NIST SP 811, Appendix B.8: 9.80665). */
    static final double STANDARD_GRAVITY = 9.80665;
    /** Pound-force [N] = pound × standard gravity (NIST SP 811, Appendix B.8: 4.448222 N). */
    static final double POUND_FORCE = POUND * STANDARD_GRAVITY;
    /** Pound-force per square inch [Pa] (NIST SP 811, Appendix B.8: 6.894757 E+03 Pa). */
    static final double PSI = POUND_FORCE / (INCH * INCH);
    /** Standard atmosphere [Pa]; exact (NIST SP 811, Appendix B.8: 1.01325 E+05 Pa; ISO 80000-4). */
    static final double STANDARD_ATMOSPHERE = 101325.0;
    /** Bar [Pa]; exact (NIST SP 811, Appendix B.8: 1.0 E+05 Pa). */
    static final double BAR = 1.0e5;
    /**
     * Inch of water at 39.2 °F (4 °C) [Pa] (NIST SP 811, Appendix B.8: 2.49082 E+02 Pa). The
     * 60 °F inch (2.4884 E+02 Pa) differs by 0.1 %; this package uses the 39.2 °F value throughout.
     */
    static final double INCH_OF_WATER = 249.082;
    /** Millimetre of water at 4 °C [Pa] (NIST SP 811, Appendix B.8: centimeter of water (4 °C) = 9.80638 E+01 Pa). */
    static final double MM_OF_WATER = 9.80638;
    /** International Table British thermal unit [J]; exact (NIST SP 811, Appendix B.8, note 9: 1.05505585262 E+03 J). */
    static final double BTU = 1055.05585262;
    /** International Table calorie [J]; exact (NIST SP 811, Appendix B.8: calorie_IT = 4.1868 J). */
    static final double CALORIE = 4.1868;
    /** Hour [s] (NIST SP 811, Appendix B.8: 3.6 E+03 s). */
    static final double HOUR = 3600.0;
    /** Minute [s] (NIST SP 811, Appendix B.8: 6.0 E+01 s). */
    static final double MINUTE = 60.0;
    /** Size of one degree Fahrenheit or Rankine [K] (NIST SP 811, Appendix B.8/B.9: T/K = (T/°R)/1.8). */
    static final double RANKINE = 1.0 / 1.8;
    /** Offset of the Celsius scale [K] (NIST SP 811, Appendix B.8: T/K = t/°C + 273.15). */
    static final double CELSIUS_ZERO = 273.15;
    /** Offset of the Fahrenheit scale [°R] (NIST SP 811, Appendix B.8: T/K = (t/°F + 459.67)/1.8). */
    static final double FAHRENHEIT_ZERO = 459.67;
    /** Horsepower = 550 ft·lbf/s [W] (definition; NIST SP 811, Appendix B.8: 7.456999 E+02 W). */
    static final double HORSEPOWER = 550 * FOOT * POUND_FORCE;
    /** Ton of refrigeration = 12 000 Btu/h [W] (NIST SP 811, Appendix B.8: 3.516853 E+03 W). */
    static final double TON_OF_REFRIGERATION = 12000 * BTU / HOUR;
}
