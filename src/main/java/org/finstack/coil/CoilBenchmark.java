package org.finstack.coil;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.finstack.geometry.Arrangement;
import org.finstack.geometry.CoilGeometry;
import org.finstack.material.Materials;

/**
 * Times the rating models on the benchmark coil the product fixes: 4 rows of 24 tubes, 6
 * circuits, 3/8 in copper tubes on 25.4 x 22 mm, 12 fpi plain aluminium fins, 1 m finned, an
 * R-134a evaporator at 7 C in 27 C / 50 % air with 5 K superheat (the mass flow is solved), 10
 * segments per tube for the tube-by-tube model. A measurement, not a test: medians of repeated
 * ratings after a warm-up of {@value #WARM_UP_SECONDS_PER_RUN} s per timed run (at most
 * {@value #MAX_WARM_UP_SECONDS} s) per case, wall-clock on
 * whatever machine runs it.
 */
public final class CoilBenchmark {

    private CoilBenchmark() {
    }

    /**
     * The measurements.
     *
     * @param zoneMedianMs       zone model, median of the runs [ms]
     * @param tubeMedianMs       tube-by-tube model at 10 segments per tube [ms]
     * @param segments           segment counts timed for the tube model
     * @param tubeMedianMsBySegments tube-model medians for those counts [ms]
     * @param runs               ratings per median
     */
    public record Result(double zoneMedianMs, double tubeMedianMs, int[] segments, double[] tubeMedianMsBySegments,
            int runs) {
    }

    /**
     * @param segments tube-model segment counts to time (10 is always included)
     * @return the benchmark case with that many segments per tube and the given model
     * @param model    the rating model
     */
    public static CoilCase benchmarkCase(RefrigerantSide.Model model, int segments) {
        Materials lib = Materials.library();
        CoilGeometry g = new CoilGeometry(9.52e-3, 0.30e-3, lib.tube("t", "copper"), Arrangement.STAGGERED, 25.4e-3,
                22e-3, 4, 24, 1.0, "plain", 0.0254 / 12, 0.115e-3, lib.fin("f", "aluminium"), 6, null, 0);
        RefrigerantSide r = new RefrigerantSide("R134a", Duty.EVAPORATOR, 280.15, RefrigerantSide.SaturationConvention.DEW,
                0, 313.15, 0, new RefrigerantSide.Target.Superheat(5), model, segments);
        return new CoilCase(g, new AirInlet(300.15, 2.2, 0, 101_325, 0.5), r, FoulingResistances.NONE);
    }

    /**
     * @param runs     ratings per median (after as many warm-up ratings)
     * @param segments tube-model segment counts to time
     * @return the medians
     */
    public static Result run(int runs, int[] segments) {
        double zone = median(benchmarkCase(RefrigerantSide.Model.ZONES, 10), runs);
        double tube = median(benchmarkCase(RefrigerantSide.Model.TUBES, 10), runs);
        List<Double> bySegments = new ArrayList<>();
        for (int n : segments) {
            bySegments.add(median(benchmarkCase(RefrigerantSide.Model.TUBES, n), runs));
        }
        return new Result(zone, tube, segments.clone(), bySegments.stream().mapToDouble(Double::doubleValue).toArray(),
                runs);
    }

    /**
     * Warm-up time per case and timed run before timing, up to {@value #MAX_WARM_UP_SECONDS} s
     * (the just-in-time compiler settles meanwhile) [s].
     */
    static final double WARM_UP_SECONDS_PER_RUN = 0.2;

    /** Longest warm-up per case [s]. */
    static final double MAX_WARM_UP_SECONDS = 2;

    private static double median(CoilCase c, int runs) {
        long warmStart = System.nanoTime();
        double warmUp = Math.min(MAX_WARM_UP_SECONDS, WARM_UP_SECONDS_PER_RUN * runs) * 1e9;
        for (int i = 0; i < runs || System.nanoTime() - warmStart < warmUp; i++) {
            CoilModels.rate(c);
        }
        double[] t = new double[runs];
        for (int i = 0; i < runs; i++) {
            long start = System.nanoTime();
            CoilModels.rate(c);
            t[i] = (System.nanoTime() - start) * 1e-6;
        }
        Arrays.sort(t);
        return runs % 2 == 1 ? t[runs / 2] : 0.5 * (t[runs / 2 - 1] + t[runs / 2]);
    }
}
