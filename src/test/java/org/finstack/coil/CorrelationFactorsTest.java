package org.finstack.coil;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.finstack.testing.Reference.assertRelative;

import java.util.List;
import org.finstack.airside.KaysLondonCorePressureDrop;
import org.finstack.coil.RefrigerantSide.Model;
import org.finstack.coil.RefrigerantSide.SaturationConvention;
import org.finstack.coil.RefrigerantSide.Target;
import org.finstack.core.InputException;
import org.finstack.core.Warnings;
import org.finstack.fluid.air.DryAir;
import org.finstack.geometry.DerivedGeometry;
import org.finstack.testing.Coils;
import org.junit.jupiter.api.Test;

/**
 * The correlation-factor hook, checked against its definition: j fj in place of j gives
 * h_o = j fj G cp Pr^(-2/3), exactly fj times the published h_o (Colburn's definition of j);
 * f ff in place of f scales the friction term of Kays &amp; London's core equation by ff, its
 * acceleration term not at all (the equation as written in {@link KaysLondonCorePressureDrop}).
 * Factors (1, 1) leave a rating exactly as it was; a better air side raises the capacity by less
 * than its own share, since the air film is one of several resistances in series (an invariant).
 */
class CorrelationFactorsTest {

    private static final double C = 273.15;

    /** The example condenser (Coils.exampleCondenser) on R-134a, zone model, dry air at 32 C. */
    static CoilCase condenser(Model model) {
        RefrigerantSide r = new RefrigerantSide("R134a", Duty.CONDENSER, C + 45, SaturationConvention.DEW, 0, 0, C + 70,
                new Target.Subcooling(3), model, 4);
        return new CoilCase(Coils.exampleCondenser(), new AirInlet(C + 32, 0, 0.8, 101_325, 0), r,
                FoulingResistances.NONE);
    }

    @Test
    void unitFactorsReproduceTheRatingExactly() {
        CoilCase c = condenser(Model.ZONES);
        assertThat(c.factors()).isEqualTo(CorrelationFactors.NONE);
        Rating plain = CoilModels.rate(c);
        Rating ones = CoilModels.rate(c.withFactors(new CorrelationFactors(1.0, 1.0)));
        assertThat(ones).isEqualTo(plain);
        assertThat(ones.capacity()).isEqualTo(plain.capacity());
        assertThat(ones.airPressureDrop()).isEqualTo(plain.airPressureDrop());
        assertThat(ones.airCoefficient()).isEqualTo(plain.airCoefficient());
        assertThat(ones.ua()).isEqualTo(plain.ua());
    }

    @Test
    void oldConstructorsAndWithersKeepOrDefaultTheFactors() {
        CoilCase c = condenser(Model.ZONES);
        CorrelationFactors k = new CorrelationFactors(1.1, 0.9);
        CoilCase f = c.withFactors(k);
        assertThat(f.withFouling(new FoulingResistances(1e-4, 0, 0)).factors()).isEqualTo(k);
        assertThat(f.withAir(c.air()).factors()).isEqualTo(k);
        assertThat(f.withRefrigerant(c.refrigerant()).factors()).isEqualTo(k);
        assertThat(f.withCoil(Coils.kaysLondon8T(2)).factors()).isEqualTo(k);
        assertThat(new CoilCase(c.coil(), c.air(), c.refrigerant(), c.fouling(), null, List.of()).factors())
                .isEqualTo(CorrelationFactors.NONE);
        assertThat(new CoilCase(c.coil(), c.air(), c.refrigerant(), c.fouling(), null, List.of(), null).factors())
                .isEqualTo(CorrelationFactors.NONE);
    }

    /** h_o = j G cp Pr^(-2/3) (Colburn): at the same mean temperature, j x 1.1 is h_o x 1.1 exactly. */
    @Test
    void jFactorRaisesTheAirFilmCoefficientByItsOwnShare() {
        CoilCase c = condenser(Model.ZONES);
        DerivedGeometry d = c.coil().derive();
        AirFlow plain = AirFlow.of(c, d);
        AirFlow raised = AirFlow.of(c.withFactors(new CorrelationFactors(1.1, 1)), d);
        double t = C + 38;
        AirFlow.Side a = plain.at(t, Warnings.discard());
        AirFlow.Side b = raised.at(t, Warnings.discard());
        assertRelative(1.1 * a.coefficient(), b.coefficient(), 1e-12, "h_o with fj = 1.1");
        assertRelative(1.1 * a.jf().j(), b.jf().j(), 1e-12, "j with fj = 1.1");
        assertThat(b.jf().f()).isEqualTo(a.jf().f());
        assertThat(raised.correlation().id()).isEqualTo(plain.correlation().id());
        assertThat(raised.methods()).isEqualTo(plain.methods());
    }

    @Test
    void jFactorRaisesTheCapacityByLessThanItsOwnShare() {
        for (Model m : new Model[] {Model.ZONES, Model.ISOTHERMAL}) {
            CoilCase c = m == Model.ISOTHERMAL
                    ? new CoilCase(Coils.exampleCondenser(), new AirInlet(C + 32, 2.2, 0, 101_325, 0),
                            new RefrigerantSide("R134a", Duty.CONDENSER, C + 45, 2500), FoulingResistances.NONE)
                    : condenser(m);
            Rating plain = CoilModels.rate(c);
            Rating raised = CoilModels.rate(c.withFactors(new CorrelationFactors(1.1, 1)));
            double gain = raised.capacity() / plain.capacity() - 1;
            assertThat(gain).as(m + " capacity gain").isPositive().isLessThan(0.10);
            assertThat(raised.ua()).as(m + " UA").isGreaterThan(plain.ua());
        }
    }

    /**
     * Kays &amp; London with Kc = Ke = 0: dp = G^2/(2 rho_in) [(1 + sigma^2)(rho_in/rho_out - 1)
     * + f (A/Amin) rho_in/rho_m]; the friction part is dp(f) - dp(0), and ff = 1.2 multiplies it by 1.2.
     */
    @Test
    void fFactorRaisesTheCoreFrictionPartOfThePressureDropByItsOwnShare() {
        CoilCase c = condenser(Model.ZONES);
        DerivedGeometry d = c.coil().derive();
        AirFlow plain = AirFlow.of(c, d);
        AirFlow raised = AirFlow.of(c.withFactors(new CorrelationFactors(1, 1.2)), d);
        double tMean = C + 38;
        double tOut = C + 44;
        AirFlow.Side a = plain.at(tMean, Warnings.discard());
        AirFlow.Side b = raised.at(tMean, Warnings.discard());
        assertThat(b.coefficient()).isEqualTo(a.coefficient());
        double p = c.air().pressure();
        double acceleration = KaysLondonCorePressureDrop.withoutEndLosses(plain.maxMassFlux(),
                DryAir.density(plain.inlet().dryBulb(), p), DryAir.density(tOut, p), d.sigma(), 0,
                d.airSideArea() / d.minFlowArea());
        assertThat(acceleration).isPositive(); // the air heats and speeds up across a condenser
        double frictionPlain = plain.pressureDrop(a, tOut) - acceleration;
        double frictionRaised = raised.pressureDrop(b, tOut) - acceleration;
        assertRelative(1.2 * frictionPlain, frictionRaised, 1e-12, "core friction part with ff = 1.2");
        // no density change: the whole core pressure drop is friction
        double inlet = plain.inlet().dryBulb();
        assertRelative(1.2 * plain.pressureDrop(a, inlet), raised.pressureDrop(b, inlet), 1e-12, "isothermal core");
    }

    @Test
    void fFactorLeavesTheCapacityAndRaisesTheRatedPressureDrop() {
        CoilCase c = condenser(Model.ZONES);
        Rating plain = CoilModels.rate(c);
        Rating raised = CoilModels.rate(c.withFactors(new CorrelationFactors(1, 1.2)));
        assertThat(raised.capacity()).isEqualTo(plain.capacity());
        assertThat(raised.airPressureDrop() / plain.airPressureDrop()).isGreaterThan(1.15).isLessThanOrEqualTo(1.2);
    }

    /** The tube-by-tube model with uneven air: each tube place's flow keeps the factors. */
    @Test
    void tubeModelWithAnAirProfileHonoursTheJFactor() {
        CoilCase c = condenser(Model.TUBES);
        List<Double> profile = new java.util.ArrayList<>();
        for (int i = 0; i < c.coil().tubesPerRow(); i++) {
            profile.add(i < c.coil().tubesPerRow() / 2 ? 1.3 : 0.7);
        }
        CoilCase uneven = new CoilCase(c.coil(), c.air(), c.refrigerant(), c.fouling(), null, profile);
        Rating plain = CoilModels.rate(uneven);
        Rating raised = CoilModels.rate(uneven.withFactors(new CorrelationFactors(1.1, 1)));
        double gain = raised.capacity() / plain.capacity() - 1;
        assertThat(gain).isPositive().isLessThan(0.10);
    }

    @Test
    void composedFactorsMultiply() {
        CoilCase c = condenser(Model.ZONES);
        DerivedGeometry d = c.coil().derive();
        AirFlow once = AirFlow.of(c.withFactors(new CorrelationFactors(1.21, 1.44)), d);
        AirFlow plain = AirFlow.of(c, d);
        var twice = new CorrelationFactors(1.1, 1.2).applyTo(new CorrelationFactors(1.1, 1.2).applyTo(plain.correlation()));
        var surface = plain.surface();
        double re = 3000;
        var a = once.correlation().evaluate(surface, re, Warnings.discard());
        var b = twice.evaluate(surface, re, Warnings.discard());
        assertRelative(a.j(), b.j(), 1e-12, "j x 1.1 x 1.1");
        assertRelative(a.f(), b.f(), 1e-12, "f x 1.2 x 1.2");
    }

    @Test
    void nonPositiveOrNonFiniteFactorsAreRefusedNamingTheField() {
        assertThatThrownBy(() -> new CorrelationFactors(0, 1)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("correlationFactors.j");
        assertThatThrownBy(() -> new CorrelationFactors(1, -0.5)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("correlationFactors.f");
        assertThatThrownBy(() -> new CorrelationFactors(Double.NaN, 1)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("correlationFactors.j");
        assertThatThrownBy(() -> new CorrelationFactors(1, Double.POSITIVE_INFINITY)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("correlationFactors.f");
    }
}
