package org.finstack.fluid;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.IntStream;
import org.finstack.core.FinstackException;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.OutOfRangeException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The registry, the fluid information and the refusals of bad or out-of-range input. */
class FluidsTest {

    @ParameterizedTest(name = "{0}")
    @CsvSource({
        "R134a, R134a", "R-134a, R134a", "r134a, R134a", "HFC-134a, R134a", "' R 134A ', R134a",
        "R-1234ze(E), R1234ze(E)", "r1234ze(e), R1234ze(E)", "R1234ZE(E), R1234ze(E)", "R-1234yf, R1234yf",
        "R-744, R744", "CO2, R744", "ammonia, R717", "R-717, R717", "propane, R290", "R-600a, R600a",
        "R-22, R22", "R-32, R32", "R-125, R125", "R-143a, R143a", "R-1270, R1270", "propylene, R1270",
    })
    void acceptsTradeSpellings(String given, String canonical) {
        assertEquals(canonical, Fluids.byName(given).name());
    }

    @Test
    void unknownNameNamesTheFieldAndTheAcceptedNames() {
        InputException e = assertThrows(InputException.class, () -> Fluids.byName("R-12"));
        assertEquals("refrigerant.fluid", e.field());
        assertEquals(Msg.UNKNOWN_NAME, e.msg());
        assertThat(e.getMessage()).contains("R-12").contains("R134a").contains("R1234ze(E)");
        assertThrows(InputException.class, () -> Fluids.byName(null));
    }

    @Test
    void loadsEachFluidOnceAndSharesIt() {
        List<Fluid> loaded = IntStream.range(0, 32).parallel().mapToObj(i -> Fluids.byName("R-32")).toList();
        for (Fluid f : loaded) {
            assertSame(loaded.get(0), f);
        }
        assertSame(Fluids.byName("R32"), Fluids.byName("r-32"));
    }

    @Test
    void allFluidsHaveCompleteInformation() {
        List<Fluid> all = Fluids.all();
        assertEquals(12, all.size());
        for (Fluid f : all) {
            FluidInfo i = f.info();
            String n = f.name();
            assertEquals(n, i.name());
            assertTrue(i.minTemperature() < i.criticalTemperature() && i.criticalTemperature() < i.maxTemperature(), n);
            assertTrue(i.triplePressure() > 0 && i.triplePressure() < i.criticalPressure(), n);
            assertTrue(i.molarMass() > 0.01 && i.molarMass() < 0.2, n);
            assertTrue(i.gwp100() >= 0, n);
            assertThat(i.safetyClass()).matches("[AB][123]L?");
            assertThat(i.gwpBasis()).contains("AR4");
            assertThat(i.equationOfState().reference()).isNotBlank();
            assertThat(i.referenceState()).contains("IIR");
        }
    }

    /** Safety classes per ANSI/ASHRAE Standard 34 and GWP per IPCC AR4 (common practice, from memory). */
    @ParameterizedTest(name = "{0}")
    @CsvSource({"R134a, A1, 1430", "R32, A2L, 675", "R290, A3, 3", "R717, B2L, 0", "R1234yf, A2L, 4", "R744, A1, 1"})
    void safetyClassAndGwp(String name, String safety, double gwp) {
        FluidInfo i = Fluids.byName(name).info();
        assertEquals(safety, i.safetyClass());
        assertEquals(gwp, i.gwp100());
    }

    @Test
    void refusesStatesOutsideTheValidRange() {
        Fluid f = Fluids.byName("R134a");
        OutOfRangeException cold = assertThrows(OutOfRangeException.class, () -> f.at(InputPair.TP, 150, 1e5));
        assertEquals(Msg.FLUID_OUT_OF_RANGE, cold.msg());
        assertThat(cold.getMessage()).isEqualTo("R134a: T [K] = 150 is outside the valid range 169.85 K to 455 K");
        assertThrows(OutOfRangeException.class, () -> f.at(InputPair.TP, 300, 80e6));
        assertThrows(OutOfRangeException.class, () -> f.at(InputPair.TP, 300, -1));
        assertThrows(OutOfRangeException.class, () -> f.saturationAtTemperature(380));
        assertThrows(OutOfRangeException.class, () -> f.saturationAtPressure(5e6));
        assertThrows(OutOfRangeException.class, () -> f.saturationAtPressure(100));
        assertThrows(OutOfRangeException.class, () -> f.at(InputPair.PH, 1e5, -1e6));
        assertThrows(OutOfRangeException.class, () -> f.at(InputPair.PH, 1e5, 5e6));
    }

    @Test
    void refusesInputThatIsNotANumber() {
        Fluid f = Fluids.byName("R134a");
        InputException t = assertThrows(InputException.class, () -> f.at(InputPair.TP, Double.NaN, 1e5));
        assertEquals("temperature", t.field());
        assertEquals("pressure", assertThrows(InputException.class,
                () -> f.at(InputPair.PH, Double.POSITIVE_INFINITY, 2e5)).field());
        assertEquals("quality", assertThrows(InputException.class, () -> f.at(InputPair.TQ, 273.15, 1.5)).field());
        assertEquals("quality", assertThrows(InputException.class, () -> f.at(InputPair.PQ, 3e5, -0.1)).field());
        assertThrows(InputException.class, () -> f.at(null, 300, 1e5));
    }

    @Test
    void twoPhaseStateHasNoSinglePhaseProperties() {
        FluidState m = Fluids.byName("R134a").at(InputPair.TQ, 273.15, 0.5);
        assertEquals(Phase.TWO_PHASE, m.phase());
        assertEquals(0.5, m.quality());
        assertTrue(!m.hasSinglePhaseProperties());
        assertThrows(FinstackException.class, m::cp);
        assertThrows(FinstackException.class, m::cv);
        assertThrows(FinstackException.class, m::speedOfSound);
    }

    @Test
    void phasesAndQualityConvention() {
        Fluid f = Fluids.byName("R134a");
        FluidState liquid = f.at(InputPair.TP, 273.15, 1e6);
        FluidState vapour = f.at(InputPair.TP, 273.15, 1e5);
        FluidState superCritical = f.at(InputPair.TP, 400, 5e6);
        FluidState gas = f.at(InputPair.TP, 400, 1e6);
        assertEquals(Phase.LIQUID, liquid.phase());
        assertEquals(Phase.VAPOUR, vapour.phase());
        assertEquals(Phase.SUPERCRITICAL, superCritical.phase());
        assertEquals(Phase.VAPOUR, gas.phase());
        assertEquals(FluidState.NO_QUALITY, liquid.quality());
        assertEquals(FluidState.NO_QUALITY, vapour.quality());
        SaturationState s = f.saturationAtTemperature(273.15);
        assertEquals(0, s.liquid().quality());
        assertEquals(1, s.vapour().quality());
        assertEquals(0, s.glide());
        assertEquals(s.bubblePressure(), s.dewPressure());
        // (p, h) in each phase of a supercritical isobar
        FluidState back = f.at(InputPair.PH, 5e6, superCritical.enthalpy());
        assertEquals(400, back.temperature(), 1e-7);
        assertEquals(Phase.SUPERCRITICAL, back.phase());
    }

    @Test
    void isobaricEnthalpyRisesWithTemperatureAcrossTheDome() {
        Fluid f = Fluids.byName("R290");
        double p = 5e5;
        double last = Double.NEGATIVE_INFINITY;
        for (double h = 0; h <= 8e5; h += 2e4) {
            FluidState s = f.at(InputPair.PH, p, h);
            assertTrue(s.temperature() >= last - 1e-9, "T(p, h) must not fall as h rises, at h = " + h);
            last = s.temperature();
        }
    }
}
