package org.finstack.study.fan;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Size;

/** Invariants of fan curves on random data: no overshoot, non-increasing, unique operating point. */
class FanCurveProperties {

    /** Random non-increasing curves built from positive steps. */
    private static FanCurve curve(List<Double> flowSteps, List<Double> pressureDrops) {
        int n = Math.min(flowSteps.size(), pressureDrops.size()) + 1;
        double[] q = new double[n];
        double[] p = new double[n];
        p[0] = 0;
        for (int i = 1; i < n; i++) {
            q[i] = q[i - 1] + flowSteps.get(i - 1);
        }
        double total = 0;
        for (int i = n - 2; i >= 0; i--) {
            total += pressureDrops.get(i);
            p[i] = total;
        }
        return new FanCurve(q, p);
    }

    @Property(tries = 300)
    void interpolationNeverOvershootsNorRises(
            @ForAll @Size(min = 1, max = 8) List<@DoubleRange(min = 0.01, max = 3) Double> flowSteps,
            @ForAll @Size(min = 1, max = 8) List<@DoubleRange(min = 0, max = 400) Double> pressureDrops) {
        FanCurve c = curve(flowSteps, pressureDrops);
        double[] q = c.flows();
        double[] p = c.pressures();
        for (int k = 0; k < q.length - 1; k++) {
            double previous = p[k];
            for (int j = 0; j <= 50; j++) {
                double at = Math.min(q[k] + (q[k + 1] - q[k]) * j / 50.0, q[k + 1]);
                double v = c.pressure(at);
                assertThat(v).isBetween(p[k + 1] - 1e-9 * p[0], p[k] + 1e-9 * p[0]);
                assertThat(v).isLessThanOrEqualTo(previous + 1e-9 * p[0]);
                previous = v;
            }
        }
    }

    /** The operating point lies on both curves. */
    @Property(tries = 200)
    void operatingPointLiesOnBothCurves(
            @ForAll @Size(min = 1, max = 8) List<@DoubleRange(min = 0.01, max = 3) Double> flowSteps,
            @ForAll @Size(min = 1, max = 8) List<@DoubleRange(min = 1, max = 400) Double> pressureDrops,
            @ForAll @DoubleRange(min = 1, max = 2000) double k) {
        FanCurve c = curve(flowSteps, pressureDrops);
        OperatingPoint op = c.operatingPoint(q -> k * q * q);
        assertThat(op.flow()).isBetween(c.minFlow(), c.maxFlow());
        assertThat(op.staticPressure()).isCloseTo(k * op.flow() * op.flow(),
                org.assertj.core.api.Assertions.within(1e-6 * c.shutOffPressure()));
        assertThat(op.staticPressure()).isCloseTo(c.pressure(op.flow()),
                org.assertj.core.api.Assertions.within(1e-9 * c.shutOffPressure()));
    }
}
