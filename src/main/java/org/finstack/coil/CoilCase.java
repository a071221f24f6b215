package org.finstack.coil;

import java.util.List;
import java.util.Objects;
import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.geometry.CoilGeometry;

/**
 * Everything a rating needs: the coil, the air, the refrigerant side, the added resistances, and
 * for the tube-by-tube model the circuiting and the air's face-velocity profile.
 *
 * @param coil         the coil
 * @param air          the entering air
 * @param refrigerant  the refrigerant side
 * @param fouling      added resistances
 * @param circuiting   the tubes' order per circuit, or {@code null} for the standard pattern
 * @param airProfile   relative face velocity of each tube place from the top (mean 1), or an
 *                     empty list for uniform air
 * @param factors      multipliers on the air-side correlation's j and f ({@link CorrelationFactors});
 *                     {@code null} reads as {@link CorrelationFactors#NONE}. An internal hook for
 *                     the Monte Carlo band and sensitivities, not a case-file key: a case read from
 *                     a file has NONE
 */
public record CoilCase(CoilGeometry coil, AirInlet air, RefrigerantSide refrigerant, FoulingResistances fouling,
        Circuiting circuiting, List<Double> airProfile, CorrelationFactors factors) {

    /** Checks all parts are present and fit together. */
    public CoilCase {
        Objects.requireNonNull(coil, "coil");
        Objects.requireNonNull(air, "air");
        Objects.requireNonNull(refrigerant, "refrigerant");
        fouling = fouling == null ? FoulingResistances.NONE : fouling;
        if (circuiting != null) {
            if (circuiting.rows() != coil.rows() || circuiting.tubesPerRow() != coil.tubesPerRow()) {
                throw new InputException("coil.circuiting", Msg.IMPOSSIBLE, "is written for " + circuiting.rows()
                        + " rows of " + circuiting.tubesPerRow() + " tubes, the coil has " + coil.rows() + " of "
                        + coil.tubesPerRow());
            }
            if (circuiting.count() != coil.circuits()) {
                throw new InputException("coil.circuiting", Msg.IMPOSSIBLE, "lists " + circuiting.count()
                        + " circuits but coil.circuits is " + coil.circuits());
            }
        }
        airProfile = airProfile == null ? List.of() : List.copyOf(airProfile);
        if (!airProfile.isEmpty()) {
            if (airProfile.size() != coil.tubesPerRow()) {
                throw new InputException("air.faceVelocityProfile", Msg.IMPOSSIBLE, "needs one value per tube place ("
                        + coil.tubesPerRow() + "), got " + airProfile.size());
            }
            double sum = 0;
            for (int i = 0; i < airProfile.size(); i++) {
                sum += Check.positive("air.faceVelocityProfile[" + i + "]", airProfile.get(i));
            }
            double mean = sum / airProfile.size();
            airProfile = airProfile.stream().map(v -> v / mean).toList();
        }
        factors = factors == null ? CorrelationFactors.NONE : factors;
    }

    /**
     * A case with the correlation as published ({@link CorrelationFactors#NONE}).
     *
     * @param coil        the coil
     * @param air         the entering air
     * @param refrigerant the refrigerant side
     * @param fouling     added resistances
     * @param circuiting  the tubes' order per circuit, or {@code null} for the standard pattern
     * @param airProfile  relative face velocity of each tube place from the top, or an empty list
     */
    public CoilCase(CoilGeometry coil, AirInlet air, RefrigerantSide refrigerant, FoulingResistances fouling,
            Circuiting circuiting, List<Double> airProfile) {
        this(coil, air, refrigerant, fouling, circuiting, airProfile, CorrelationFactors.NONE);
    }

    /**
     * A case with the standard circuiting and uniform air.
     *
     * @param coil        the coil
     * @param air         the entering air
     * @param refrigerant the refrigerant side
     * @param fouling     added resistances
     */
    public CoilCase(CoilGeometry coil, AirInlet air, RefrigerantSide refrigerant, FoulingResistances fouling) {
        this(coil, air, refrigerant, fouling, null, List.of());
    }

    /** @return the circuiting to use: the given one or the standard pattern */
    public Circuiting effectiveCircuiting() {
        return circuiting != null ? circuiting : Circuiting.standard(coil.rows(), coil.tubesPerRow(), coil.circuits());
    }

    /**
     * @param geometry another coil
     * @return this case with another coil (the circuiting is dropped if it no longer fits)
     */
    public CoilCase withCoil(CoilGeometry geometry) {
        boolean fits = circuiting != null && circuiting.rows() == geometry.rows()
                && circuiting.tubesPerRow() == geometry.tubesPerRow() && circuiting.count() == geometry.circuits();
        boolean profileFits = airProfile.size() == geometry.tubesPerRow();
        return new CoilCase(geometry, air, refrigerant, fouling, fits ? circuiting : null,
                profileFits ? airProfile : List.of(), factors);
    }

    /**
     * @param f other resistances
     * @return this case with other added resistances
     */
    public CoilCase withFouling(FoulingResistances f) {
        return new CoilCase(coil, air, refrigerant, f, circuiting, airProfile, factors);
    }

    /**
     * @param r another refrigerant side
     * @return this case with it
     */
    public CoilCase withRefrigerant(RefrigerantSide r) {
        return new CoilCase(coil, air, r, fouling, circuiting, airProfile, factors);
    }

    /**
     * @param a other entering air
     * @return this case with it
     */
    public CoilCase withAir(AirInlet a) {
        return new CoilCase(coil, a, refrigerant, fouling, circuiting, airProfile, factors);
    }

    /**
     * @param f multipliers on the air-side correlation's j and f
     * @return this case with them (in place of any it had)
     */
    public CoilCase withFactors(CorrelationFactors f) {
        return new CoilCase(coil, air, refrigerant, fouling, circuiting, airProfile, f);
    }
}
