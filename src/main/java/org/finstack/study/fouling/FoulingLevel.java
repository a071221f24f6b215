package org.finstack.study.fouling;

import org.finstack.coil.CoilCase;
import org.finstack.coil.FoulingResistances;
import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.geometry.CoilGeometry;

/**
 * A level of air-side particulate fouling given physically: a deposit of uniform thickness on
 * every air-side surface, of a given effective conductivity. Applied to a case
 * ({@link #applyTo}) it gives two cases:
 * <ul>
 * <li>the <b>hydraulic</b> case: the coil as the air sees it, its passages narrowed by the
 *     deposit ({@link DepositLayer#fouled}), so the free-flow area, hydraulic diameter, Reynolds
 *     number, friction factor and air pressure drop all come from the fouled geometry. The fan
 *     meets this case's pressure-drop curve. It is rated with dry air: the rating models use the
 *     dry friction factor on wet and frosted coils alike, so only the leaving air's density, and
 *     with it the flow-acceleration term of the pressure drop, differs (by about 1 % of the
 *     pressure drop); the dry rating spares the wet-surface iteration at each trial airflow.</li>
 * <li>the <b>thermal</b> case: the clean coil with the deposit's conduction resistance
 *     R = delta / k_deposit [m2 K/W] added to its air-side fouling resistance (acting through
 *     the surface effectiveness), rated at the airflow the fan delivers through the fouled coil.</li>
 * </ul>
 * <p><b>Why the heat-transfer coefficient is not taken from the fouled geometry.</b> The plain-fin
 * correlation of Wang, Chi &amp; Chang (2000) carries (Fp/Dh) to a power near +3.7 at ReDc 5000
 * for two rows; fed the narrowed passages of a 0.24 mm deposit on a 12 fpi coil it raises j from
 * 0.0070 to 0.0171 and the coil's capacity by 70 % at the same airflow (measured with this
 * program). The correlation's database never held fouled fins, and the fouling tests show the
 * opposite sign: Bell &amp; Groll (2011) found large pressure-drop rises with small changes of
 * heat transfer. The air-side coefficient therefore stays that of the clean surface at the
 * delivered airflow; the deposit acts on heat transfer through its resistance and through the
 * airflow the fan loses to the higher pressure drop.
 *
 * <p><b>Deposit conductivity.</b> A dust deposit on a coil is a loose porous layer whose pores
 * hold air; its effective conductivity is a few times that of still air. The default
 * {@link #DUST_CONDUCTIVITY} = 0.1 W/(m K) is <em>from memory</em>, of the order used for
 * particle-deposit layers in the fin-efficiency model of Zhan, Zhuang &amp; Ding (2018)
 * ({@link #DEPOSIT_SOURCE}); no measured value for coil dust was read. It can be set.
 *
 * <p>Users who know only a fouling resistance keep the case's {@code fouling.airSide}: it is
 * kept and the deposit's resistance is added to it.
 *
 * <p>Worked example: a 0.1 mm dust layer at 0.1 W/(m K) adds R = 0.001 m2 K/W.
 *
 * @param thickness    deposit thickness on each air-side surface [m]
 * @param conductivity effective conductivity of the deposit [W/(m K)]
 */
public record FoulingLevel(double thickness, double conductivity) {

    /**
     * Effective conductivity of a loose dust deposit [W/(m K)]; from memory, of the order of the
     * deposit conductivities in {@link #DEPOSIT_SOURCE}, not read from a table.
     */
    public static final double DUST_CONDUCTIVITY = 0.1;

    /** Where the deposit-layer picture (a low-conductivity layer over the fin) comes from. */
    public static final Citation DEPOSIT_SOURCE = Citation.of("Zhan, Zhuang & Ding 2018",
            "Zhan F., Zhuang D., Ding G. (2018). An analytical model for predicting the particle-deposited fin"
                    + " efficiency. International Journal of Refrigeration 92 (August 2018)."
                    + " doi:10.1016/j.ijrefrig.2018.03.021");

    /** A clean coil. */
    public static final FoulingLevel CLEAN = new FoulingLevel(0, DUST_CONDUCTIVITY);

    /** Validates the values. */
    public FoulingLevel {
        Check.nonNegative("depositThickness", thickness);
        Check.positive("depositConductivity", conductivity);
    }

    /**
     * @param thickness deposit thickness [m]
     * @return a dust deposit of that thickness at {@link #DUST_CONDUCTIVITY}
     */
    public static FoulingLevel dust(double thickness) {
        return new FoulingLevel(thickness, DUST_CONDUCTIVITY);
    }

    /** @return the deposit's conduction resistance delta / k [m2 K/W] */
    public double resistance() {
        return thickness / conductivity;
    }

    /**
     * @param coil the clean coil
     * @return the share of the clean minimum free-flow area the deposit blocks [-]
     */
    public double blockedFraction(CoilGeometry coil) {
        return DepositLayer.blockedFraction(coil, thickness);
    }

    /**
     * The case with this deposit: the hydraulic case (fouled geometry) and the thermal case
     * (clean geometry), both with the deposit's resistance added to the case's own air-side
     * fouling resistance (inside fouling and contact kept).
     *
     * @param clean the clean case (its {@code fouling.airSide}, if any, is kept and added to)
     * @return the fouled case
     */
    public FoulingCase applyTo(CoilCase clean) {
        if (thickness == 0) {
            return new FoulingCase(clean, clean, 0);
        }
        CoilGeometry fouled = DepositLayer.fouled(clean.coil(), thickness, "depositThickness");
        FoulingResistances f = clean.fouling();
        FoulingResistances added = new FoulingResistances(f.airSide() + resistance(), f.inside(), f.contact());
        double blocked = DepositLayer.blockedFraction(clean.coil().derive(), fouled.derive());
        org.finstack.coil.AirInlet a = clean.air();
        org.finstack.coil.AirInlet dry = new org.finstack.coil.AirInlet(a.temperature(), a.faceVelocity(),
                a.volumeFlow(), a.pressure(), 0);
        return new FoulingCase(clean.withCoil(fouled).withFouling(added).withAir(dry), clean.withFouling(added),
                blocked);
    }

    /**
     * A case with a deposit applied.
     *
     * @param hydraulic       the fouled geometry with the added resistance: rated for the air
     *                        pressure drop
     * @param thermal         the clean geometry with the added resistance: rated for the capacity
     * @param blockedFraction share of the clean free-flow area blocked [-]
     */
    public record FoulingCase(CoilCase hydraulic, CoilCase thermal, double blockedFraction) {
    }
}
