package org.finstack.coil;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.finstack.testing.Reference.assertRelative;

import org.finstack.core.InputException;
import org.finstack.geometry.CoilGeometry;
import org.finstack.material.Materials;
import org.finstack.testing.Coils;
import org.junit.jupiter.api.Test;

/**
 * The isothermal (fixed saturation temperature) dry rating: energy balance and the LMTD
 * identity (Incropera &amp; DeWitt, Fundamentals of Heat and Mass Transfer, eqs. 11.15 and 11.35:
 * with one fluid at constant temperature, q = UA LMTD and eps = 1 - exp(-NTU)), invariants, and
 * the trends a practitioner knows (common practice).
 */
class IsothermalCoilModelTest {

    private static final IsothermalCoilModel MODEL = new IsothermalCoilModel();

    static CoilCase condenser(CoilGeometry g) {
        return new CoilCase(g, new AirInlet(305.15, 2.2, 0, 101_325, 0),
                new RefrigerantSide("R134a", Duty.CONDENSER, 318.15, 2500), FoulingResistances.NONE);
    }

    @Test
    void energyBalanceAndLmtdIdentityClose() {
        Rating r = MODEL.rate(condenser(Coils.exampleCondenser()));
        double airSide = r.airMassFlow() * r.airProperties().cp() * (r.airOutletTemperature() - r.airInletTemperature());
        assertRelative(r.capacity(), airSide, 1e-9, "air-side energy balance");
        double tSat = 318.15;
        double lmtd = (r.airOutletTemperature() - r.airInletTemperature())
                / Math.log((tSat - r.airInletTemperature()) / (tSat - r.airOutletTemperature()));
        assertRelative(r.capacity(), r.ua() * lmtd, 1e-9, "q = UA LMTD with one side isothermal");
        assertRelative(1 - Math.exp(-r.ntu()), r.effectiveness(), 1e-12, "eps = 1 - exp(-NTU) at Cr = 0");
        assertThat(r.effectiveness()).isBetween(0.0, 1.0);
        double sum = r.resistances().shares().values().stream().mapToDouble(Double::doubleValue).sum();
        assertRelative(1, sum, 1e-12, "resistance shares sum to one");
    }

    /** Invariant: with the face velocity fixed, doubling the finned length doubles area, airflow and UA. */
    @Test
    void doublingFinnedLengthDoublesUa() {
        CoilGeometry g = Coils.exampleCondenser();
        Rating a = MODEL.rate(condenser(g));
        Rating b = MODEL.rate(condenser(g.withFinnedLength(2 * g.finnedLength())));
        assertRelative(2 * a.ua(), b.ua(), 1e-9, "UA");
        assertRelative(2 * a.capacity(), b.capacity(), 1e-9, "capacity");
        assertRelative(a.airPressureDrop(), b.airPressureDrop(), 1e-9, "air pressure drop");
    }

    /** Common practice: more fins (or more rows) raise capacity and air-side pressure drop. */
    @Test
    void moreFinsAndMoreRowsRaiseCapacityAndPressureDrop() {
        CoilGeometry g = Coils.exampleCondenser();
        Rating sparse = MODEL.rate(condenser(g.withFinPitch(0.0254 / 8)));
        Rating dense = MODEL.rate(condenser(g.withFinPitch(0.0254 / 14)));
        assertThat(dense.capacity()).isGreaterThan(sparse.capacity());
        assertThat(dense.airPressureDrop()).isGreaterThan(sparse.airPressureDrop());
        Rating four = MODEL.rate(condenser(g.withRows(4)));
        Rating base = MODEL.rate(condenser(g));
        assertThat(four.capacity()).isGreaterThan(base.capacity());
        assertThat(four.airPressureDrop()).isGreaterThan(base.airPressureDrop());
    }

    /**
     * Common practice: conduction through a metal tube wall is a tiny resistance. Doubling a copper
     * tube's wall keeps its conduction share under 1 % of the total; with the inside coefficient
     * held fixed, the capacity then moves only through the smaller inside area (under 2 %). An
     * aluminium tube costs little capacity (under 2 %).
     */
    @Test
    void tubeWallAndTubeMaterialBarelyMatter() {
        CoilGeometry g = Coils.exampleCondenser();
        Rating base = MODEL.rate(condenser(g));
        Rating thick = MODEL.rate(condenser(g.withTubeWall(2 * g.tubeWall())));
        assertThat(thick.resistances().shares().get("wall")).isLessThan(0.01);
        assertThat(1 - thick.capacity() / base.capacity()).isBetween(0.0, 0.02);
        Rating al = MODEL.rate(condenser(g.withTubeMaterial(Materials.library().tube("t", "aluminium-3003"))));
        assertThat(al.capacity()).isLessThan(base.capacity());
        assertThat(1 - al.capacity() / base.capacity()).isLessThan(0.02);
        assertThat(base.resistances().shares().get("wall")).isLessThan(0.01);
    }

    /** Common practice: fouling lowers capacity; the air-side film dominates a clean coil's resistance. */
    @Test
    void foulingLowersCapacityAndAirFilmDominatesClean() {
        CoilCase c = condenser(Coils.exampleCondenser());
        Rating clean = MODEL.rate(c);
        Rating dirty = MODEL.rate(c.withFouling(new FoulingResistances(0.0005, 0.0001, 0)));
        assertThat(dirty.capacity()).isLessThan(clean.capacity());
        assertThat(dirty.resistances().shares().get("airFouling")).isGreaterThan(0);
        assertThat(clean.resistances().shares().get("airFilm")).isGreaterThan(0.5);
    }

    @Test
    void evaporatorCoolsTheAir() {
        CoilCase c = new CoilCase(Coils.exampleCondenser(), new AirInlet(275.15, 2.0, 0, 101_325, 0),
                new RefrigerantSide("R404A", Duty.EVAPORATOR, 267.15, 1500), FoulingResistances.NONE);
        Rating r = MODEL.rate(c);
        assertThat(r.airOutletTemperature()).isLessThan(275.15).isGreaterThan(267.15);
        assertThat(r.capacity()).isPositive();
    }

    @Test
    void saturationOnTheWrongSideOfTheAirIsRefused() {
        CoilCase c = new CoilCase(Coils.exampleCondenser(), new AirInlet(305.15, 2.2, 0, 101_325, 0),
                new RefrigerantSide("R134a", Duty.CONDENSER, 300.15, 2500), FoulingResistances.NONE);
        assertThatThrownBy(() -> MODEL.rate(c)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("refrigerant.saturationTemperature: a condenser needs a saturation temperature above");
    }
}
