package org.finstack.fluid.table;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.finstack.core.Citation;
import org.finstack.core.FinstackException;
import org.finstack.core.InputException;
import org.finstack.core.OutOfRangeException;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.FluidInfo;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.Fluids;
import org.finstack.fluid.InputPair;
import org.finstack.fluid.Phase;
import org.finstack.fluid.SaturationState;
import org.finstack.fluid.TransportProperties;
import org.junit.jupiter.api.Test;

/**
 * Invariants of the tables: (p, h) round trips, monotone saturation, the phase boundary, the
 * fallback to the exact fluid outside the tables, refusals, thread safety, the registry and the
 * tabulated transport properties.
 */
class TabulatedFluidInvariantsTest {

    private static final Fluid R134A = Fluids.byName("R134a");

    /** The class Javadoc's example: R134a at 0 degC, 292 803 Pa as HelmholtzFluid's own example gives it. */
    @Test
    void javadocExample() {
        double p = TabulatedFluid.of(Fluids.byName("R134a")).saturationAtTemperature(273.15).bubblePressure();
        assertEquals(292803, p, 1); // Tillner-Roth & Baehr 1994 equation, as in HelmholtzFluid's Javadoc example
    }

    @Test
    void phRoundTripsTheTableOwnStates() {
        Fluid t = Fluids.fast("R290");
        for (double ts = 220; ts < 355; ts += 7.3) {
            double p = t.saturationAtTemperature(ts).bubblePressure();
            for (double dt = -45; dt <= 70; dt += 4.1) {
                FluidState a = t.at(InputPair.TP, ts + dt, p);
                FluidState b = t.at(InputPair.PH, p, a.enthalpy());
                assertEquals(a.temperature(), b.temperature(), 1e-8, "T at Tsat " + ts + " + " + dt);
                assertEquals(a.density(), b.density(), 1e-10 * a.density());
                assertEquals(a.phase(), b.phase());
            }
        }
    }

    @Test
    void saturationIsMonotone() {
        for (Fluid exact : Fluids.all()) {
            TabulatedFluid t = TabulatedFluid.of(exact);
            TabulatedFluid.Coverage c = t.coverage();
            double lastT = 0;
            double lastHl = Double.NEGATIVE_INFINITY;
            double lastRhoL = Double.POSITIVE_INFINITY;
            double lastRhoV = 0;
            for (double x = Math.log(c.minPressure()); x <= Math.log(c.maxPressure()); x += 0.0071) {
                SaturationState s = t.saturationAtPressure(Math.exp(x));
                assertThat(s.bubbleTemperature()).as(exact.name()).isGreaterThan(lastT);
                assertThat(s.liquid().enthalpy()).as(exact.name()).isGreaterThan(lastHl);
                assertThat(s.liquid().density()).as(exact.name()).isLessThan(lastRhoL);
                assertThat(s.vapour().density()).as(exact.name()).isGreaterThan(lastRhoV);
                lastT = s.bubbleTemperature();
                lastHl = s.liquid().enthalpy();
                lastRhoL = s.liquid().density();
                lastRhoV = s.vapour().density();
            }
            double lastP = 0;
            for (double temp = exact.info().minTemperature() + 2.01; temp < c.maxTemperature(); temp += 0.37) {
                SaturationState s;
                try {
                    s = t.saturationAtTemperature(temp);
                } catch (OutOfRangeException e) {
                    break;
                }
                assertThat(s.bubblePressure()).as(exact.name()).isGreaterThan(lastP);
                lastP = s.bubblePressure();
            }
        }
    }

    @Test
    void phaseBoundaryIsExact() {
        Fluid t = Fluids.fast("R134a");
        SaturationState s = t.saturationAtPressure(3e5);
        double hl = s.liquid().enthalpy();
        double hv = s.vapour().enthalpy();
        double d = 1e-6 * (hv - hl);
        assertEquals(Phase.LIQUID, t.at(InputPair.PH, 3e5, hl - d).phase());
        assertEquals(Phase.TWO_PHASE, t.at(InputPair.PH, 3e5, hl + d).phase());
        assertEquals(Phase.TWO_PHASE, t.at(InputPair.PH, 3e5, hv - d).phase());
        assertEquals(Phase.VAPOUR, t.at(InputPair.PH, 3e5, hv + d).phase());
        assertEquals(s.liquid(), t.at(InputPair.PH, 3e5, hl));
        assertEquals(s.vapour(), t.at(InputPair.PQ, 3e5, 1));
        assertEquals(s.liquid().temperature(), t.at(InputPair.PH, 3e5, hv + d).temperature(), 1e-3);
        assertEquals(s.liquid().temperature(), t.at(InputPair.PH, 3e5, hl - d).temperature(), 1e-3);
        FluidState half = t.at(InputPair.TQ, s.liquid().temperature(), 0.5);
        assertEquals(0.5 * (hl + hv), half.enthalpy(), 1e-6 * hv);
    }

    @Test
    void outsideTheTablesTheExactFluidAnswers() {
        Fluid t = Fluids.fast("R744");
        assertEquals(Fluids.byName("R744").at(InputPair.TP, 350, 10e6), t.at(InputPair.TP, 350, 10e6));
        assertEquals(Fluids.byName("R744").at(InputPair.PH, 10e6, 4e5), t.at(InputPair.PH, 10e6, 4e5));
        double tc = R134A.info().criticalTemperature();
        assertEquals(R134A.saturationAtTemperature(tc - 0.5), Fluids.fast("R134a").saturationAtTemperature(tc - 0.5));
        OutOfRangeException exact = assertThrows(OutOfRangeException.class, () -> R134A.at(InputPair.TP, 150, 1e5));
        OutOfRangeException tab = assertThrows(OutOfRangeException.class,
                () -> Fluids.fast("R134a").at(InputPair.TP, 150, 1e5));
        assertEquals(exact.getMessage(), tab.getMessage());
        assertThrows(OutOfRangeException.class, () -> Fluids.fast("R134a").at(InputPair.PH, 1e5, -1e6));
        assertThrows(OutOfRangeException.class, () -> Fluids.fast("R134a").saturationAtPressure(5e6));
    }

    @Test
    void refusesInputThatIsNotANumber() {
        Fluid t = Fluids.fast("R134a");
        assertEquals("temperature", assertThrows(InputException.class,
                () -> t.at(InputPair.TP, Double.NaN, 1e5)).field());
        assertEquals("enthalpy", assertThrows(InputException.class,
                () -> t.at(InputPair.PH, 3e5, Double.POSITIVE_INFINITY)).field());
        assertEquals("quality", assertThrows(InputException.class, () -> t.at(InputPair.PQ, 3e5, 1.2)).field());
        assertEquals("pressure", assertThrows(InputException.class,
                () -> t.saturationAtPressure(Double.NaN)).field());
        assertThrows(InputException.class, () -> t.at(null, 300, 1e5));
    }

    @Test
    void parallelCallsGiveIdenticalResults() throws Exception {
        TabulatedFluid fresh = TabulatedFluid.of(Fluids.byName("R32"));
        List<double[]> points = new ArrayList<>();
        for (int k = 0; k < 400; k++) {
            double p = 2e5 + 3.1e6 * ((k * 0.618034) % 1);
            points.add(new double[] {p, 1.2e5 + 4e5 * ((k * 0.414214) % 1)});
        }
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<List<FluidState>>> runs = new ArrayList<>();
            for (int th = 0; th < 4; th++) {
                runs.add(pool.submit(() -> {
                    List<FluidState> out = new ArrayList<>();
                    for (double[] q : points) {
                        out.add(fresh.at(InputPair.PH, q[0], q[1]));
                        out.add(fresh.saturationAtPressure(q[0]).vapour());
                    }
                    return out;
                }));
            }
            List<FluidState> first = runs.get(0).get();
            for (Future<List<FluidState>> r : runs) {
                assertEquals(first, r.get());
            }
        } finally {
            pool.shutdown();
        }
    }

    @Test
    void registryGivesOneSharedTableFluidByDefault() {
        assertSame(Fluids.fast("R-32"), Fluids.fast("r32"));
        assertSame(Fluids.fast("R32"), Fluids.byName("R32", Fluids.DEFAULT_BACKEND));
        assertEquals(Fluids.Backend.TABLE, Fluids.DEFAULT_BACKEND);
        assertThat(Fluids.fast("R32")).isInstanceOf(TabulatedFluid.class);
        assertSame(Fluids.byName("R32"), Fluids.byName("R32", Fluids.Backend.EOS));
        assertSame(Fluids.byName("R32"), ((TabulatedFluid) Fluids.fast("R32")).exact());
        assertEquals("refrigerant.fluid", assertThrows(InputException.class, () -> Fluids.fast("R-12")).field());
        assertEquals("R32", Fluids.fast("R32").name());
    }

    @Test
    void buildIsQuickAndCoversTheCoilRange() {
        TabulatedFluid t = TabulatedFluid.of(Fluids.byName("R1234yf"));
        TabulatedFluid.Coverage c = t.coverage();
        assertThat(c.buildSeconds()).isPositive();
        assertThat(c.minPressure()).isLessThan(t.saturationAtTemperature(233.15).bubblePressure());
        assertThat(c.maxPressure()).isGreaterThan(t.exact().saturationAtTemperature(343.15).dewPressure());
        assertThat(c.glide()).isFalse();
        assertEquals(64, c.rows());
    }

    @Test
    void withoutTransportPropertiesTheTableThrowsWhatTheFluidThrows() {
        Fluid bare = new Wrapped(R134A, null);
        FinstackException e = assertThrows(FinstackException.class, bare::transport);
        FinstackException t = assertThrows(FinstackException.class, () -> TabulatedFluid.of(bare).transport());
        assertEquals(e.getMessage(), t.getMessage());
    }

    @Test
    void transportPropertiesAreTabulated() {
        Fluid withTransport = new Wrapped(R134A, new Smooth());
        TabulatedFluid t = TabulatedFluid.of(withTransport);
        TransportProperties tt = t.transport();
        TransportProperties exact = withTransport.transport();
        assertSame(tt, t.transport());
        for (double ts = 230; ts < 350; ts += 9.7) {
            SaturationState s = R134A.saturationAtTemperature(ts);
            double p = s.bubblePressure();
            for (FluidState st : new FluidState[] {s.liquid(), s.vapour(), R134A.at(InputPair.TP, ts - 17.3, p),
                R134A.at(InputPair.TP, ts + 23.9, p)}) {
                assertEquals(exact.viscosity(st), tt.viscosity(st), 1e-4 * exact.viscosity(st), st.toString());
                assertEquals(exact.conductivity(st), tt.conductivity(st), 1e-4 * exact.conductivity(st));
            }
            assertEquals(exact.surfaceTension(ts), tt.surfaceTension(ts), 1e-5 * exact.surfaceTension(ts));
        }
        FluidState mix = R134A.at(InputPair.TQ, 273.15, 0.5);
        assertThrows(FinstackException.class, () -> tt.viscosity(mix));
        assertEquals(exact.sources(), tt.sources());
    }

    /** A fluid that delegates its states and has the given transport properties (or none). */
    private record Wrapped(Fluid f, TransportProperties t) implements Fluid {
        @Override
        public String name() {
            return f.name();
        }

        @Override
        public FluidInfo info() {
            return f.info();
        }

        @Override
        public SaturationState saturationAtTemperature(double temperature) {
            return f.saturationAtTemperature(temperature);
        }

        @Override
        public SaturationState saturationAtPressure(double pressure) {
            return f.saturationAtPressure(pressure);
        }

        @Override
        public FluidState at(InputPair pair, double a, double b) {
            return f.at(pair, a, b);
        }

        @Override
        public TransportProperties transport() {
            return t == null ? Fluid.super.transport() : t;
        }
    }

    /** Smooth made-up transport functions of (T, rho), enough to check the interpolation. */
    private static final class Smooth implements TransportProperties {
        @Override
        public double viscosity(FluidState s) {
            requireOnePhase(s);
            return 1e-5 * Math.pow(s.temperature() / 300, 0.7) * (1 + s.density() / 300 + Math.pow(s.density() / 900, 3));
        }

        @Override
        public double conductivity(FluidState s) {
            requireOnePhase(s);
            return 0.01 * (s.temperature() / 300) + 8e-5 * s.density();
        }

        @Override
        public double surfaceTension(double temperature) {
            return 0.06 * Math.pow(1 - temperature / 374.21, 1.26);
        }

        @Override
        public List<Citation> sources() {
            return List.of(Citation.of("test", "made-up smooth functions"));
        }

        @Override
        public String accuracy() {
            return "exact by construction";
        }

        private static void requireOnePhase(FluidState s) {
            if (s.phase() == Phase.TWO_PHASE) {
                throw new FinstackException(org.finstack.core.Msg.IMPOSSIBLE, "two-phase");
            }
        }
    }
}
