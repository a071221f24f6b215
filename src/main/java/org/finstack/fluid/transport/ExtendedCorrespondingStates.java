package org.finstack.fluid.transport;

import com.fasterxml.jackson.databind.JsonNode;
import org.finstack.core.Citation;
import org.finstack.core.ConvergenceException;
import org.finstack.core.Numbers;
import org.finstack.fluid.eos.Derivatives;
import org.finstack.fluid.eos.HelmholtzEos;
import org.finstack.fluid.internal.JsonFields;

/**
 * Extended corresponding states (ECS): the residual viscosity and conductivity of a fluid are
 * those of a reference fluid at the conformal state, scaled.
 * <ul>
 * <li>Conformal state (T0, rho0) of the reference fluid: equal residual Helmholtz energy and equal
 * compressibility factor, {@code alphar0(T0, rho0) = alphar(T, rho)}, {@code Z0(T0, rho0) = Z(T, rho)};
 * f = T / T0, h = rho0 / rho (molar). Solved by Newton's method in (ln T0, ln rho0), started from
 * the ratio of critical points, at most 60 iterations, steps limited to a factor exp(0.3). Where
 * these two equations have no solution (dilute R32 vapour against propane below about -30 degC,
 * where the residual part is under 1 % of the conductivity), T0 is taken from the ratio of
 * critical temperatures and rho0 from equal Z alone.</li>
 * <li>Viscosity (Klein, McLinden &amp; Laesecke 1997; Huber, Laesecke &amp; Perkins 2003):
 * {@code eta = eta0(T) + d_eta_ref(T0, rho0 psi_eta) F_eta}, {@code F_eta = f^(1/2) h^(-2/3) (M/M0)^(1/2)},
 * {@code psi = sum a_i delta_r^t_i} with delta_r = rho_m / rho_red; eta0 from Chapman-Enskog with
 * the fluid's Lennard-Jones parameters.</li>
 * <li>Conductivity (McLinden, Klein &amp; Perkins 2000):
 * {@code lambda = f_int eta0 (cp0 - 5R/2) / M + 15 R eta0 / (4 M) + d_lambda_ref(T0, rho0 psi_lambda) F_lambda + d_lambda_c},
 * {@code F_lambda = f^(1/2) h^(-2/3) (M0/M)^(1/2)}, f_int = sum a_i T^t_i (the file's coefficients
 * give f_int in units of 1e-3), cp0 the molar ideal-gas heat capacity, d_lambda_c Olchowy &amp; Sengers
 * (1989) with generic constants (xi0 = 0.194 nm, Gamma = 0.0496, qD from the paper).</li>
 * </ul>
 * The papers state agreement with the fluids' data mostly within 5 % (viscosity) and 3-5 %
 * (conductivity).
 */
final class ExtendedCorrespondingStates {

    /** ECS viscosity. */
    static final Citation VISCOSITY = Citation.of("Klein, McLinden & Laesecke 1997",
            "Klein, S.A., McLinden, M.O., Laesecke, A.: An improved extended corresponding states method for "
                    + "estimation of viscosity of pure refrigerants and mixtures. Int. J. Refrig. 20(3), 208-217 (1997)");

    private static final int MAX_ITER = 60;
    /** Below this reduced density the fluid is taken as ideal gas: the conformal state is the critical ratio. */
    private static final double IDEAL_DELTA = 1e-7;

    private final HelmholtzEos eos;
    private final HelmholtzEos ref;
    private final double molarGasConstant;
    private final double tRatio;
    private final double rhoRatio;
    private final String name;

    /**
     * @param name      the fluid's name (for messages)
     * @param eos       the fluid's equation of state
     * @param gasConst  its molar gas constant [J/(mol K)]
     * @param tc        its critical temperature [K]
     * @param rhoc      its critical density [kg/m3]
     * @param ref       the reference fluid's equation of state
     * @param tc0       the reference's critical temperature [K]
     * @param rhoc0     the reference's critical density [kg/m3]
     */
    ExtendedCorrespondingStates(String name, HelmholtzEos eos, double gasConst, double tc, double rhoc,
            HelmholtzEos ref, double tc0, double rhoc0) {
        this.name = name;
        this.eos = eos;
        this.ref = ref;
        this.molarGasConstant = gasConst;
        this.tRatio = tc0 / tc;
        this.rhoRatio = (rhoc0 / ref.molarMass()) / (rhoc / eos.molarMass());
    }

    /**
     * @param temperature T [K]
     * @param density     rho [kg/m3]
     * @return {T0 [K], rho0 [mol/m3] of the reference fluid}
     */
    double[] conformal(double temperature, double density) {
        double rhoM = density / eos.molarMass();
        double t0 = temperature * tRatio;
        double r0 = rhoM * rhoRatio;
        double delta = density / eos.reducingDensity();
        if (delta < IDEAL_DELTA) {
            return new double[] {t0, r0};
        }
        Derivatives d = eos.residual(delta, eos.reducingTemperature() / temperature);
        double ar = d.a();
        double z = 1 + delta * d.ad();
        double refRed = ref.reducingDensity() / ref.molarMass();
        double err = Double.NaN;
        for (int it = 0; it < MAX_ITER; it++) {
            double d0 = r0 / refRed;
            double tau0 = ref.reducingTemperature() / t0;
            Derivatives e = ref.residual(d0, tau0);
            double f1 = e.a() - ar;
            double f2 = d0 * e.ad() - delta * d.ad();
            double aT = -tau0 * e.at();
            double aD = d0 * e.ad();
            double zT = -tau0 * d0 * e.adt();
            double zD = d0 * (e.ad() + d0 * e.add());
            double det = aT * zD - aD * zT;
            double dx = -(f1 * zD - aD * f2) / det;
            double dy = -(aT * f2 - zT * f1) / det;
            err = Math.abs(f1) + Math.abs(f2) / Math.max(Math.abs(z), 1e-300);
            if (!Double.isFinite(dx) || !Double.isFinite(dy)) {
                break;
            }
            t0 *= Math.exp(Math.max(-0.3, Math.min(0.3, dx)));
            r0 *= Math.exp(Math.max(-0.3, Math.min(0.3, dy)));
            if (Math.abs(dx) < 1e-11 && Math.abs(dy) < 1e-11) {
                return new double[] {t0, r0};
            }
        }
        return equalZ(temperature, rhoM * rhoRatio, delta * d.ad(), err);
    }

    /**
     * Fallback where the two conformal equations have no solution (e.g. dilute R32 vapour against
     * propane below about -30 degC): T0 from the ratio of critical temperatures, rho0 from equal Z
     * alone (Newton in ln rho0, at most 60 iterations).
     */
    private double[] equalZ(double temperature, double start, double zMinusOne, double twoEquationResidual) {
        double t0 = temperature * tRatio;
        double tau0 = ref.reducingTemperature() / t0;
        double refRed = ref.reducingDensity() / ref.molarMass();
        double r0 = start;
        double f = Double.NaN;
        for (int it = 0; it < MAX_ITER; it++) {
            double d0 = r0 / refRed;
            Derivatives e = ref.residual(d0, tau0);
            f = d0 * e.ad() - zMinusOne;
            double slope = d0 * (e.ad() + d0 * e.add());
            double dy = -f / slope;
            if (!Double.isFinite(dy)) {
                break;
            }
            r0 *= Math.exp(Math.max(-0.3, Math.min(0.3, dy)));
            if (Math.abs(dy) < 1e-11) {
                return new double[] {t0, r0};
            }
        }
        throw new ConvergenceException(name + " conformal state at T = " + Numbers.brief(temperature) + " K", MAX_ITER,
                Double.isNaN(f) ? twoEquationResidual : f);
    }

    /** ECS viscosity of one fluid against a reference fluid's viscosity correlation. */
    static final class Viscosity implements ViscosityCorrelation {

        private final ExtendedCorrespondingStates ecs;
        private final ViscosityCorrelation refVisc;
        private final double sigma;
        private final double epsilonOverK;
        private final double[] pa;
        private final double[] pt;
        private final double psiRed;

        Viscosity(JsonNode n, ExtendedCorrespondingStates ecs, ViscosityCorrelation refVisc) {
            this.ecs = ecs;
            this.refVisc = refVisc;
            this.sigma = JsonFields.num(n, "sigma");
            this.epsilonOverK = JsonFields.num(n, "epsilonOverK");
            JsonNode p = JsonFields.req(n, "psi");
            this.pa = JsonFields.arr(p, "a");
            this.pt = JsonFields.arr(p, "t");
            this.psiRed = JsonFields.num(p, "reducingMolarDensity");
        }

        @Override
        public double dilute(double temperature) {
            return ChapmanEnskog.viscosity(ecs.eos.molarMass(), temperature, sigma, epsilonOverK);
        }

        @Override
        public double viscosity(double temperature, double density) {
            double rhoM = density / ecs.eos.molarMass();
            double[] c = ecs.conformal(temperature, density);
            double f = temperature / c[0];
            double h = c[1] / rhoM;
            double psi = Data.powerSum(pa, pt, rhoM / psiRed);
            double m0 = ecs.ref.molarMass();
            double rho0 = c[1] * psi * m0;
            double residual = refVisc.viscosity(c[0], rho0) - refVisc.dilute(c[0]);
            double scale = Math.sqrt(f) * Math.pow(h, -2.0 / 3) * Math.sqrt(ecs.eos.molarMass() / m0);
            return dilute(temperature) + residual * scale;
        }
    }

    /** ECS conductivity of one fluid against a reference fluid's conductivity correlation. */
    static final class Conductivity implements ConductivityCorrelation {

        private final ExtendedCorrespondingStates ecs;
        private final ConductivityCorrelation refCond;
        private final ViscosityCorrelation viscosity;
        private final double sigma;
        private final double epsilonOverK;
        private final double[] fa;
        private final double[] ft;
        private final double[] pa;
        private final double[] pt;
        private final double psiRed;
        private final OlchowySengers1989 critical;

        /**
         * @param n            the coefficient block
         * @param ecs          the conformal-state solver
         * @param refCond      the reference fluid's conductivity
         * @param viscosity    the fluid's viscosity (critical enhancement)
         * @param sigma        the fluid's Lennard-Jones length [m] (dilute-gas viscosity)
         * @param epsilonOverK its Lennard-Jones energy [K]
         * @param critical     the critical enhancement
         */
        Conductivity(JsonNode n, ExtendedCorrespondingStates ecs, ConductivityCorrelation refCond,
                ViscosityCorrelation viscosity, double sigma, double epsilonOverK, OlchowySengers1989 critical) {
            this.ecs = ecs;
            this.refCond = refCond;
            this.viscosity = viscosity;
            this.sigma = sigma;
            this.epsilonOverK = epsilonOverK;
            JsonNode fi = JsonFields.req(n, "fInt");
            this.fa = JsonFields.arr(fi, "a");
            this.ft = JsonFields.arr(fi, "t");
            JsonNode p = JsonFields.req(n, "psi");
            this.pa = JsonFields.arr(p, "a");
            this.pt = JsonFields.arr(p, "t");
            this.psiRed = JsonFields.num(p, "reducingMolarDensity");
            this.critical = critical;
        }

        /**
         * @param temperature T [K]
         * @return dilute-gas conductivity, translational plus internal [W/(m K)]
         */
        double dilute(double temperature) {
            HelmholtzEos e = ecs.eos;
            double m = e.molarMass();
            double r = ecs.molarGasConstant;
            double eta0 = ChapmanEnskog.viscosity(m, temperature, sigma, epsilonOverK);
            double tau = e.reducingTemperature() / temperature;
            double cp0 = r * (1 - tau * tau * e.ideal().tauPart(tau)[2]);
            double fInt = Data.powerSum(fa, ft, temperature) * 1000;
            return fInt * eta0 * (cp0 - 2.5 * r) / m + 15 * r * eta0 / (4 * m);
        }

        @Override
        public double residual(double temperature, double density) {
            double rhoM = density / ecs.eos.molarMass();
            double[] c = ecs.conformal(temperature, density);
            double f = temperature / c[0];
            double h = c[1] / rhoM;
            double psi = Data.powerSum(pa, pt, rhoM / psiRed);
            double m0 = ecs.ref.molarMass();
            double scale = Math.sqrt(f) * Math.pow(h, -2.0 / 3) * Math.sqrt(m0 / ecs.eos.molarMass());
            return refCond.residual(c[0], c[1] * psi * m0) * scale;
        }

        @Override
        public double conductivity(double temperature, double density) {
            return dilute(temperature) + residual(temperature, density)
                    + critical.enhancement(temperature, density, viscosity.viscosity(temperature, density));
        }
    }
}
