package org.finstack.fluid;

import static org.finstack.testing.Reference.assertRelative;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.finstack.fluid.eos.HelmholtzEos;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Each equation of state against constants published with it (critical point, normal boiling
 * point, triple point), and its behaviour close to the critical point.
 */
class FluidConstantsTest {

    /**
     * The critical point stated in each paper (from memory): the equation's pressure at the
     * published critical temperature and density must give the published critical pressure.
     * A mistyped coefficient shows here first.
     */
    @ParameterizedTest(name = "{0}")
    @CsvSource({
        "R134a, 374.18, 508.0, 4.05629e6",     // Tillner-Roth & Baehr 1994 (from memory)
        "R32, 351.255, 424.0, 5.782e6",         // Tillner-Roth & Yokozeki 1997 (from memory)
        "R125, 339.173, 573.582, 3.6177e6",     // Lemmon & Jacobsen 2005, 4.779 mol/dm3 (from memory)
        "R290, 369.89, 220.478, 4.2512e6",      // Lemmon, McLinden & Wagner 2009, 5.0 mol/dm3 (from memory)
        "R600a, 407.817, 225.5, 3.629e6",       // Buecker & Wagner 2006 (from memory)
        "R717, 405.56, 233.25, 11.3634e6",      // Gao et al. 2020, 13.696 mol/dm3 (from memory)
        "R1234yf, 367.85, 475.55, 3.3822e6",    // Richter, McLinden & Lemmon 2011 (from memory)
        "R1234ze(E), 382.513, 489.24, 3.6349e6", // Thol & Lemmon 2016, 4.29 mol/dm3 (from memory)
        "R22, 369.295, 523.84, 4.99e6",         // Kamei, Beyerlein & Jacobsen 1995 (from memory)
        "R143a, 345.857, 431.0, 3.761e6",       // Lemmon & Jacobsen 2000 (from memory)
        "R744, 304.1282, 467.6, 7.3773e6",      // Span & Wagner 1996 (from memory)
    })
    void criticalPressureFromPublishedCriticalPoint(String name, double tc, double rhoc, double pc) {
        HelmholtzEos eos = ((HelmholtzFluid) Fluids.byName(name)).equationOfState();
        assertRelative(pc, eos.pressure(tc, rhoc), 5e-4, name + ": p(Tc, rho_c) against the published pc");
    }

    /** Normal boiling points (saturation at 101.325 kPa), degC; from memory (common practice). */
    @ParameterizedTest(name = "{0}")
    @CsvSource({
        "R134a, -26.07", "R32, -51.65", "R125, -48.09", "R290, -42.11", "R600a, -11.75", "R717, -33.33",
        "R1234ze(E), -18.97", "R22, -40.81", "R143a, -47.24", "R1270, -47.62",
    })
    void normalBoilingPoint(String name, double tbC) {
        double t = Fluids.byName(name).saturationAtPressure(101_325).bubbleTemperature();
        assertEquals(tbC, t - 273.15, 0.02, name + " normal boiling point (from memory)");
    }

    /** Span &amp; Wagner 1996: triple point 216.592 K, 0.51795 MPa (from memory). */
    @Test
    void carbonDioxideTriplePoint() {
        FluidInfo info = Fluids.byName("R744").info();
        assertEquals(216.592, info.tripleTemperature(), 1e-9);
        assertRelative(0.51795e6, info.triplePressure(), 2e-4, "R744 triple-point pressure (Span & Wagner 1996)");
    }

    static java.util.List<String> fluids() {
        return Fluids.names();
    }

    /** Saturation converges up to 0.01 K below Tc, with both densities closing on rho_c. */
    @ParameterizedTest
    @MethodSource("fluids")
    void saturationCloseToCriticalPoint(String name) {
        Fluid f = Fluids.byName(name);
        FluidInfo i = f.info();
        SaturationState s = f.saturationAtTemperature(i.criticalTemperature() - 0.01);
        assertTrue(s.liquid().density() > i.criticalDensity() && s.vapour().density() < i.criticalDensity(),
                name + ": rho' > rho_c > rho''");
        assertRelative(i.criticalDensity(), s.liquid().density(), 0.15, name + ": rho' near Tc");
        assertRelative(i.criticalDensity(), s.vapour().density(), 0.15, name + ": rho'' near Tc");
        assertRelative(i.criticalPressure(), s.bubblePressure(), 1e-3, name + ": p' near Tc");
        assertTrue(s.latentHeat() > 0, name + ": latent heat positive near Tc");
    }
}
