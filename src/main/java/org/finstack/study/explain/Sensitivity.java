package org.finstack.study.explain;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.concurrent.CancellationException;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.FoulingResistances;
import org.finstack.coil.Rating;
import org.finstack.coil.RefrigerantSide;
import org.finstack.core.FinstackException;
import org.finstack.material.Material;
import org.finstack.material.Materials;
import org.finstack.study.Progress;
import org.finstack.study.Sweep;

/**
 * How much capacity and air pressure drop answer to a stated step in each input, one input at a
 * time from a base case, each step rated with the model the case names ({@link CoilModels#rate}).
 * The effects are sorted by the size of their effect on capacity, largest first: the data of a
 * tornado chart. A step that makes an impossible coil carries its reason and sorts last.
 *
 * <p>The steps ({@link Input}) are Finstack's choice of a small, realistic change a designer or
 * service engineer can make or meet; the fouling step, 0.0002 m2 K/W, is a light dust film on
 * the fins (common practice).
 */
public final class Sensitivity {

    /** Tube materials counted as copper for the tube-material step. */
    private static final Set<String> COPPERS = Set.of("copper", "copper-etp");

    /** Air-side fouling step [m2 K/W]: a light dust film (common practice). */
    public static final double FOULING_STEP = 2e-4;

    private Sensitivity() {
    }

    /** The inputs stepped, with their steps. */
    public enum Input {
        /** Fin density 10 % higher. */
        FIN_DENSITY("fin density", "10 % more fins per metre"),
        /** One more row. */
        ROWS("rows", "one more row"),
        /** Face velocity 10 % higher. */
        FACE_VELOCITY("face velocity", "10 % more air"),
        /** Tube wall 0.1 mm thicker. */
        TUBE_WALL("tube wall", "a tube wall 0.1 mm thicker"),
        /** Copper tubes become aluminium-3003 (any other tube becomes copper). */
        TUBE_MATERIAL("tube material", "aluminium-3003 tubes in place of copper"),
        /** Fins 0.02 mm thicker. */
        FIN_THICKNESS("fin thickness", "fins 0.02 mm thicker"),
        /** Air-side fouling higher by {@link #FOULING_STEP}. */
        AIR_FOULING("air-side fouling", "a light dust film on the fins (0.0002 m2 K/W more air-side fouling)"),
        /** Saturation temperature 1 K higher. */
        SATURATION_TEMPERATURE("saturation temperature", "a saturation temperature 1 K higher");

        private final String label;
        private final String step;

        Input(String label, String step) {
            this.label = label;
            this.step = step;
        }

        /** @return the input's name in words */
        public String label() {
            return label;
        }

        /** @return the step in words */
        public String step() {
            return step;
        }
    }

    /**
     * The effect of one step.
     *
     * @param input  the input stepped
     * @param step   the step in words
     * @param rating the rating after the step, or null
     * @param error  why the step could not be rated, or null
     * @param capacityChange        rating capacity less base capacity [W]
     * @param airPressureDropChange rating air pressure drop less base's [Pa]
     * @param capacityFraction      capacity change over base capacity [-]
     * @param airPressureDropFraction air pressure drop change over base's [-]
     */
    public record Effect(Input input, String step, Rating rating, String error, double capacityChange,
            double airPressureDropChange, double capacityFraction, double airPressureDropFraction) {

        /** @return whether the step was rated */
        public boolean rated() {
            return rating != null;
        }
    }

    /**
     * The base and the effects.
     *
     * @param base       the base case
     * @param baseRating its rating
     * @param effects    the effects, largest effect on capacity first, unrated steps last
     * @param cleaning   the effect of removing the case's air-side fouling, or null when it has none
     */
    public record Result(CoilCase base, Rating baseRating, List<Effect> effects, Effect cleaning) {

        /** Freezes the list. */
        public Result {
            effects = List.copyOf(effects);
        }

        /**
         * @param input an input
         * @return its effect
         */
        public Effect effect(Input input) {
            return effects.stream().filter(e -> e.input() == input).findFirst().orElseThrow();
        }
    }

    /**
     * Steps each input of a case, with no progress reports.
     *
     * @param base the case
     * @return the base rating and the effects, sorted
     * @throws FinstackException if the base case itself cannot be rated
     */
    public static Result of(CoilCase base) {
        return of(base, Progress.NONE);
    }

    /**
     * Steps each input of a case. The ratings are the base, one per {@link Input} and, when the
     * case has air-side fouling, the cleaned coil; {@code progress} is told after each of them.
     *
     * @param base     the case
     * @param progress told after each rating; asked before each rating whether to stop
     * @return the base rating and the effects, sorted
     * @throws FinstackException if the base case itself cannot be rated
     * @throws CancellationException when {@code progress} asked to stop
     */
    public static Result of(CoilCase base, Progress progress) {
        Objects.requireNonNull(base, "base");
        Objects.requireNonNull(progress, "progress");
        boolean fouled = base.fouling().airSide() > 0;
        int total = 1 + Input.values().length + (fouled ? 1 : 0);
        int done = 0;
        stopIfCancelled(progress);
        Rating r0 = CoilModels.rate(base);
        progress.step(++done, total);
        List<Effect> effects = new ArrayList<>();
        for (Input in : Input.values()) {
            stopIfCancelled(progress);
            String step = in.step();
            if (in == Input.TUBE_MATERIAL && !COPPERS.contains(base.coil().tubeMaterial().id())) {
                step = "copper tubes in place of " + base.coil().tubeMaterial().id();
            }
            try {
                effects.add(effect(in, step, r0, CoilModels.rate(stepped(base, in))));
            } catch (FinstackException e) {
                effects.add(new Effect(in, step, null, e.getMessage(), 0, 0, 0, 0));
            }
            progress.step(++done, total);
        }
        effects.sort(Comparator.comparing((Effect e) -> !e.rated())
                .thenComparing(Comparator.comparingDouble((Effect e) -> Math.abs(e.capacityFraction())).reversed())
                .thenComparing(Comparator.comparingDouble((Effect e) -> Math.abs(e.airPressureDropFraction())).reversed()));
        Effect cleaning = null;
        if (fouled) {
            stopIfCancelled(progress);
            String step = "cleaning the fins (no air-side fouling)";
            FoulingResistances f = base.fouling();
            try {
                cleaning = effect(Input.AIR_FOULING, step, r0, CoilModels.rate(base.withFouling(
                        new FoulingResistances(0, f.inside(), f.contact()))));
            } catch (FinstackException e) {
                cleaning = new Effect(Input.AIR_FOULING, step, null, e.getMessage(), 0, 0, 0, 0);
            }
            progress.step(++done, total);
        }
        return new Result(base, r0, effects, cleaning);
    }

    /**
     * @param base a case
     * @param in   an input
     * @return the case after the input's step
     */
    public static CoilCase stepped(CoilCase base, Input in) {
        var g = base.coil();
        return switch (in) {
            case FIN_DENSITY -> base.withCoil(g.withFinPitch(g.finPitch() / 1.1));
            case ROWS -> base.withCoil(g.withRows(g.rows() + 1));
            case FACE_VELOCITY -> Sweep.Parameter.FACE_VELOCITY.apply(base,
                    1.1 * Sweep.Parameter.FACE_VELOCITY.valueIn(base));
            case TUBE_WALL -> base.withCoil(g.withTubeWall(g.tubeWall() + 1e-4));
            case TUBE_MATERIAL -> base.withCoil(g.withTubeMaterial(otherTube(g.tubeMaterial())));
            case FIN_THICKNESS -> base.withCoil(g.withFinThickness(g.finThickness() + 2e-5));
            case AIR_FOULING -> base.withFouling(new FoulingResistances(base.fouling().airSide() + FOULING_STEP,
                    base.fouling().inside(), base.fouling().contact()));
            case SATURATION_TEMPERATURE -> base.withRefrigerant(withSaturation(base.refrigerant(),
                    base.refrigerant().saturationTemperature() + 1));
        };
    }

    /**
     * @param r a refrigerant side
     * @param t another saturation temperature [K]
     * @return the side with it
     */
    public static RefrigerantSide withSaturation(RefrigerantSide r, double t) {
        return new RefrigerantSide(r.fluid(), r.duty(), t, r.convention(), r.insideCoefficient(),
                r.liquidTemperature(), r.inletTemperature(), r.target(), r.model(), r.segments());
    }

    private static Material otherTube(Material m) {
        return Materials.library().tube("coil.tubeMaterial", COPPERS.contains(m.id()) ? "aluminium-3003" : "copper");
    }

    private static void stopIfCancelled(Progress progress) {
        if (progress.cancelled()) {
            throw new CancellationException("sensitivity cancelled");
        }
    }

    private static Effect effect(Input in, String step, Rating base, Rating r) {
        double dq = r.capacity() - base.capacity();
        double dp = r.airPressureDrop() - base.airPressureDrop();
        return new Effect(in, step, r, null, dq, dp, dq / base.capacity(),
                base.airPressureDrop() > 0 ? dp / base.airPressureDrop() : 0);
    }
}
