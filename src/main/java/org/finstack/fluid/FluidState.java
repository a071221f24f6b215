package org.finstack.fluid;

import java.util.Objects;
import org.finstack.core.FinstackException;
import org.finstack.core.Msg;

/**
 * One thermodynamic state of a fluid. Immutable.
 *
 * <p>Quality: in [0, 1] for a {@link Phase#TWO_PHASE} state and for a saturated liquid (0) or
 * saturated vapour (1) reached through {@link InputPair#PQ}/{@link InputPair#TQ} or a
 * {@link SaturationState}; -1 for every other single-phase state (never NaN).
 *
 * <p>Heat capacities and speed of sound are properties of one phase: for a TWO_PHASE state the
 * accessors {@link #cp()}, {@link #cv()} and {@link #speedOfSound()} throw a
 * {@link FinstackException}; take them from {@link SaturationState#liquid()} and
 * {@link SaturationState#vapour()} instead (see {@link #hasSinglePhaseProperties()}).
 *
 * @param temperature  T [K]
 * @param pressure     p [Pa]
 * @param density      rho [kg/m3] (for two-phase: mass over total volume)
 * @param enthalpy     h [J/kg]
 * @param entropy      s [J/(kg K)]
 * @param cp           isobaric heat capacity [J/(kg K)]
 * @param cv           isochoric heat capacity [J/(kg K)]
 * @param speedOfSound w [m/s]
 * @param phase        the phase
 * @param quality      vapour mass fraction [-], or -1 (see above)
 */
public record FluidState(double temperature, double pressure, double density, double enthalpy,
        double entropy, double cp, double cv, double speedOfSound, Phase phase, double quality) {

    /** Quality of a single-phase state that is not on the saturation line. */
    public static final double NO_QUALITY = -1;

    /** Checks that every value is finite and the quality fits the phase. */
    public FluidState {
        Objects.requireNonNull(phase, "phase");
        double[] all = {temperature, pressure, density, enthalpy, entropy, cp, cv, speedOfSound, quality};
        for (double v : all) {
            if (!Double.isFinite(v)) {
                throw new FinstackException(Msg.IMPOSSIBLE, "a fluid state with a value that is not finite");
            }
        }
        boolean ok = phase == Phase.TWO_PHASE ? quality >= 0 && quality <= 1
                : quality == NO_QUALITY || quality == 0 || quality == 1;
        if (!ok) {
            throw new FinstackException(Msg.IMPOSSIBLE, "quality " + quality + " for phase " + phase);
        }
    }

    /** @return whether cp, cv and speed of sound are defined (every phase but TWO_PHASE) */
    public boolean hasSinglePhaseProperties() {
        return phase != Phase.TWO_PHASE;
    }

    /** @return isobaric heat capacity [J/(kg K)]; not defined for a two-phase state */
    @Override
    public double cp() {
        requireSinglePhase("cp");
        return cp;
    }

    /** @return isochoric heat capacity [J/(kg K)]; not defined for a two-phase state */
    @Override
    public double cv() {
        requireSinglePhase("cv");
        return cv;
    }

    /** @return speed of sound [m/s]; not defined for a two-phase state */
    @Override
    public double speedOfSound() {
        requireSinglePhase("speed of sound");
        return speedOfSound;
    }

    /** @return specific internal energy u = h - p / rho [J/kg] */
    public double internalEnergy() {
        return enthalpy - pressure / density;
    }

    private void requireSinglePhase(String what) {
        if (phase == Phase.TWO_PHASE) {
            throw new FinstackException(Msg.IMPOSSIBLE, what
                    + " is not defined for a two-phase state; take it from the saturated liquid or vapour");
        }
    }
}
