package org.finstack.study.fan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.finstack.core.InputException;
import org.finstack.core.Warnings;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/**
 * The generic fans respond to rising system resistance as practitioners know them to (common
 * practice): an axial propeller fan loses flow and draws more power, a forward-curved
 * centrifugal loses flow and draws less power, a constant-airflow EC fan holds its flow (drawing
 * more power) until it reaches its maximum speed or power, then loses flow.
 */
class GenericFanTest {

    /** System curves dp = k Q^2 with k rising from a clean to a badly fouled coil [Pa s2/m6]. */
    private static final double[] RESISTANCES = {5, 10, 20, 26.67, 40, 60, 100, 150, 200, 300, 500};

    @Test
    void axialFanFlowFallsAndPowerRisesAsResistanceRises() {
        FixedSpeedFan fan = FixedSpeedFan.axialPropeller(1.5, 60);
        FanOperation previous = null;
        for (double k : RESISTANCES) {
            FanOperation op = fan.operate(q -> k * q * q, new Warnings());
            if (previous != null) {
                assertThat(op.flow()).as("flow at k = %s", k).isLessThan(previous.flow());
                assertThat(op.staticPressure()).as("pressure at k = %s", k).isGreaterThan(previous.staticPressure());
                assertThat(op.electricalPower()).as("power at k = %s", k).isGreaterThan(previous.electricalPower());
            }
            previous = op;
        }
    }

    @Test
    void forwardCurvedFanFlowAndPowerFallAsResistanceRises() {
        FixedSpeedFan fan = FixedSpeedFan.forwardCurved(1.0, 150);
        FanOperation previous = null;
        for (double k : new double[] {40, 80, 150, 250, 400, 700, 1200, 3000}) {
            FanOperation op = fan.operate(q -> k * q * q, new Warnings());
            if (previous != null) {
                assertThat(op.flow()).as("flow at k = %s", k).isLessThan(previous.flow());
                assertThat(op.shaftPower()).as("power at k = %s", k).isLessThan(previous.shaftPower());
            }
            previous = op;
        }
    }

    @Test
    void ecFanHoldsItsFlowUntilMaximumSpeedThenLosesFlow() {
        ConstantAirflowEcFan fan = ConstantAirflowEcFan.typical(1.0, 100, 1.3, 10_000);
        boolean reachedMax = false;
        FanOperation previous = null;
        for (double k : new double[] {30, 60, 100, 150, 200, 230, 260, 300, 400, 600}) {
            FanOperation op = fan.operate(q -> k * q * q, new Warnings());
            if (op.regulation() == Regulation.HOLDING_FLOW) {
                assertThat(reachedMax).as("holding again after the limit at k = %s", k).isFalse();
                assertThat(op.flow()).as("held flow at k = %s", k).isCloseTo(1.0, within(1e-9));
                assertThat(op.speedRatio()).isLessThanOrEqualTo(1.3);
                if (previous != null) {
                    assertThat(op.electricalPower()).isGreaterThan(previous.electricalPower());
                    assertThat(op.speedRatio()).isGreaterThan(previous.speedRatio());
                }
            } else {
                assertThat(op.regulation()).isEqualTo(Regulation.AT_MAX_SPEED);
                assertThat(op.speedRatio()).isEqualTo(1.3);
                assertThat(op.flow()).as("flow at k = %s", k).isLessThan(1.0);
                if (reachedMax) {
                    assertThat(op.flow()).isLessThan(previous.flow());
                }
                reachedMax = true;
            }
            previous = op;
        }
        assertThat(reachedMax).as("the series reaches the maximum speed").isTrue();
    }

    /** With a low power limit the EC fan is held at its maximum power and the flow falls. */
    @Test
    void ecFanAtItsPowerLimitLosesFlowAtConstantPower() {
        ConstantAirflowEcFan fan = ConstantAirflowEcFan.typical(1.0, 100, 1.3, 220);
        FanOperation previous = null;
        for (double k : new double[] {150, 200, 300, 400}) {
            Warnings w = new Warnings();
            FanOperation op = fan.operate(q -> k * q * q, w);
            assertThat(op.regulation()).isEqualTo(Regulation.AT_MAX_POWER);
            Reference.assertRelative(220, op.electricalPower(), 1e-9, "electrical power at k = " + k);
            assertThat(op.flow()).isLessThan(1.0);
            if (previous != null) {
                assertThat(op.flow()).isLessThan(previous.flow());
            }
            assertThat(w.list()).anyMatch(s -> s.contains("maximum power"));
            previous = op;
        }
    }

    /**
     * At its design point a generic fan's power is Q p / eta (definition of static efficiency),
     * and the electrical power that over the motor efficiency. Javadoc worked example of
     * {@link FixedSpeedFan}: 1.5 m3/s, 60 Pa, 225 W shaft, 346.15 W drawn.
     */
    @Test
    void fixedSpeedFanJavadocExampleRunsAtItsDesignPoint() {
        FixedSpeedFan fan = FixedSpeedFan.axialPropeller(1.5, 60);
        FanOperation op = fan.operate(q -> 60 / (1.5 * 1.5) * q * q, new Warnings());
        Reference.assertRelative(1.5, op.flow(), 1e-10, "flow");
        Reference.assertRelative(60, op.staticPressure(), 1e-9, "pressure");
        Reference.assertRelative(1.5 * 60 / 0.40, op.shaftPower(), 1e-9, "shaft power");
        Reference.assertRelative(346.15, op.electricalPower(), 2e-5, "electrical power (rounded to 5 figures)");
        Reference.assertRelative(0.40, op.staticEfficiency(), 1e-9, "static efficiency");
    }

    /**
     * Javadoc worked example of {@link ConstantAirflowEcFan}: 196.08 W at the design point
     * (1.0 x 100 / (0.60 x 0.85)); 0.85416 m3/s at maximum speed against 300 Q^2.
     */
    @Test
    void ecFanJavadocExample() {
        ConstantAirflowEcFan fan = ConstantAirflowEcFan.typical(1.0, 100, 1.3, 500);
        FanOperation design = fan.operate(q -> 100 * q * q, new Warnings());
        assertThat(design.regulation()).isEqualTo(Regulation.HOLDING_FLOW);
        Reference.assertRelative(1.0, design.speedRatio(), 1e-9, "speed at design");
        Reference.assertRelative(196.08, design.electricalPower(), 1e-4, "power at design");
        FanOperation limited = fan.operate(q -> 300 * q * q, new Warnings());
        assertThat(limited.regulation()).isEqualTo(Regulation.AT_MAX_SPEED);
        Reference.assertRelative(0.85416, limited.flow(), 1e-5, "flow at maximum speed");
        // on the maximum-speed curve and the system curve at once
        FanCurve top = FanCharacteristic.BACKWARD_CURVED.curve(1.0, 100, 1.3);
        Reference.assertRelative(top.pressure(limited.flow()), 300 * limited.flow() * limited.flow(), 1e-9,
                "intersection");
    }

    /** Fan laws: the EC fan's held speed satisfies n^2 p_d psi(1/n) = dp(Q_set). */
    @Test
    void ecFanHeldSpeedSatisfiesTheFanLaws() {
        ConstantAirflowEcFan fan = ConstantAirflowEcFan.typical(0.8, 120, 1.5, 10_000);
        FanOperation op = fan.operate(q -> 250 * q * q, new Warnings());
        double n = op.speedRatio();
        Reference.assertRelative(250 * 0.64, n * n * 120 * FanCharacteristic.BACKWARD_CURVED.pressureRatio(1 / n),
                1e-9, "held pressure");
        // shaft power by the fan laws: P_d n^3 lambda(1/n), P_d = Q p / eta
        Reference.assertRelative(0.8 * 120 / 0.60 * n * n * n * FanCharacteristic.BACKWARD_CURVED.powerRatio(1 / n),
                op.shaftPower(), 1e-12, "shaft power");
    }

    @Test
    void operatingLeftOfTheStableRegionWarns() {
        Warnings w = new Warnings();
        FixedSpeedFan.axialPropeller(1.5, 60).operate(q -> 300 * q * q, w);
        assertThat(w.list()).anyMatch(s -> s.contains("stall"));
        Warnings clean = new Warnings();
        FixedSpeedFan.axialPropeller(1.5, 60).operate(q -> 26.67 * q * q, clean);
        assertThat(clean.isEmpty()).isTrue();
    }

    @Test
    void fanThatCannotOvercomeTheCoilIsRefused() {
        assertThatThrownBy(() -> FixedSpeedFan.forwardCurved(1.0, 150).operate(q -> 300 + q, new Warnings()))
                .isInstanceOf(InputException.class).hasMessageContaining("cannot move air");
    }

    @Test
    void badDesignInputsAreRejected() {
        assertThatThrownBy(() -> FixedSpeedFan.axialPropeller(0, 60)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("designFlow:");
        assertThatThrownBy(() -> new FixedSpeedFan(FanCharacteristic.AXIAL_PROPELLER, 1, 60, 1.2, 0.6))
                .isInstanceOf(InputException.class).hasMessageStartingWith("designStaticEfficiency:");
        assertThatThrownBy(() -> ConstantAirflowEcFan.typical(1, 100, 0.9, 500))
                .isInstanceOf(InputException.class).hasMessageStartingWith("maxSpeedRatio:");
        assertThatThrownBy(() -> ConstantAirflowEcFan.typical(1, 100, 1.2, -5))
                .isInstanceOf(InputException.class).hasMessageStartingWith("maxElectricalPower:");
    }

    /** Each characteristic passes through its design point, (1, 1, 1). */
    @Test
    void characteristicsPassThroughTheirDesignPoint() {
        for (FanCharacteristic c : new FanCharacteristic[] {FanCharacteristic.AXIAL_PROPELLER,
                FanCharacteristic.FORWARD_CURVED, FanCharacteristic.BACKWARD_CURVED}) {
            assertThat(c.pressureRatio(1)).as(c.name()).isEqualTo(1);
            assertThat(c.powerRatio(1)).as(c.name()).isEqualTo(1);
            assertThat(c.pressureRatio(c.freeDeliveryRatio())).as(c.name()).isZero();
        }
    }
}
