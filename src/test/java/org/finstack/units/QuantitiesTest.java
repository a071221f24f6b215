package org.finstack.units;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.finstack.units.Dimension.DIMENSIONLESS;
import static org.finstack.units.Dimension.FIN_PITCH;
import static org.finstack.units.Dimension.FOULING_RESISTANCE;
import static org.finstack.units.Dimension.HEAT_FLOW;
import static org.finstack.units.Dimension.HEAT_TRANSFER_COEFFICIENT;
import static org.finstack.units.Dimension.LENGTH;
import static org.finstack.units.Dimension.MASS_FLOW;
import static org.finstack.units.Dimension.POWER;
import static org.finstack.units.Dimension.PRESSURE;
import static org.finstack.units.Dimension.PRESSURE_DIFFERENCE;
import static org.finstack.units.Dimension.TEMPERATURE;
import static org.finstack.units.Dimension.TEMPERATURE_DIFFERENCE;
import static org.finstack.units.Dimension.VELOCITY;
import static org.finstack.units.Dimension.VOLUME_FLOW;
import static org.finstack.units.UnitSystem.SI;
import static org.finstack.units.UnitSystem.US;

import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/**
 * Reading and writing quantities: spelling variants, conventions (gauge pressure, temperature
 * differences, fin density), display, and the errors. Expected values are built from the NIST
 * SP 811, Appendix B.8 factors (inch 0.0254 m, foot 0.3048 m, pound 0.45359237 kg, psi
 * 6894.757 Pa, Btu_IT 1055.05585262 J, standard atmosphere 101325 Pa, all but psi exact).
 */
class QuantitiesTest {

    private static final double TIGHT = 1e-12;
    private static final double INCH = 0.0254; // NIST SP 811, Appendix B.8, exact
    private static final double FOOT = 0.3048; // NIST SP 811, Appendix B.8, exact
    private static final double BTU_PER_HOUR = 1055.05585262 / 3600; // NIST SP 811, Appendix B.8, exact Btu_IT
    private static final double PSI = 0.45359237 * 9.80665 / (INCH * INCH); // NIST SP 811, Appendix B.8: 6.894757 E+03 Pa
    private static final double ATM = 101325; // NIST SP 811, Appendix B.8, exact

    private static double p(String text, Dimension d) {
        return Quantities.parse("field", text, d);
    }

    private static InputException error(String field, String text, Dimension d) {
        try {
            Quantities.parse(field, text, d);
        } catch (InputException e) {
            return e;
        }
        throw new AssertionError("no error for \"" + text + "\" as " + d);
    }

    @Test
    void javadocExample() {
        // worked example of the Quantities class Javadoc: 12 fpi is a pitch of 0.0254/12 m (NIST SP 811 inch)
        double pitch = Quantities.parse("coil.finPitch", "12 fpi", FIN_PITCH);
        Reference.assertRelative(0.00211666667, pitch, 3e-9, "12 fpi (Quantities Javadoc, printed to 9 figures)");
        assertThat(Quantities.format(0.00211666667, FIN_PITCH, SI)).isEqualTo("2.117 mm");
    }

    @Test
    void lengthsWithAndWithoutSpace() {
        Reference.assertRelative(0.00952, p("9.52 mm", LENGTH), TIGHT, "9.52 mm");
        Reference.assertRelative(0.00952, p("9.52mm", LENGTH), TIGHT, "9.52mm");
        Reference.assertRelative(0.00952, p("  9.52   mm ", LENGTH), TIGHT, "spaces");
        Reference.assertRelative(0.375 * INCH, p("0.375 in", LENGTH), TIGHT, "0.375 in");
        Reference.assertRelative(0.375 * INCH, p("0.375\"", LENGTH), TIGHT, "0.375\"");
        Reference.assertRelative(0.375 * INCH, p(".375 in.", LENGTH), TIGHT, ".375 in.");
        Reference.assertRelative(2 * FOOT, p("2'", LENGTH), TIGHT, "2'");
        Reference.assertRelative(2 * FOOT, p("2 ft", LENGTH), TIGHT, "2 ft");
        Reference.assertRelative(1.2e-4, p("120 µm", LENGTH), TIGHT, "120 µm");
        Reference.assertRelative(1.2e-4, p("120 um", LENGTH), TIGHT, "120 um");
        Reference.assertRelative(0.5, p("0.5", LENGTH), TIGHT, "bare number is metres");
        Reference.assertRelative(-0.5, p("-0.5 m", LENGTH), TIGHT, "sign");
    }

    @Test
    void exponentsAndCompositeSpellings() {
        Reference.assertRelative(1e-4, p("1e-4 m2 K/W", FOULING_RESISTANCE), TIGHT, "1e-4 m2 K/W");
        Reference.assertRelative(1e-4, p("1E-4 m²·K/W", FOULING_RESISTANCE), TIGHT, "m²·K/W");
        Reference.assertRelative(1e-4, p("0.1 m2K/kW", FOULING_RESISTANCE), TIGHT, "m2K/kW");
        // h·ft2·°F/Btu = 3600 × 0.3048² × (5/9) / 1055.05585262 m2·K/W (NIST SP 811, Appendix B.8: 0.1761102)
        double usFouling = 3600 * FOOT * FOOT / 1.8 / 1055.05585262;
        for (String s : new String[] {"0.001 h ft2 F/Btu", "0.001 hr·ft²·°F/Btu", "0.001 h-ft2-F/Btu",
            "0.001 (h ft2 °F)/Btu", "0.001 ft2·h·°F/Btu", "0.001 HR FT2 F/BTU"}) {
            Reference.assertRelative(0.001 * usFouling, p(s, FOULING_RESISTANCE), TIGHT, s);
        }
        for (String s : new String[] {"50 W/(m2 K)", "50 W/m2K", "50 W/m2-K", "50 W/(m^2*K)", "50 W/m²K",
            "50 W/(m²·K)", "50 W/m2.K", "50 W/(m2 °C)", "50W/m2K"}) {
            Reference.assertRelative(50, p(s, HEAT_TRANSFER_COEFFICIENT), TIGHT, s);
        }
        // Btu/(h·ft2·°F) = 5.678263 W/(m2·K) (NIST SP 811, Appendix B.8)
        Reference.assertRelative(10 * 5.678263, p("10 Btu/hr-ft2-F", HEAT_TRANSFER_COEFFICIENT), 1e-7, "Btu/hr-ft2-F");
        Reference.assertRelative(10 * 5.678263, p("10 Btu/(h·ft²·°F)", HEAT_TRANSFER_COEFFICIENT), 1e-7, "Btu/(h·ft²·°F)");
    }

    @Test
    void temperaturesOnEveryScale() {
        // NIST SP 811, Appendix B.8: T/K = t/°C + 273.15 = (t/°F + 459.67)/1.8
        Reference.assertRelative(273.15, p("32 F", TEMPERATURE), TIGHT, "32 F = 273.15 K");
        Reference.assertRelative(373.15, p("212 °F", TEMPERATURE), TIGHT, "212 °F = 373.15 K");
        Reference.assertRelative(p("-40 C", TEMPERATURE), p("-40 F", TEMPERATURE), TIGHT, "-40 C = -40 F");
        Reference.assertRelative(318.15, p("45 C", TEMPERATURE), TIGHT, "45 C");
        Reference.assertRelative(318.15, p("45 °C", TEMPERATURE), TIGHT, "45 °C");
        Reference.assertRelative(318.15, p("45 degC", TEMPERATURE), TIGHT, "45 degC");
        Reference.assertRelative(318.15, p("45 deg C", TEMPERATURE), TIGHT, "45 deg C");
        Reference.assertRelative(318.15, p("113 degF", TEMPERATURE), TIGHT, "113 degF");
        Reference.assertRelative(273.15, p("491.67 R", TEMPERATURE), TIGHT, "491.67 R");
        Reference.assertRelative(300, p("300", TEMPERATURE), TIGHT, "bare number is kelvin");
        Reference.assertRelative(5, p("5 K", TEMPERATURE), TIGHT, "5 K as a temperature is 5 kelvin absolute");
    }

    @Test
    void temperatureDifferencesHaveNoOffset() {
        // NIST SP 811, Appendix B.8: degree Fahrenheit (interval) = 5.555556 E-01 K
        for (String s : new String[] {"9 °F", "9 F", "9 degF", "9 R", "9 °R", "9 delta F", "9 ΔF", "9 Δ°F"}) {
            Reference.assertRelative(5, p(s, TEMPERATURE_DIFFERENCE), TIGHT, s);
        }
        for (String s : new String[] {"5 K", "5 °C", "5 C", "5 delta C", "5 ΔK", "5"}) {
            Reference.assertRelative(5, p(s, TEMPERATURE_DIFFERENCE), TIGHT, s);
        }
    }

    @Test
    void finPitchFromLengthOrDensity() {
        Reference.assertRelative(INCH / 12, p("12 fpi", FIN_PITCH), TIGHT, "12 fpi");
        Reference.assertRelative(INCH / 12, p("12 FPI", FIN_PITCH), TIGHT, "12 FPI");
        Reference.assertRelative(INCH / 12, p("12 fins per inch", FIN_PITCH), TIGHT, "fins per inch");
        Reference.assertRelative(INCH / 12, p("12 fins/in", FIN_PITCH), TIGHT, "fins/in");
        Reference.assertRelative(0.0021, p("2.1 mm", FIN_PITCH), TIGHT, "2.1 mm");
        Reference.assertRelative(1.0 / 472, p("472 fins/m", FIN_PITCH), TIGHT, "472 fins/m");
        assertThatThrownBy(() -> p("472 fpm", FIN_PITCH)).as("fpm is a velocity in the trade (common practice)")
                .isInstanceOf(InputException.class);
        assertThat(error("coil.finPitch", "0 fpi", FIN_PITCH).msg()).isEqualTo(Msg.NOT_POSITIVE);
        assertThat(error("coil.finPitch", "-12 fpi", FIN_PITCH).msg()).isEqualTo(Msg.NOT_POSITIVE);
        assertThat(Quantities.toUnit(INCH / 12, FIN_PITCH, "fpi")).isCloseTo(12, org.assertj.core.data.Offset.offset(1e-12));
    }

    @Test
    void flowsAndVelocities() {
        double cfm = FOOT * FOOT * FOOT / 60; // NIST SP 811, Appendix B.8: 4.719474 E-04 m3/s
        Reference.assertRelative(2000 * cfm, p("2000 cfm", VOLUME_FLOW), TIGHT, "2000 cfm");
        Reference.assertRelative(2000 * cfm, p("2000 CFM", VOLUME_FLOW), TIGHT, "2000 CFM");
        Reference.assertRelative(2000 * cfm, p("2000 ft³/min", VOLUME_FLOW), TIGHT, "ft³/min");
        Reference.assertRelative(1.0, p("3600 m3/h", VOLUME_FLOW), TIGHT, "3600 m3/h");
        Reference.assertRelative(1.0, p("3600 m³/hr", VOLUME_FLOW), TIGHT, "3600 m³/hr");
        Reference.assertRelative(1e-3, p("1 L/s", VOLUME_FLOW), TIGHT, "1 L/s");
        Reference.assertRelative(1e-3, p("1 l/s", VOLUME_FLOW), TIGHT, "1 l/s");
        Reference.assertRelative(500 * 0.00508, p("500 fpm", VELOCITY), TIGHT, "500 fpm");
        Reference.assertRelative(500 * 0.00508, p("500 ft/min", VELOCITY), TIGHT, "500 ft/min");
        Reference.assertRelative(100 * 0.45359237 / 3600, p("100 lb/hr", MASS_FLOW), TIGHT, "100 lb/hr");
        Reference.assertRelative(100 * 0.45359237 / 3600, p("100 lbm/h", MASS_FLOW), TIGHT, "100 lbm/h");
    }

    @Test
    void heatFlows() {
        for (String s : new String[] {"42000 Btu/h", "42000 Btuh", "42000 BTU/hr", "42000 Btu/hr", "42000 BTUH",
            "42 MBH", "42 Mbh", "3.5 TR", "3.5 ton", "3.5 tons"}) {
            Reference.assertRelative(42000 * BTU_PER_HOUR, p(s, HEAT_FLOW), TIGHT, s);
        }
        Reference.assertRelative(12300, p("12.3 kW", HEAT_FLOW), TIGHT, "12.3 kW");
        Reference.assertRelative(12300, p("12.3 KW", HEAT_FLOW), TIGHT, "12.3 KW");
        Reference.assertRelative(2e6, p("2 MW", HEAT_FLOW), TIGHT, "2 MW");
        // kcal_IT/h = 4186.8/3600 W = 1.163 W (NIST SP 811, Appendix B.8: kilocalorie_IT = 4.1868 E+03 J)
        Reference.assertRelative(1163, p("1000 kcal/h", HEAT_FLOW), TIGHT, "1000 kcal/h");
        // horsepower: NIST SP 811, Appendix B.8: 7.456999 E+02 W; power only, not a heat flow
        Reference.assertRelative(745.6999, p("1 hp", POWER), 2e-7, "1 hp");
        assertThat(error("fan.power", "1 hp", HEAT_FLOW).msg()).isEqualTo(Msg.UNKNOWN_UNIT);
    }

    @Test
    void pressureIsAbsoluteAndGaugeAddsTheStandardAtmosphere() {
        Reference.assertRelative(3 * PSI + ATM, p("3 psig", PRESSURE), TIGHT, "3 psig");
        Reference.assertRelative(3 * PSI + ATM, p("3 psi(g)", PRESSURE), TIGHT, "3 psi(g)");
        Reference.assertRelative(3 * PSI, p("3 psia", PRESSURE), TIGHT, "3 psia");
        Reference.assertRelative(3 * PSI, p("3 psi", PRESSURE), TIGHT, "plain psi is absolute");
        for (String s : new String[] {"1 barg", "1 bar(g)", "1 bar g", "100 kPa(g)", "100 kPag", "0.1 MPa(g)"}) {
            Reference.assertRelative(1e5 + ATM, p(s, PRESSURE), TIGHT, s);
        }
        for (String s : new String[] {"101.325 kPa", "101.325 kPa(a)", "1.01325 bar(a)", "1.01325 bara", "1 atm",
            "0.101325 MPa", "1013.25 mbar", "101325 Pa", "101325"}) {
            Reference.assertRelative(ATM, p(s, PRESSURE), TIGHT, s);
        }
    }

    @Test
    void pressureDifferenceInInchesOfWaterAndNoGauge() {
        // NIST SP 811, Appendix B.8: inch of water (39.2 °F) = 2.49082 E+02 Pa
        for (String s : new String[] {"0.5 in. w.c.", "0.5 inH2O", "0.5 in wc", "0.5 in WC", "0.5 \"wc", "0.5 in. WG",
            "0.5 iwc", "0.5 in H2O"}) {
            Reference.assertRelative(0.5 * 249.082, p(s, PRESSURE_DIFFERENCE), TIGHT, s);
        }
        Reference.assertRelative(10 * 9.80638, p("10 mm w.c.", PRESSURE_DIFFERENCE), TIGHT, "mm w.c. (4 °C)");
        Reference.assertRelative(2 * PSI, p("2 psi", PRESSURE_DIFFERENCE), TIGHT, "2 psi");
        Reference.assertRelative(2 * PSI, p("2 psid", PRESSURE_DIFFERENCE), TIGHT, "2 psid");
        Reference.assertRelative(150, p("1.5 mbar", PRESSURE_DIFFERENCE), TIGHT, "1.5 mbar");
        for (String s : new String[] {"3 psig", "1 barg", "1 bar(g)", "10 kPa(g)", "10 kPag"}) {
            InputException e = error("coil.airPressureDrop", s, PRESSURE_DIFFERENCE);
            assertThat(e.msg()).as(s).isEqualTo(Msg.UNKNOWN_UNIT);
            assertThat(e.field()).isEqualTo("coil.airPressureDrop");
        }
    }

    @Test
    void letterCaseIsIgnoredExceptBetweenMilliAndMega() {
        Reference.assertRelative(1000, p("1 kw", HEAT_FLOW), TIGHT, "kw");
        Reference.assertRelative(1e6, p("1 MW", HEAT_FLOW), TIGHT, "MW");
        assertThat(error("f", "1 mw", HEAT_FLOW).msg()).isEqualTo(Msg.UNKNOWN_UNIT);
        assertThat(error("f", "1 mpa", PRESSURE).msg()).isEqualTo(Msg.UNKNOWN_UNIT);
        assertThat(error("f", "9.52 MM", LENGTH).msg()).isEqualTo(Msg.UNKNOWN_UNIT);
        Reference.assertRelative(0.02, p("2 CM", LENGTH), TIGHT, "CM");
        Reference.assertRelative(1e-3, p("1 mPa·s", Dimension.VISCOSITY), TIGHT, "mPa·s");
        assertThat(error("f", "1 MPa·s", Dimension.VISCOSITY).msg()).isEqualTo(Msg.UNKNOWN_UNIT);
    }

    @Test
    void unknownUnitNamesTheFieldAndListsTheAcceptedUnits() {
        InputException e = error("coil.tubeOuterDiameter", "5 kg", LENGTH);
        assertThat(e.msg()).isEqualTo(Msg.UNKNOWN_UNIT);
        assertThat(e.field()).isEqualTo("coil.tubeOuterDiameter");
        assertThat(e.getMessage()).isEqualTo(
                "coil.tubeOuterDiameter: unknown unit in \"5 kg\"; accepted units: m, cm, mm, um, in, ft");
        assertThat(error("x", "5 furlongs", LENGTH).getMessage()).contains("accepted units: m, cm, mm");
        assertThat(error("x", "20 C", PRESSURE).getMessage()).contains("psig").contains("kPa(g)");
    }

    @Test
    void malformedNumbersAreRefused() {
        for (String s : new String[] {"abc mm", "mm", "9,52 mm", "1.2.3 mm", "NaN", "Infinity m", "- 5 mm", "e5 m",
            "1.e-", "1 2 mm"}) {
            InputException e = error("coil.finThickness", s, LENGTH);
            assertThat(e.field()).as(s).isEqualTo("coil.finThickness");
            assertThat(e.msg()).as(s).isIn(Msg.MALFORMED_QUANTITY, Msg.UNKNOWN_UNIT);
        }
        InputException e = error("coil.finThickness", "abc mm", LENGTH);
        assertThat(e.msg()).isEqualTo(Msg.MALFORMED_QUANTITY);
        assertThat(e.getMessage()).startsWith("coil.finThickness: cannot read \"abc mm\"");
        assertThat(error("f", "9,52 mm", LENGTH).msg()).isEqualTo(Msg.MALFORMED_QUANTITY);
        assertThat(error("f", "1.2.3 mm", LENGTH).msg()).isEqualTo(Msg.MALFORMED_QUANTITY);
        assertThat(error("f", "1 2 mm", LENGTH).msg()).isEqualTo(Msg.MALFORMED_QUANTITY);
    }

    @Test
    void missingAndNonFiniteAreRefused() {
        assertThat(error("f", null, LENGTH).msg()).isEqualTo(Msg.MISSING);
        assertThat(error("f", "   ", LENGTH).msg()).isEqualTo(Msg.MISSING);
        assertThat(error("f", "1e999 m", LENGTH).msg()).isEqualTo(Msg.NOT_A_NUMBER);
        assertThat(error("f", "1e308 MW", HEAT_FLOW).msg()).isEqualTo(Msg.NOT_A_NUMBER);
        assertThatThrownBy(() -> Quantities.fromUnit(Double.NaN, LENGTH, "mm")).isInstanceOf(InputException.class);
        assertThatThrownBy(() -> Quantities.format(Double.POSITIVE_INFINITY, LENGTH, SI))
                .isInstanceOf(InputException.class);
        assertThatThrownBy(() -> Quantities.format(0, FIN_PITCH, US)).isInstanceOf(InputException.class)
                .hasMessageContaining("greater than zero");
    }

    @Test
    void formatsInTheDefaultUnitsOfEachSystem() {
        assertThat(Quantities.format(0.00952, LENGTH, SI)).isEqualTo("9.52 mm");
        assertThat(Quantities.format(0.375 * INCH, LENGTH, US)).isEqualTo("0.375 in");
        assertThat(Quantities.format(0.00952, LENGTH, US)).isEqualTo("0.3748 in");
        assertThat(Quantities.format(318.15, TEMPERATURE, SI)).isEqualTo("45.0 °C");
        assertThat(Quantities.format(318.15, TEMPERATURE, US)).isEqualTo("113.0 °F");
        assertThat(Quantities.format(273.15, TEMPERATURE, SI)).isEqualTo("0.0 °C");
        assertThat(Quantities.format(5, TEMPERATURE_DIFFERENCE, SI)).isEqualTo("5 K");
        assertThat(Quantities.format(5, TEMPERATURE_DIFFERENCE, US)).isEqualTo("9 °F");
        assertThat(Quantities.format(12300, HEAT_FLOW, SI)).isEqualTo("12.3 kW");
        assertThat(Quantities.format(42000 * BTU_PER_HOUR, HEAT_FLOW, US)).isEqualTo("42000 Btu/h");
        assertThat(Quantities.format(INCH / 12, FIN_PITCH, US)).isEqualTo("12 fpi");
        assertThat(Quantities.format(INCH / 12, FIN_PITCH, SI)).isEqualTo("2.117 mm");
        assertThat(Quantities.format(ATM, PRESSURE, SI)).isEqualTo("101.3 kPa");
        assertThat(Quantities.format(ATM, PRESSURE, US)).isEqualTo("14.7 psia");
        assertThat(Quantities.format(124.541, PRESSURE_DIFFERENCE, US)).isEqualTo("0.5 in. w.c.");
        assertThat(Quantities.format(2000 * FOOT * FOOT * FOOT / 60, VOLUME_FLOW, US)).isEqualTo("2000 cfm");
        assertThat(Quantities.format(2.54, VELOCITY, US)).isEqualTo("500 ft/min");
        assertThat(Quantities.format(0.5, DIMENSIONLESS, SI)).isEqualTo("0.5");
        assertThat(Quantities.format(-1.5, LENGTH, SI, "m")).isEqualTo("-1.5 m");
    }

    @Test
    void formatsFourSignificantFiguresWithoutNoise() {
        assertThat(Quantities.format(0.1 + 0.2, LENGTH, SI, "m")).isEqualTo("0.3 m");
        assertThat(Quantities.format(123456, LENGTH, SI, "m")).isEqualTo("123500 m");
        assertThat(Quantities.format(1.23456e-3, LENGTH, SI, "m")).isEqualTo("0.001235 m");
        assertThat(Quantities.format(1.76e-5, LENGTH, SI, "m")).isEqualTo("1.76e-5 m");
        assertThat(Quantities.format(3e9, HEAT_FLOW, SI, "W")).isEqualTo("3e9 W");
        assertThat(Quantities.format(0, HEAT_FLOW, SI, "W")).isEqualTo("0 W");
        assertThat(Quantities.format(42000 * BTU_PER_HOUR, HEAT_FLOW, US, "Btuh")).isEqualTo("42000 Btu/h");
        assertThat(Quantities.format(-0.04, TEMPERATURE, SI, "K")).isEqualTo("0.0 K");
    }

    @Test
    void formatRefusesAForeignUnit() {
        InputException e = null;
        try {
            Quantities.format(1, LENGTH, SI, "kg");
        } catch (InputException ex) {
            e = ex;
        }
        assertThat(e).isNotNull();
        assertThat(e.field()).isEqualTo("unit");
        assertThat(e.msg()).isEqualTo(Msg.UNKNOWN_UNIT);
    }

    @Test
    void defaultUnitsFollowTheBrief() {
        assertThat(Quantities.defaultUnit(LENGTH, SI)).isEqualTo("mm");
        assertThat(Quantities.defaultUnit(LENGTH, US)).isEqualTo("in");
        assertThat(Quantities.defaultUnit(TEMPERATURE, SI)).isEqualTo("°C");
        assertThat(Quantities.defaultUnit(TEMPERATURE, US)).isEqualTo("°F");
        assertThat(Quantities.defaultUnit(TEMPERATURE_DIFFERENCE, SI)).isEqualTo("K");
        assertThat(Quantities.defaultUnit(TEMPERATURE_DIFFERENCE, US)).isEqualTo("°F");
        assertThat(Quantities.defaultUnit(VELOCITY, SI)).isEqualTo("m/s");
        assertThat(Quantities.defaultUnit(VELOCITY, US)).isEqualTo("ft/min");
        assertThat(Quantities.defaultUnit(VOLUME_FLOW, SI)).isEqualTo("m3/h");
        assertThat(Quantities.defaultUnit(VOLUME_FLOW, US)).isEqualTo("cfm");
        assertThat(Quantities.defaultUnit(HEAT_FLOW, SI)).isEqualTo("kW");
        assertThat(Quantities.defaultUnit(HEAT_FLOW, US)).isEqualTo("Btu/h");
        assertThat(Quantities.defaultUnit(PRESSURE, SI)).isEqualTo("kPa");
        assertThat(Quantities.defaultUnit(PRESSURE, US)).isEqualTo("psia");
        assertThat(Quantities.defaultUnit(PRESSURE_DIFFERENCE, SI)).isEqualTo("Pa");
        assertThat(Quantities.defaultUnit(PRESSURE_DIFFERENCE, US)).isEqualTo("in. w.c.");
        assertThat(Quantities.defaultUnit(FIN_PITCH, SI)).isEqualTo("mm");
        assertThat(Quantities.defaultUnit(FIN_PITCH, US)).isEqualTo("fpi");
    }

    @Test
    void acceptedListsStartWithTheSiUnitAndEveryDimensionHasOne() {
        for (Dimension d : Dimension.values()) {
            assertThat(Quantities.accepted(d)).as(d.name()).isNotEmpty().first().isEqualTo(d.siUnit());
            for (UnitSystem s : UnitSystem.values()) {
                assertThat(Quantities.accepted(d)).as(d + " " + s).contains(Quantities.defaultUnit(d, s));
            }
        }
        assertThat(Quantities.accepted(PRESSURE)).contains("Pa", "kPa", "MPa", "bar", "mbar", "psia", "atm", "psig",
                "barg", "kPa(g)");
        assertThat(Quantities.accepted(PRESSURE_DIFFERENCE)).contains("in. w.c.", "mm w.c.", "psi")
                .doesNotContain("psig", "barg", "kPa(g)");
        assertThat(Quantities.accepted(HEAT_FLOW)).contains("W", "kW", "MW", "Btu/h", "MBH", "TR", "kcal/h")
                .doesNotContain("hp");
        assertThat(Quantities.accepted(POWER)).containsAll(Quantities.accepted(HEAT_FLOW)).contains("hp");
    }

    @Test
    void citationNamesNistSp811() {
        assertThat(Quantities.SOURCE.reference()).contains("Special Publication 811").contains("B.8");
    }
}
