package org.finstack.units;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/**
 * Conversions against reference data computed by scipy.constants (an independent implementation
 * of the same definitions), committed under src/test/resources/reference/units_*.csv by
 * scripts/gen_units_reference.py.
 */
class UnitsReferenceTest {

    /** Case numbers of units_factors.csv: the unit each row gives the SI value of (see the script). */
    private static final Map<Integer, Object[]> CASES = Map.ofEntries(
            Map.entry(1, new Object[] {Dimension.LENGTH, "in"}),
            Map.entry(2, new Object[] {Dimension.LENGTH, "ft"}),
            Map.entry(3, new Object[] {Dimension.MASS, "lb"}),
            Map.entry(4, new Object[] {Dimension.MASS, "oz"}),
            Map.entry(5, new Object[] {Dimension.VOLUME, "gal"}),
            Map.entry(6, new Object[] {Dimension.PRESSURE, "psia"}),
            Map.entry(7, new Object[] {Dimension.PRESSURE, "atm"}),
            Map.entry(8, new Object[] {Dimension.ENERGY, "Btu"}),
            Map.entry(9, new Object[] {Dimension.ENERGY, "kcal"}),
            Map.entry(10, new Object[] {Dimension.POWER, "hp"}),
            Map.entry(11, new Object[] {Dimension.HEAT_FLOW, "Btu/h"}),
            Map.entry(12, new Object[] {Dimension.HEAT_FLOW, "TR"}),
            Map.entry(13, new Object[] {Dimension.VOLUME_FLOW, "cfm"}),
            Map.entry(14, new Object[] {Dimension.VOLUME_FLOW, "gpm"}),
            Map.entry(15, new Object[] {Dimension.VELOCITY, "ft/min"}),
            Map.entry(16, new Object[] {Dimension.MASS_FLOW, "lb/h"}),
            Map.entry(17, new Object[] {Dimension.DENSITY, "lb/ft3"}),
            Map.entry(18, new Object[] {Dimension.SPECIFIC_ENTHALPY, "Btu/lb"}),
            Map.entry(19, new Object[] {Dimension.SPECIFIC_HEAT, "Btu/(lb·°F)"}),
            Map.entry(20, new Object[] {Dimension.HEAT_TRANSFER_COEFFICIENT, "Btu/(h·ft2·°F)"}),
            Map.entry(21, new Object[] {Dimension.FOULING_RESISTANCE, "h·ft2·°F/Btu"}),
            Map.entry(22, new Object[] {Dimension.CONDUCTIVITY, "Btu/(h·ft·°F)"}),
            Map.entry(23, new Object[] {Dimension.TEMPERATURE_DIFFERENCE, "°F"}));

    @Test
    void factorsAgreeWithScipyConstants() {
        List<double[]> rows = Reference.csv("/reference/units_factors.csv");
        assertThat(rows).hasSize(24);
        for (double[] r : rows) {
            int n = (int) r[0];
            if (n == 24) {
                // case 24: the pitch of twelve fins per inch, 0.0254/12 m (scipy.constants.inch / 12)
                Reference.assertRelative(r[1], Quantities.parse("finPitch", "12 fpi", Dimension.FIN_PITCH), 1e-12,
                        "12 fpi (units_factors.csv case 24, scipy.constants)");
                continue;
            }
            Object[] c = CASES.get(n);
            Dimension d = (Dimension) c[0];
            String unit = (String) c[1];
            Reference.assertRelative(r[1], Quantities.fromUnit(1, d, unit), 1e-12,
                    "1 " + unit + " in " + d.siUnit() + " (units_factors.csv case " + n + ", scipy.constants)");
        }
    }

    @Test
    void temperatureScalesAgreeWithScipyConvertTemperature() {
        List<double[]> rows = Reference.csv("/reference/units_temperature.csv");
        assertThat(rows).hasSizeGreaterThan(10);
        for (double[] r : rows) {
            double c = r[0];
            double k = r[1];
            double f = r[2];
            double ra = r[3];
            String ctx = " (units_temperature.csv, scipy.constants.convert_temperature, t = " + c + " °C)";
            Reference.assertRelative(k, Quantities.fromUnit(c, Dimension.TEMPERATURE, "°C"), 1e-12, "°C to K" + ctx);
            Reference.assertRelative(k, Quantities.fromUnit(f, Dimension.TEMPERATURE, "°F"), 1e-12, "°F to K" + ctx);
            Reference.assertRelative(k, Quantities.fromUnit(ra, Dimension.TEMPERATURE, "°R"), 1e-12, "°R to K" + ctx);
            assertThat(Math.abs(Quantities.toUnit(k, Dimension.TEMPERATURE, "°F") - f)).as("K to °F" + ctx)
                    .isLessThan(1e-9);
            assertThat(Math.abs(Quantities.toUnit(k, Dimension.TEMPERATURE, "°C") - c)).as("K to °C" + ctx)
                    .isLessThan(1e-9);
            assertThat(Math.abs(Quantities.toUnit(k, Dimension.TEMPERATURE, "°R") - ra)).as("K to °R" + ctx)
                    .isLessThan(1e-9);
        }
    }
}
