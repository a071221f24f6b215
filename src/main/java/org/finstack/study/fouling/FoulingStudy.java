package org.finstack.study.fouling;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.CancellationException;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.finstack.coil.CoilCase;
import org.finstack.core.Check;
import org.finstack.core.ConvergenceException;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Numbers;
import org.finstack.study.Progress;

/**
 * What air-side fouling costs a coil, from clean to heavily fouled, with the fan in the loop
 * ({@link FanInLoop}); and the fouling level behind a measured rise of the air-side pressure
 * drop, the figure a technician can read with a manometer across the coil.
 *
 * <p>Each level is a {@link FoulingLevel}: a deposit of thickness delta narrowing the passages
 * ({@link DepositLayer}) and adding delta / k_deposit. "Heavily fouled" is, by default, a
 * deposit filling {@link #HEAVY_GAP_FILL} of the clean fin gap (a choice of this program, not a
 * published figure; the published coil-fouling tests report the dust fed, not the layer).
 *
 * <p><b>Inferred level.</b> The rise of the pressure drop from the clean coil at its operating
 * airflow to the fouled coil at its own, dp(delta) - dp(0), grows with delta; the level is its
 * root against the measured rise on [0, the thickest layer of {@link DepositLayer#maxThickness}],
 * found by Brent's method (Commons Math) to {@link #THICKNESS_TOLERANCE} in at most
 * {@link #MAX_EVALUATIONS} evaluations. A rise beyond what the thickest layer gives is refused.
 *
 * <p>Worked example (test {@code FoulingStudyTest}): the small R-404A cooler of the tests at
 * 6 fpi with an axial fan loses capacity and airflow monotonically from clean to heavy, and a
 * rise produced by a 0.2 mm layer is traced back to 0.2 mm.
 */
public final class FoulingStudy {

    /** Share of the clean fin gap a "heavily fouled" coil's deposit fills [-]; a choice of this program. */
    public static final double HEAVY_GAP_FILL = 0.4;

    /** Most fan-coupled ratings spent inferring a level. */
    public static final int MAX_EVALUATIONS = 60;

    /** Absolute tolerance of the inferred thickness [m]. */
    public static final double THICKNESS_TOLERANCE = 1e-9;

    /**
     * Fields of the refusals that say the fan finds no operating point: the coil's drop above the
     * curve's first point ({@link org.finstack.study.fan.FanCurve}) or above shut-off
     * ({@link FanInLoop}).
     */
    private static final Set<String> NO_OPERATING_POINT = Set.of("systemCurve", "fan");

    private FoulingStudy() {
    }

    /**
     * @param clean the clean case
     * @return the default "heavily fouled" deposit thickness for its coil [m]
     */
    public static double heavyThickness(CoilCase clean) {
        double byGap = HEAVY_GAP_FILL * (clean.coil().finPitch() - clean.coil().finThickness()) / 2;
        return Math.min(byGap, DepositLayer.maxThickness(clean.coil()));
    }

    /**
     * Capacity, airflow and pressure drop at evenly spaced deposit thicknesses.
     *
     * @param clean        the clean case (its airflow is the fan's starting guess; its own
     *                     air-side and inside fouling resistances are kept at every level)
     * @param fan          the fan, or {@code null} to hold the airflow
     * @param conductivity deposit conductivity [W/(m K)]
     * @param maxThickness the last level's deposit thickness [m]
     * @param levels       number of levels, 2 to 200, the first clean
     * @return the curve
     */
    public static FoulingCurve curve(CoilCase clean, CoilFan fan, double conductivity, double maxThickness,
            int levels) {
        return curve(clean, fan, conductivity, maxThickness, levels, Progress.NONE);
    }

    /**
     * Capacity, airflow and pressure drop at evenly spaced deposit thicknesses, reporting each
     * level done and stopping between levels when asked.
     *
     * @param clean        the clean case (its airflow is the fan's starting guess; its own
     *                     air-side and inside fouling resistances are kept at every level)
     * @param fan          the fan, or {@code null} to hold the airflow
     * @param conductivity deposit conductivity [W/(m K)]
     * @param maxThickness the last level's deposit thickness [m]
     * @param levels       number of levels, 2 to 200, the first clean
     * @param progress     hears of each level done; checked for cancellation before each level
     * @return the curve; where the fan finds no operating point at a level (the deposit has choked
     *         it, or the airflow has left the part of its curve given), the curve ends at the
     *         level before, with a note saying so
     * @throws CancellationException when {@code progress} asks to stop
     */
    public static FoulingCurve curve(CoilCase clean, CoilFan fan, double conductivity, double maxThickness,
            int levels, Progress progress) {
        Check.positive("depositConductivity", conductivity);
        Check.positive("maxThickness", maxThickness);
        if (levels < 2 || levels > 200) {
            throw new InputException("levels", Msg.OUT_OF_BOUNDS, (double) levels, 2.0, 200.0);
        }
        Set<String> warnings = new LinkedHashSet<>(FoulingSusceptibility.warnings(clean.coil()));
        List<String> notes = new ArrayList<>(notes(fan));
        List<FoulingPoint> points = new ArrayList<>();
        FoulingPoint first = null;
        double guess = 0;
        for (int i = 0; i < levels; i++) {
            if (progress.cancelled()) {
                throw new CancellationException("fouling curve cancelled");
            }
            FoulingLevel level = new FoulingLevel(maxThickness * i / (levels - 1), conductivity);
            FoulingPoint p;
            try {
                p = point(clean, fan, level, guess, first, warnings);
            } catch (InputException e) {
                if (first == null || !NO_OPERATING_POINT.contains(e.field())) {
                    throw e;
                }
                // the coil has choked the fan (or left its curve): the levels before still stand
                notes.add(String.format(Locale.ROOT, "the curve ends at %.3g mm of deposit: at %.3g mm the fan no "
                        + "longer finds an operating point (%s)", points.get(points.size() - 1).thickness() * 1e3,
                        level.thickness() * 1e3, e.getMessage()));
                break;
            }
            if (first == null) {
                first = p;
            }
            guess = p.airflow();
            points.add(p);
            progress.step(i + 1, levels);
        }
        return new FoulingCurve(points, notes, new ArrayList<>(warnings));
    }

    /**
     * The level behind a measured rise of the air-side pressure drop.
     *
     * @param clean        the clean case
     * @param fan          the fan, or {@code null} to hold the airflow
     * @param conductivity deposit conductivity [W/(m K)]
     * @param measuredRise dp now minus dp clean, both at the running airflow [Pa]
     * @return the inferred level with its rating and the clean one
     */
    public static Inferred infer(CoilCase clean, CoilFan fan, double conductivity, double measuredRise) {
        Check.positive("depositConductivity", conductivity);
        Check.nonNegative("measuredRise", measuredRise);
        Set<String> warnings = new LinkedHashSet<>(FoulingSusceptibility.warnings(clean.coil()));
        FoulingPoint cleanPoint = point(clean, fan, new FoulingLevel(0, conductivity), 0, null, warnings);
        if (measuredRise == 0) {
            return new Inferred(cleanPoint, cleanPoint, measuredRise, 0, notes(fan), new ArrayList<>(warnings));
        }
        double hi = DepositLayer.maxThickness(clean.coil());
        FoulingPoint top = point(clean, fan, new FoulingLevel(hi, conductivity), cleanPoint.airflow(), cleanPoint,
                warnings);
        double topRise = top.airPressureDrop() - cleanPoint.airPressureDrop();
        if (measuredRise > topRise) {
            throw new InputException("measuredRise", Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                    "is %s Pa; even a %s mm deposit, which nearly closes this coil's passages, raises the pressure"
                            + " drop by only %s Pa (from %s Pa clean): check the reading",
                    Numbers.brief(measuredRise), Numbers.brief(hi * 1e3), Numbers.brief(topRise),
                    Numbers.brief(cleanPoint.airPressureDrop())));
        }
        int[] count = {0};
        double[] last = {Double.NaN};
        BrentSolver solver = new BrentSolver(1e-10, THICKNESS_TOLERANCE, 0.0);
        double delta;
        try {
            delta = solver.solve(MAX_EVALUATIONS, d -> {
                count[0]++;
                FoulingPoint p = point(clean, fan, new FoulingLevel(d, conductivity), cleanPoint.airflow(),
                        cleanPoint, new LinkedHashSet<>());
                last[0] = p.airPressureDrop() - cleanPoint.airPressureDrop() - measuredRise;
                return last[0];
            }, 0, hi);
        } catch (TooManyEvaluationsException e) {
            throw new ConvergenceException("deposit thickness from the measured pressure-drop rise", MAX_EVALUATIONS,
                    Math.abs(last[0]));
        }
        FoulingPoint found = point(clean, fan, new FoulingLevel(delta, conductivity), cleanPoint.airflow(),
                cleanPoint, warnings);
        return new Inferred(found, cleanPoint, measuredRise, count[0], notes(fan), new ArrayList<>(warnings));
    }

    /**
     * The rise a measured ratio of pressure drops (now over clean) stands for.
     *
     * @param clean the clean case
     * @param fan   the fan, or {@code null}
     * @param ratio dp now / dp clean [-], at least 1
     * @return the rise [Pa]
     */
    public static double riseFromRatio(CoilCase clean, CoilFan fan, double ratio) {
        Check.finite("measuredRatio", ratio);
        if (ratio < 1) {
            throw new InputException("measuredRatio", Msg.IMPOSSIBLE,
                    "must be at least 1 (fouling raises the pressure drop), got " + Numbers.brief(ratio));
        }
        double dp = FanInLoop.rate(clean, fan, 0).airPressureDrop();
        return (ratio - 1) * dp;
    }

    private static FoulingPoint point(CoilCase clean, CoilFan fan, FoulingLevel level, double guess,
            FoulingPoint cleanPoint, Set<String> warnings) {
        FoulingLevel.FoulingCase fc = level.applyTo(clean);
        FanInLoop.LoopRating lr = FanInLoop.rate(fc.hydraulic(), fc.thermal(), fan, guess);
        warnings.addAll(lr.warnings());
        warnings.addAll(lr.rating().warnings());
        double capacity = lr.rating().capacity();
        double loss = cleanPoint == null ? 0 : 1 - capacity / cleanPoint.capacity();
        return new FoulingPoint(level.thickness(), fc.blockedFraction(), level.resistance(), capacity, lr.flow(),
                lr.airPressureDrop(), loss, lr.fanPower());
    }

    private static List<String> notes(CoilFan fan) {
        return fan == null ? List.of(FanInLoop.HELD_CONSTANT)
                : List.of("airflow from the " + fan.describe() + " against the coil's pressure drop at each level");
    }

    /**
     * One fouling level's result.
     *
     * @param thickness            deposit thickness [m]
     * @param blockedFraction      share of the clean free-flow area blocked [-]
     * @param depositResistance    the deposit's conduction resistance [m2 K/W]
     * @param capacity             [W]
     * @param airflow              operating volume flow at the inlet state [m3/s]
     * @param airPressureDrop      air-side pressure drop across the coil [Pa]
     * @param capacityLossFraction 1 - capacity / clean capacity [-]
     * @param fanPower             fan electrical power [W], NaN when unknown
     */
    public record FoulingPoint(double thickness, double blockedFraction, double depositResistance, double capacity,
            double airflow, double airPressureDrop, double capacityLossFraction, double fanPower) {
    }

    /**
     * Capacity against fouling level.
     *
     * @param points   from clean to the thickest deposit
     * @param notes    how the airflow was found
     * @param warnings fin-choice, fan and correlation-range warnings, each once
     */
    public record FoulingCurve(List<FoulingPoint> points, List<String> notes, List<String> warnings) {

        /** Copies the lists. */
        public FoulingCurve {
            points = List.copyOf(points);
            notes = List.copyOf(notes);
            warnings = List.copyOf(warnings);
        }
    }

    /**
     * A level inferred from a measured pressure-drop rise.
     *
     * @param level        the inferred level's result (its capacity loss against {@code clean})
     * @param clean        the clean coil's result
     * @param measuredRise the rise it was inferred from [Pa]
     * @param evaluations  fan-coupled ratings spent by the root search
     * @param notes        how the airflow was found
     * @param warnings     warnings, each once
     */
    public record Inferred(FoulingPoint level, FoulingPoint clean, double measuredRise, int evaluations,
            List<String> notes, List<String> warnings) {

        /** Copies the lists. */
        public Inferred {
            notes = List.copyOf(notes);
            warnings = List.copyOf(warnings);
        }
    }
}
