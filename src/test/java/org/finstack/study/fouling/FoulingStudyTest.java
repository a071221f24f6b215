package org.finstack.study.fouling;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import java.util.concurrent.CancellationException;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.Rating;
import org.finstack.core.InputException;
import org.finstack.study.fan.FanCurve;
import org.finstack.study.fan.FixedSpeedFan;
import org.finstack.testing.Reference;
import org.finstack.testing.Stopper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The fouling study's invariants on a small zone-model condenser (invented coil): capacity falls
 * and pressure drop rises with the deposit, the airflow falls with a fan and holds without one,
 * the clean coil shows zero loss, the fan point lies on both curves, and a level is recovered from
 * the pressure-drop rise it produces.
 */
class FoulingStudyTest {

    static CoilCase condenser;
    static double cleanDp;
    static CoilFan axial;

    @BeforeAll
    static void setUp() {
        condenser = SmallCoils.condenser(12);
        Rating r = CoilModels.rate(condenser);
        cleanDp = r.airPressureDrop();
        axial = new CoilFan.Generic(FixedSpeedFan.axialPropeller(0.6, cleanDp));
    }

    @Test
    void capacityFallsAndPressureDropRisesWithFoulingWithAFan() {
        FoulingStudy.FoulingCurve curve = FoulingStudy.curve(condenser, axial, FoulingLevel.DUST_CONDUCTIVITY,
                FoulingStudy.heavyThickness(condenser), 5);
        List<FoulingStudy.FoulingPoint> p = curve.points();
        assertThat(p.get(0).capacityLossFraction()).isZero();
        assertThat(p.get(0).blockedFraction()).isZero();
        for (int i = 1; i < p.size(); i++) {
            assertThat(p.get(i).capacity()).as("capacity at level %d", i).isLessThan(p.get(i - 1).capacity());
            assertThat(p.get(i).airPressureDrop()).as("dp at level %d", i).isGreaterThan(p.get(i - 1).airPressureDrop());
            assertThat(p.get(i).airflow()).as("airflow at level %d", i).isLessThan(p.get(i - 1).airflow());
            assertThat(p.get(i).blockedFraction()).isGreaterThan(p.get(i - 1).blockedFraction());
            assertThat(p.get(i).capacityLossFraction()).isGreaterThan(p.get(i - 1).capacityLossFraction());
        }
        assertThat(p.get(p.size() - 1).fanPower()).isGreaterThan(p.get(0).fanPower()); // axial: power rises as flow falls (FanCharacteristic)
        assertThat(curve.warnings()).anyMatch(w -> w.contains("dense for a dusty duty"));
    }

    @Test
    void aCurveTheDepositPushesOffTheFanCurveEndsThereWithANote() {
        // invented fan curve given only from 0.5 to 0.8 m3/s around the clean point (0.6 m3/s): the
        // heavy deposit pulls the airflow below its first point, where nothing may be extrapolated
        CoilFan narrow = new CoilFan.Curve(new FanCurve(new double[] {0.5, 0.8}, new double[] {1.3 * cleanDp, 0.1 * cleanDp}));
        FoulingStudy.FoulingCurve curve = FoulingStudy.curve(condenser, narrow, FoulingLevel.DUST_CONDUCTIVITY,
                FoulingStudy.heavyThickness(condenser), 6);
        List<FoulingStudy.FoulingPoint> p = curve.points();
        assertThat(p.size()).isBetween(2, 5);
        assertThat(p).allSatisfy(x -> assertThat(x.airflow()).isGreaterThanOrEqualTo(0.5));
        for (int i = 1; i < p.size(); i++) {
            assertThat(p.get(i).capacity()).isLessThan(p.get(i - 1).capacity());
        }
        assertThat(curve.notes()).anyMatch(n -> n.startsWith("the curve ends at") && n.contains("fan"));
    }

    @Test
    void withoutAFanTheAirflowIsHeldAndTheLossIsSmaller() {
        double heavy = FoulingStudy.heavyThickness(condenser);
        FoulingStudy.FoulingCurve held = FoulingStudy.curve(condenser, null, FoulingLevel.DUST_CONDUCTIVITY, heavy, 3);
        FoulingStudy.FoulingCurve fan = FoulingStudy.curve(condenser, axial, FoulingLevel.DUST_CONDUCTIVITY, heavy, 3);
        assertThat(held.points()).allSatisfy(p -> assertThat(p.airflow()).isEqualTo(0.6, org.assertj.core.data.Offset.offset(1e-12)));
        assertThat(held.notes()).containsExactly(FanInLoop.HELD_CONSTANT);
        assertThat(held.points().get(2).capacityLossFraction()).isGreaterThan(0)
                .isLessThan(fan.points().get(2).capacityLossFraction());
        assertThat(held.points().get(2).fanPower()).isNaN();
    }

    @Test
    void fanOperatingPointLiesOnBothCurves() {
        FanCurve curve = new FanCurve(new double[] {0, 0.3, 0.6, 0.9}, new double[] {160, 130, 80, 0}); // invented curve
        CoilFan fan = new CoilFan.Curve(curve);
        FoulingLevel.FoulingCase fc = FoulingLevel.dust(1e-4).applyTo(condenser);
        FanInLoop.LoopRating lr = FanInLoop.rate(fc.hydraulic(), fc.thermal(), fan, 0);
        Reference.assertRelative(curve.pressure(lr.flow()), lr.fanPressure(), 1e-5, "on the fan curve (flow within FanInLoop.FLOW_TOLERANCE)");
        double coilDp = FanInLoop.at(fc.hydraulic(), lr.flow()).airPressureDrop();
        Reference.assertRelative(coilDp, lr.fanPressure(), 1e-4, "on the coil's pressure-drop curve");
        assertThat(lr.ratings()).isLessThanOrEqualTo(FanInLoop.MAX_ITERATIONS);
        assertThat(lr.fanPower()).isNaN();
    }

    @Test
    void levelInferredFromItsPressureDropRiseRoundTrips() {
        double level = 2.0e-4;
        FoulingStudy.FoulingCurve known = FoulingStudy.curve(condenser, axial, FoulingLevel.DUST_CONDUCTIVITY, level, 2);
        double rise = known.points().get(1).airPressureDrop() - known.points().get(0).airPressureDrop();
        FoulingStudy.Inferred inferred = FoulingStudy.infer(condenser, axial, FoulingLevel.DUST_CONDUCTIVITY, rise);
        Reference.assertRelative(level, inferred.level().thickness(), 0.01, "deposit from its own pressure-drop rise");
        Reference.assertRelative(known.points().get(1).capacityLossFraction(),
                inferred.level().capacityLossFraction(), 0.01, "capacity loss at the inferred level");
    }

    @Test
    void ratioOfPressureDropsGivesTheSameRise() {
        double rise = FoulingStudy.riseFromRatio(condenser, axial, 1.5);
        Reference.assertRelative(0.5 * FanInLoop.rate(condenser, axial, 0).airPressureDrop(), rise, 1e-12, "ratio 1.5");
        assertThatThrownBy(() -> FoulingStudy.riseFromRatio(condenser, axial, 0.8))
                .isInstanceOf(InputException.class).hasMessageContaining("measuredRatio");
    }

    @Test
    void impossibleRiseIsRefusedNamingTheField() {
        assertThatThrownBy(() -> FoulingStudy.infer(condenser, null, FoulingLevel.DUST_CONDUCTIVITY, 1e5))
                .isInstanceOf(InputException.class).hasMessageContaining("measuredRise");
    }

    @Test
    void badInputsAreRefused() {
        assertThatThrownBy(() -> FoulingStudy.curve(condenser, null, 0.1, 1e-4, 1)).isInstanceOf(InputException.class)
                .hasMessageContaining("levels");
        assertThatThrownBy(() -> FoulingLevel.dust(-1e-4)).isInstanceOf(InputException.class)
                .hasMessageContaining("depositThickness");
        assertThatThrownBy(() -> new FoulingLevel(1e-4, 0)).isInstanceOf(InputException.class)
                .hasMessageContaining("depositConductivity");
        assertThatThrownBy(() -> FoulingLevel.dust(0.01).applyTo(condenser)).isInstanceOf(InputException.class)
                .hasMessageContaining("depositThickness");
    }

    @Test
    void progressHearsEachLevelAndCancelStopsBetweenLevels() {
        double heavy = FoulingStudy.heavyThickness(condenser);
        Stopper all = new Stopper(Integer.MAX_VALUE);
        FoulingStudy.FoulingCurve curve = FoulingStudy.curve(condenser, null, FoulingLevel.DUST_CONDUCTIVITY, heavy, 4,
                all);
        assertThat(all.done()).containsExactly(1, 2, 3, 4);
        assertThat(curve).isEqualTo(FoulingStudy.curve(condenser, null, FoulingLevel.DUST_CONDUCTIVITY, heavy, 4));
        Stopper two = new Stopper(2);
        assertThatThrownBy(() -> FoulingStudy.curve(condenser, null, FoulingLevel.DUST_CONDUCTIVITY, heavy, 4, two))
                .isInstanceOf(CancellationException.class);
        assertThat(two.done()).containsExactly(1, 2);
    }
}
