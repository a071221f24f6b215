package org.finstack.fluid.eos;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.finstack.fluid.Fluids;
import org.finstack.fluid.HelmholtzFluid;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The analytic derivatives of alphar and alpha0 against central finite differences of the
 * functions themselves (a check outside the analytic formulas: the derivatives of every term type
 * must be consistent with its value). Covers polynomial/exponential (R134a), Lemmon-Jacobsen
 * (R125), Gaussian (R290), Gao (R717) and Span-Wagner non-analytic terms (R744, close to its
 * critical point too).
 */
class HelmholtzDerivativesTest {

    private static final double H = 1e-5;

    @ParameterizedTest(name = "{0} at delta={1}, tau={2}")
    @CsvSource({
        "R134a, 0.01, 1.5", "R134a, 2.5, 1.3", "R134a, 1.0, 1.0",
        "R125, 0.5, 1.1", "R125, 2.7, 1.6",
        "R290, 0.3, 1.05", "R290, 2.6, 1.9",
        "R717, 0.2, 1.2", "R717, 2.5, 1.8", "R717, 0.95, 1.01",
        "R744, 0.3, 1.1", "R744, 2.4, 1.3", "R744, 1.05, 1.002", "R744, 0.93, 0.998", "R744, 1.02, 1.005",
    })
    void residualDerivativesMatchFiniteDifferences(String fluid, double delta, double tau) {
        HelmholtzEos eos = ((HelmholtzFluid) Fluids.byName(fluid)).equationOfState();
        Derivatives d = eos.residual(delta, tau);
        double hd = H * delta;
        double ht = H * tau;
        Derivatives dp = eos.residual(delta + hd, tau);
        Derivatives dm = eos.residual(delta - hd, tau);
        Derivatives tp = eos.residual(delta, tau + ht);
        Derivatives tm = eos.residual(delta, tau - ht);
        close(d.ad(), (dp.a() - dm.a()) / (2 * hd), fluid + " alphar_delta");
        close(d.add(), (dp.ad() - dm.ad()) / (2 * hd), fluid + " alphar_deltadelta");
        close(d.at(), (tp.a() - tm.a()) / (2 * ht), fluid + " alphar_tau");
        close(d.att(), (tp.at() - tm.at()) / (2 * ht), fluid + " alphar_tautau");
        close(d.adt(), (tp.ad() - tm.ad()) / (2 * ht), fluid + " alphar_deltatau");
        close(d.adt(), (dp.at() - dm.at()) / (2 * hd), fluid + " alphar_taudelta");

        IdealGasPart ideal = eos.ideal();
        double[] i0 = ideal.tauPart(tau);
        double[] ip = ideal.tauPart(tau + ht);
        double[] im = ideal.tauPart(tau - ht);
        close(i0[1], (ip[0] - im[0]) / (2 * ht), fluid + " alpha0_tau");
        close(i0[2], (ip[1] - im[1]) / (2 * ht), fluid + " alpha0_tautau");
    }

    private static void close(double analytic, double numeric, String what) {
        double scale = Math.max(Math.abs(analytic), 1e-3);
        assertTrue(Math.abs(analytic - numeric) <= 2e-6 * scale,
                what + ": analytic " + analytic + ", finite difference " + numeric);
    }
}
