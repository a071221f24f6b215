package org.finstack.coil;

import static org.assertj.core.api.Assertions.assertThat;

import org.assertj.core.data.Offset;
import org.finstack.coil.RefrigerantSide.Model;
import org.finstack.coil.RefrigerantSide.SaturationConvention;
import org.finstack.coil.RefrigerantSide.Target;
import org.finstack.testing.Coils;
import org.junit.jupiter.api.Test;

/**
 * Smoke test of a blend through the coil model: the zone model rates an evaporator with the
 * zeotropic blend R407C (pseudo-pure, its transport properties from the blend correlations) and
 * meets the product's requirements for any refrigerant: outlet superheat target within 0.1 K,
 * energy balance within 0.1 %, no value that is not finite (invariants the product issue states).
 */
class BlendRatingTest {

    @Test
    void r407cEvaporatorWithSuperheat5KCompletes() {
        // dew point 7 degC, liquid at 40 degC, superheat 5 K; air 27 degC, 2.2 m/s, 50 % RH (ZoneCoilModelTest's case);
        // 4 segments per tube keep the test short
        RefrigerantSide side = new RefrigerantSide("R407C", Duty.EVAPORATOR, 280.15, SaturationConvention.DEW, 0,
                313.15, 0, new Target.Superheat(5), Model.ZONES, 4);
        CoilCase c = new CoilCase(Coils.exampleCondenser().withRows(4), new AirInlet(300.15, 2.2, 0, 101_325, 0.5),
                side, FoulingResistances.NONE);
        Rating r = new ZoneCoilModel().rate(c);
        Rating.RefrigerantResult ref = r.refrigerant();
        assertThat(ref.fluid()).isEqualTo("R407C");
        assertThat(r.capacity()).isFinite().isPositive();
        assertThat(r.airOutletTemperature()).isFinite().isLessThan(300.15);
        assertThat(ref.massFlow()).isFinite().isPositive();
        assertThat(ref.pressureDrop()).isFinite().isPositive();
        assertThat(ref.charge()).isFinite().isPositive();
        assertThat(ref.outletSuperheat()).isCloseTo(5, Offset.offset(0.1));
        assertThat(Math.abs(ref.energyBalanceError())).isLessThan(1e-3);
        for (Rating.ZoneResult z : r.zones()) {
            assertThat(z.duty()).isFinite();
            assertThat(z.insideCoefficient()).isFinite().isPositive();
        }
    }
}
