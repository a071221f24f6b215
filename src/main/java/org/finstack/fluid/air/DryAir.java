package org.finstack.fluid.air;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.Msg;
import org.finstack.core.OutOfRangeException;

/**
 * Properties of dry air near atmospheric pressure, each from a published formulation.
 *
 * <ul>
 *   <li><b>Density</b>: ideal gas, {@code rho = p M / (R T)}, with the molar mass of dry air
 *       {@code M = 28.9644 g/mol} (U.S. Standard Atmosphere 1976, sea-level mean molar mass) and the CODATA 2018 molar gas constant
 *       {@code R = 8.314462618 J/(mol K)}. Error against the real gas: the compressibility factor
 *       of air at 101.325 kPa is about 0.998 at 200 K, 0.9997 at 300 K and 1.0001 at 400 K
 *       (second virial coefficient of air about -35, -7.5 and +3.5 cm3/mol, from memory), so
 *       the ideal-gas density differs from the real gas by at most about 0.2 % (too low, at
 *       200 K and 1 atm); the error grows in proportion to pressure (about 0.4 % at 200 kPa and
 *       200 K).</li>
 *   <li><b>Isobaric heat capacity</b>: ideal-gas part of the Lemmon et al. (2000) equation of
 *       state ({@link #CP_SOURCE}),
 *       {@code cp0/R = 1 + N7 - 12 N1 tau^-3 - 6 N2 tau^-2 - 2 N3 tau^-1 - 0.75 N6 tau^1.5
 *       + N8 E(N11 tau) + N9 E(N12 tau) - N10 (2/3) (N13 tau)^2 e^(N13 tau) / (2/3 + e^(N13 tau))^2},
 *       with {@code E(u) = u^2 e^u / (e^u - 1)^2} and {@code tau = 132.6312 K / T}; converted to
 *       a mass basis with that equation's own {@code R = 8.31451 J/(mol K)} and
 *       {@code M = 28.9586 g/mol}. The real gas at 1 atm has a cp higher by about 0.13 % at
 *       300 K and 0.3 % at 200 K (estimated from the same virial coefficients, from memory).</li>
 *   <li><b>Viscosity and thermal conductivity</b>: dilute-gas terms of Lemmon &amp; Jacobsen
 *       (2004) ({@link #TRANSPORT_SOURCE}),
 *       {@code eta0 = 0.0266958 sqrt(M T) / (sigma^2 Omega(T*))} [uPa s] with
 *       {@code Omega = exp(sum b_i (ln T*)^i)}, {@code T* = T / (epsilon/k)}, and
 *       {@code lambda0 = N1 eta0 + N2 tau^t2 + N3 tau^t3} [mW/(m K)]. The residual (density)
 *       terms are left out; at 1 atm they would add about +0.1 % to the viscosity and +0.1 %
 *       to +0.3 % to the conductivity between 200 K and 400 K (estimated from the leading
 *       residual terms of the same paper), growing in proportion to density.</li>
 * </ul>
 *
 * <p>Range: temperature 200 K to 500 K ({@link #T_MIN}, {@link #T_MAX}), pressure 10 kPa to
 * 200 kPa ({@link #P_MIN}, {@link #P_MAX}). Outside it every method throws an
 * {@link OutOfRangeException} with {@link Msg#FLUID_OUT_OF_RANGE}; a non-finite input throws an
 * {@link org.finstack.core.InputException}.
 *
 * <p>Worked example (air at 300 K, 101 325 Pa): density 1.17660 kg/m3, cp 1005.0 J/(kg K),
 * viscosity 18.523 uPa s, conductivity 26.353 mW/(m K), Prandtl number 0.7064.
 */
public final class DryAir {

    /** Source of the ideal-gas heat capacity. */
    public static final Citation CP_SOURCE = Citation.of("Lemmon et al. 2000",
            "Lemmon, E.W., Jacobsen, R.T., Penoncello, S.G., Friend, D.G., 2000, \"Thermodynamic"
                    + " properties of air and mixtures of nitrogen, argon, and oxygen from 60 to"
                    + " 2000 K at pressures to 2000 MPa\", J. Phys. Chem. Ref. Data 29(3):331-385");

    /** Source of the viscosity and thermal conductivity. */
    public static final Citation TRANSPORT_SOURCE = Citation.of("Lemmon & Jacobsen 2004",
            "Lemmon, E.W., Jacobsen, R.T., 2004, \"Viscosity and thermal conductivity equations"
                    + " for nitrogen, oxygen, argon, and air\", Int. J. Thermophys. 25(1):21-69");

    /** Lowest temperature accepted [K]. */
    public static final double T_MIN = 200.0;
    /** Highest temperature accepted [K]. */
    public static final double T_MAX = 500.0;
    /** Lowest pressure accepted [Pa]. */
    public static final double P_MIN = 10_000.0;
    /** Highest pressure accepted [Pa]. */
    public static final double P_MAX = 200_000.0;

    /** Molar mass of dry air [kg/mol]: U.S. Standard Atmosphere, 1976 (NOAA/NASA/USAF), sea-level value 28.9644 kg/kmol. */
    public static final double MOLAR_MASS = 28.9644e-3;
    /** Molar gas constant [J/(mol K)] (CODATA 2018, exact). */
    public static final double R = 8.314462618;

    // Lemmon et al. 2000, ideal-gas Helmholtz part for air: constants of the equation itself.
    private static final double R_LEMMON = 8.31451; // J/(mol K), Lemmon et al. 2000
    private static final double M_LEMMON = 28.9586e-3; // kg/mol, Lemmon et al. 2000
    private static final double T_REDUCING = 132.6312; // K, Lemmon et al. 2000 (reducing temperature)
    private static final double N1 = 0.6057194e-7; // Lemmon et al. 2000, ideal-gas N1
    private static final double N2 = -0.210274769e-4; // Lemmon et al. 2000, ideal-gas N2
    private static final double N3 = -0.158860716e-3; // Lemmon et al. 2000, ideal-gas N3
    private static final double N6 = -0.19536342e-3; // Lemmon et al. 2000, ideal-gas N6
    private static final double N7 = 2.490888032; // Lemmon et al. 2000, ideal-gas N7 (ln tau)
    private static final double N8 = 0.791309509; // Lemmon et al. 2000, ideal-gas N8
    private static final double N9 = 0.212236768; // Lemmon et al. 2000, ideal-gas N9
    private static final double N10 = -0.197938904; // Lemmon et al. 2000, ideal-gas N10
    private static final double N11 = 25.36365; // Lemmon et al. 2000, ideal-gas N11
    private static final double N12 = 16.90741; // Lemmon et al. 2000, ideal-gas N12
    private static final double N13 = 87.31279; // Lemmon et al. 2000, ideal-gas N13

    // Lemmon & Jacobsen 2004, dilute-gas viscosity of air (Tables I and II).
    private static final double M_GPERMOL = 28.9586; // g/mol, Lemmon & Jacobsen 2004 (air)
    private static final double SIGMA_NM = 0.360; // nm, Lemmon & Jacobsen 2004 (air)
    private static final double EPS_OVER_K = 103.3; // K, Lemmon & Jacobsen 2004 (air)
    private static final double[] B = {0.431, -0.4623, 0.08406, 0.005341, -0.00331}; // Lemmon & Jacobsen 2004, collision integral
    // Lemmon & Jacobsen 2004, dilute-gas thermal conductivity of air (Table IV).
    private static final double L1 = 1.308; // Lemmon & Jacobsen 2004, N1
    private static final double L2 = 1.405; // Lemmon & Jacobsen 2004, N2
    private static final double T2 = -1.1; // Lemmon & Jacobsen 2004, t2
    private static final double L3 = -1.036; // Lemmon & Jacobsen 2004, N3
    private static final double T3 = -0.3; // Lemmon & Jacobsen 2004, t3

    private static final String FLUID = "air";
    private static final String T_RANGE = "200 K to 500 K";
    private static final String P_RANGE = "10 kPa to 200 kPa";

    private DryAir() {
    }

    /**
     * Ideal-gas density, {@code rho = p M / (R T)}.
     *
     * @param temperature T [K]
     * @param pressure    p [Pa]
     * @return density [kg/m3]
     */
    public static double density(double temperature, double pressure) {
        checkT(temperature);
        Check.finite("pressure", pressure);
        if (pressure < P_MIN || pressure > P_MAX) {
            throw new OutOfRangeException(Msg.FLUID_OUT_OF_RANGE, FLUID, "pressure", pressure + " Pa", P_RANGE);
        }
        return pressure * MOLAR_MASS / (R * temperature);
    }

    /**
     * Ideal-gas isobaric heat capacity (Lemmon et al. 2000).
     *
     * @param temperature T [K]
     * @return cp [J/(kg K)]
     */
    public static double cp(double temperature) {
        checkT(temperature);
        return idealCpOverR(temperature) * R_LEMMON / M_LEMMON;
    }

    /**
     * Dilute-gas dynamic viscosity (Lemmon &amp; Jacobsen 2004).
     *
     * @param temperature T [K]
     * @return viscosity [Pa s]
     */
    public static double viscosity(double temperature) {
        checkT(temperature);
        return diluteViscosityMicro(temperature) * 1e-6;
    }

    /**
     * Dilute-gas thermal conductivity (Lemmon &amp; Jacobsen 2004).
     *
     * @param temperature T [K]
     * @return conductivity [W/(m K)]
     */
    public static double conductivity(double temperature) {
        checkT(temperature);
        return diluteConductivityMilli(temperature) * 1e-3;
    }

    /**
     * Prandtl number {@code cp mu / k} from the three methods above.
     *
     * @param temperature T [K]
     * @return Prandtl number [-]
     */
    public static double prandtl(double temperature) {
        return cp(temperature) * viscosity(temperature) / conductivity(temperature);
    }

    /** cp0/R of the Lemmon et al. 2000 ideal-gas part, without range check (for tests). */
    static double idealCpOverR(double temperature) {
        double tau = T_REDUCING / temperature;
        double cv = N7
                - 12 * N1 * Math.pow(tau, -3)
                - 6 * N2 * Math.pow(tau, -2)
                - 2 * N3 / tau
                - 0.75 * N6 * Math.pow(tau, 1.5)
                + N8 * einstein(N11 * tau)
                + N9 * einstein(N12 * tau);
        double u = N13 * tau;
        // (2/3) u^2 e^u / (2/3 + e^u)^2, written with e^-u to stay finite for large u
        double em = Math.exp(-u);
        double last = (2.0 / 3.0) * u * u * em / Math.pow(1 + (2.0 / 3.0) * em, 2);
        cv -= N10 * last;
        return cv + 1;
    }

    /** Dilute-gas viscosity in micropascal seconds, without range check (for tests). */
    static double diluteViscosityMicro(double temperature) {
        double lnT = Math.log(temperature / EPS_OVER_K);
        double sum = 0;
        double pow = 1;
        for (double b : B) {
            sum += b * pow;
            pow *= lnT;
        }
        double omega = Math.exp(sum);
        // 0.0266958: Lemmon & Jacobsen 2004, Eq. (2), kinetic-theory constant for uPa s, g/mol, nm
        return 0.0266958 * Math.sqrt(M_GPERMOL * temperature) / (SIGMA_NM * SIGMA_NM * omega);
    }

    /** Dilute-gas thermal conductivity in milliwatts per metre kelvin, without range check (for tests). */
    static double diluteConductivityMilli(double temperature) {
        double tau = T_REDUCING / temperature;
        return L1 * diluteViscosityMicro(temperature) + L2 * Math.pow(tau, T2) + L3 * Math.pow(tau, T3);
    }

    private static double einstein(double u) {
        double em = Math.exp(-u);
        return u * u * em / ((1 - em) * (1 - em));
    }

    private static void checkT(double temperature) {
        Check.finite("temperature", temperature);
        if (temperature < T_MIN || temperature > T_MAX) {
            throw new OutOfRangeException(Msg.FLUID_OUT_OF_RANGE, FLUID, "temperature", temperature + " K", T_RANGE);
        }
    }
}
