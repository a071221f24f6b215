package org.finstack.fluid;

import static org.finstack.testing.Reference.assertRelative;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * R134a (Tillner-Roth &amp; Baehr 1994) against published saturation tables, and the worked example
 * of {@link HelmholtzFluid}'s Javadoc.
 */
class TillnerRothBaehr1994R134aTest {

    private final Fluid r134a = Fluids.byName("R134a");

    /** The example in the Javadoc of {@link HelmholtzFluid}, repeated verbatim. */
    @Test
    void javadocExample() {
        SaturationState s = Fluids.byName("R134a").saturationAtTemperature(273.15);
        assertEquals(292_803, s.bubblePressure(), 1);
        assertEquals(1294.78, s.liquid().density(), 0.01);
        assertEquals(14.428, s.vapour().density(), 0.001);
        assertEquals(198_603, s.latentHeat(), 1);
    }

    /**
     * "Saturation Table R 134a" (IIR reference state; rows at -100, -90, -80 degC), a published
     * saturation table whose header states: temperature [degC], pressure [kPa], densities [kg/m3],
     * enthalpies [kJ/kg], entropies [kJ/(kg K)]. Values printed to five significant figures.
     */
    @ParameterizedTest(name = "{0} degC")
    @CsvSource({
        "-100, 0.5594, 1582.40, 0.039694, 75.362, 336.85, 0.4354, 1.9456",
        "-90, 1.5241, 1555.80, 0.10236, 87.226, 342.76, 0.50201, 1.8972",
        "-80, 3.6719, 1529.00, 0.23429, 99.161, 348.83, 0.56544, 1.858",
    })
    void saturationTableLowTemperatures(double tC, double pKpa, double rhoL, double rhoV, double hL, double hV,
            double sL, double sV) {
        SaturationState s = r134a.saturationAtTemperature(273.15 + tC);
        String at = "R134a saturation table at " + tC + " degC";
        assertRelative(pKpa * 1e3, s.bubblePressure(), 1e-4, at + ": p");
        assertRelative(rhoL, s.liquid().density(), 1e-4, at + ": rho'");
        assertRelative(rhoV, s.vapour().density(), 1e-4, at + ": rho''");
        assertRelative(hL * 1e3, s.liquid().enthalpy(), 1e-4, at + ": h'");
        assertRelative(hV * 1e3, s.vapour().enthalpy(), 1e-4, at + ": h''");
        assertRelative(sL * 1e3, s.liquid().entropy(), 2e-4, at + ": s'");
        assertRelative(sV * 1e3, s.vapour().entropy(), 2e-4, at + ": s''");
    }

    /**
     * ASHRAE Handbook - Fundamentals, chapter 30 (Thermophysical Properties of Refrigerants),
     * table "Refrigerant 134a (1,1,1,2-Tetrafluoroethane) Properties of Saturated Liquid and
     * Saturated Vapor", rows 0 degC and 40 degC; values from memory.
     */
    @ParameterizedTest(name = "{0} degC")
    @CsvSource({
        "0, 292.80, 1294.8, 14.428, 200.00, 398.60",
        "40, 1016.6, 1146.7, 50.085, 256.41, 419.43",
    })
    void ashraeSaturationTable(double tC, double pKpa, double rhoL, double rhoV, double hL, double hV) {
        SaturationState s = r134a.saturationAtTemperature(273.15 + tC);
        String at = "ASHRAE R134a table at " + tC + " degC (from memory)";
        assertRelative(pKpa * 1e3, s.bubblePressure(), 1e-4, at + ": p");
        assertRelative(rhoL, s.liquid().density(), 1e-4, at + ": rho'");
        assertRelative(rhoV, s.vapour().density(), 1e-4, at + ": rho''");
        assertRelative(hL * 1e3, s.liquid().enthalpy(), 1e-4, at + ": h'");
        assertRelative(hV * 1e3, s.vapour().enthalpy(), 1e-4, at + ": h''");
        assertRelative((hV - hL) * 1e3, s.latentHeat(), 2e-4, at + ": latent heat");
    }

    /** IIR reference state: h' = 200 kJ/kg, s' = 1 kJ/(kg K) at 0 degC (IIR convention, common practice). */
    @Test
    void iirReferenceState() {
        SaturationState s = r134a.saturationAtTemperature(273.15);
        assertEquals(200_000, s.liquid().enthalpy(), 1e-6);
        assertEquals(1_000, s.liquid().entropy(), 1e-9);
    }
}
