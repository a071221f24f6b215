package org.finstack.coil;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.finstack.testing.Reference.assertRelative;

import org.finstack.coil.RefrigerantSide.Model;
import org.finstack.coil.RefrigerantSide.SaturationConvention;
import org.finstack.coil.RefrigerantSide.Target;
import org.finstack.core.InputException;
import org.finstack.geometry.Arrangement;
import org.finstack.geometry.CoilGeometry;
import org.finstack.material.Materials;
import org.finstack.testing.Coils;
import org.junit.jupiter.api.Test;

/**
 * The zone model against the product's requirements: energy balance within 0.1 %, outlet
 * targets met within 0.1 K, the isothermal rating reproduced when the refrigerant film and the
 * pressure drop vanish (Incropera &amp; DeWitt eq. 11.35 for Cr = 0), and the trends a
 * practitioner knows (common practice).
 */
class ZoneCoilModelTest {

    private static final ZoneCoilModel MODEL = new ZoneCoilModel();

    static RefrigerantSide evaporator(String fluid, double tSat, Target target, double hi) {
        return new RefrigerantSide(fluid, Duty.EVAPORATOR, tSat, SaturationConvention.DEW, hi, 313.15, 0, target,
                Model.ZONES, 10);
    }

    static RefrigerantSide condenser(String fluid, double tSat, Target target) {
        return new RefrigerantSide(fluid, Duty.CONDENSER, tSat, SaturationConvention.DEW, 0, 0, 343.15, target,
                Model.ZONES, 10);
    }

    static CoilCase evaporatorCase(CoilGeometry g, double rh, Target target) {
        return new CoilCase(g, new AirInlet(300.15, 2.2, 0, 101_325, rh), evaporator("R134a", 280.15, target, 0),
                FoulingResistances.NONE);
    }

    @Test
    void evaporatorMeetsItsSuperheatAndClosesItsBalance() {
        Rating r = MODEL.rate(evaporatorCase(Coils.exampleCondenser().withRows(4), 0.5, new Target.Superheat(5)));
        assertThat(r.refrigerant().outletSuperheat()).isCloseTo(5, org.assertj.core.data.Offset.offset(0.1));
        assertThat(Math.abs(r.refrigerant().energyBalanceError())).isLessThan(1e-3);
        assertThat(r.moisture().latentCapacity()).isPositive();
        assertThat(r.moisture().condensate()).isPositive();
        assertThat(r.zones()).extracting(Rating.ZoneResult::name).containsExactly("two-phase", "superheat");
        double shares = r.zones().stream().mapToDouble(Rating.ZoneResult::areaFraction).sum();
        assertRelative(1, shares, 1e-9, "zones fill the coil");
        assertThat(r.refrigerant().charge()).isPositive();
        assertThat(r.refrigerant().pressureDrop()).isPositive();
    }

    @Test
    void condenserMeetsItsSubcoolingAndClosesItsBalance() {
        CoilCase c = new CoilCase(Coils.exampleCondenser(), new AirInlet(305.15, 2.2, 0, 101_325, 0),
                condenser("R134a", 318.15, new Target.Subcooling(3)), FoulingResistances.NONE);
        Rating r = MODEL.rate(c);
        assertThat(r.refrigerant().outletSubcooling()).isCloseTo(3, org.assertj.core.data.Offset.offset(0.1));
        assertThat(Math.abs(r.refrigerant().energyBalanceError())).isLessThan(1e-3);
        assertThat(r.zones()).extracting(Rating.ZoneResult::name).containsExactly("desuperheat", "condensing", "subcool");
        assertThat(r.airOutletTemperature()).isGreaterThan(305.15);
    }

    /**
     * The product requirement: a very large film coefficient, no superheat and a negligible pressure
     * drop (one circuit per tube) reproduce the version-1 isothermal rating.
     */
    @Test
    void reproducesTheIsothermalRatingInTheLimit() {
        CoilGeometry base = Coils.exampleCondenser().withRows(4);
        CoilGeometry g = new CoilGeometry(base.tubeOuterDiameter(), base.tubeWall(), base.tubeMaterial(),
                Arrangement.STAGGERED, base.transversePitch(), base.rowPitch(), 4, 16, base.finnedLength(), "plain",
                base.finPitch(), base.finThickness(), base.finMaterial(), 64, null, 0);
        AirInlet air = new AirInlet(300.15, 2.2, 0, 101_325, 0);
        Rating zones = MODEL.rate(new CoilCase(g, air, evaporator("R134a", 280.15, new Target.Superheat(0), 1e6),
                FoulingResistances.NONE));
        Rating iso = new IsothermalCoilModel().rate(new CoilCase(g, air,
                new RefrigerantSide("R134a", Duty.EVAPORATOR, 280.15, 1e6), FoulingResistances.NONE));
        assertThat(zones.refrigerant().saturationTemperatureDrop()).isLessThan(0.05);
        assertRelative(iso.capacity(), zones.capacity(), 0.01, "zone model in the isothermal limit");
    }

    /** Common practice: more rows and more fins raise capacity; fouling lowers it. */
    @Test
    void trendsOfTheTrade() {
        CoilGeometry g = Coils.exampleCondenser();
        double base = MODEL.rate(evaporatorCase(g, 0, new Target.Superheat(5))).capacity();
        assertThat(MODEL.rate(evaporatorCase(g.withRows(4), 0, new Target.Superheat(5))).capacity()).isGreaterThan(base);
        assertThat(MODEL.rate(evaporatorCase(g.withFinPitch(0.0254 / 16), 0, new Target.Superheat(5))).capacity())
                .isGreaterThan(base);
        CoilCase dirty = evaporatorCase(g, 0, new Target.Superheat(5)).withFouling(new FoulingResistances(5e-4, 0, 0));
        assertThat(MODEL.rate(dirty).capacity()).isLessThan(base);
    }

    /**
     * Common practice: on a coil circuited as the trade circuits it (saturation-temperature drop of
     * a kelvin or two), doubling a copper tube's wall changes capacity by well under 1 %, and an
     * aluminium tube costs little (under 2 %).
     */
    @Test
    void tubeWallAndTubeMaterialBarelyMatter() {
        CoilGeometry c = Coils.exampleCondenser();
        CoilGeometry g = new CoilGeometry(c.tubeOuterDiameter(), c.tubeWall(), c.tubeMaterial(), Arrangement.STAGGERED,
                c.transversePitch(), c.rowPitch(), 3, 16, c.finnedLength(), "plain", c.finPitch(), c.finThickness(),
                c.finMaterial(), 8, null, 0);
        assertThat(MODEL.rate(evaporatorCase(g, 0, new Target.Superheat(5))).refrigerant().saturationTemperatureDrop())
                .isBetween(0.3, 2.5);
        double base = MODEL.rate(evaporatorCase(g, 0, new Target.Superheat(5))).capacity();
        double thick = MODEL.rate(evaporatorCase(g.withTubeWall(2 * g.tubeWall()), 0, new Target.Superheat(5))).capacity();
        assertThat(Math.abs(thick / base - 1)).isLessThan(0.01);
        double al = MODEL.rate(evaporatorCase(g.withTubeMaterial(Materials.library().tube("t", "aluminium-3003")), 0,
                new Target.Superheat(5))).capacity();
        assertThat(1 - al / base).isBetween(0.0, 0.02);
    }

    /** Common practice (ASHRAE Handbook - Refrigeration): copper and brass are attacked by ammonia. */
    @Test
    void copperWithAmmoniaIsRefused() {
        CoilCase c = new CoilCase(Coils.exampleCondenser(), new AirInlet(300.15, 2.2, 0, 101_325, 0),
                evaporator("R717", 263.15, new Target.Superheat(5), 0), FoulingResistances.NONE);
        assertThatThrownBy(() -> MODEL.rate(c)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("coil.tubeMaterial: copper is attacked by ammonia");
    }

    @Test
    void massFlowAndCapacityModesAgreeWithTheSuperheatMode() {
        CoilCase c = evaporatorCase(Coils.exampleCondenser(), 0, new Target.Superheat(5));
        Rating sh = MODEL.rate(c);
        Rating mf = MODEL.rate(c.withRefrigerant(evaporator("R134a", 280.15, new Target.MassFlow(sh.refrigerant().massFlow()), 0)));
        assertRelative(sh.capacity(), mf.capacity(), 1e-5, "mass-flow mode at the solved flow");
        Rating cap = MODEL.rate(c.withRefrigerant(evaporator("R134a", 275.15, new Target.Capacity(sh.capacity(), 5), 0)));
        assertThat(cap.refrigerant().outletPressure()).isCloseTo(sh.refrigerant().outletPressure(),
                org.assertj.core.data.Offset.offset(50.0));
    }
}
