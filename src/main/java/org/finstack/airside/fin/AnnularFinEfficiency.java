package org.finstack.airside.fin;

import java.util.Objects;
import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Limit;
import org.finstack.core.Msg;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;
import org.finstack.core.math.Bessel;

/**
 * Exact efficiency of the annular fin of uniform thickness (one-dimensional radial conduction,
 * uniform h, insulated tip), Gardner (1945), in the form tabulated by Incropera &amp; DeWitt:
 * <pre>
 *   eta_f = 2 r1 / (m (r2c^2 - r1^2))
 *           * (K1(m r1) I1(m r2c) - I1(m r1) K1(m r2c)) / (I0(m r1) K1(m r2c) + K0(m r1) I1(m r2c))
 *   m     = sqrt(2 h / (k t))
 *   r2c   = r2 + t/2 with the tip correction (convecting tip), r2 without (insulated tip)
 * </pre>
 * evaluated with exponentially scaled Bessel functions ({@link Bessel}) so that large m r neither
 * overflows nor loses accuracy: with a = m r1, b = m r2c and E = exp(-2 (b - a)),
 * eta_f = 2 r1 / (m (r2c&sup2; - r1&sup2;)) (k1e(a) i1e(b) - i1e(a) k1e(b) E) /
 * (k0e(a) i1e(b) + i0e(a) k1e(b) E).
 *
 * <p>Parameters: r1 fin root radius [m], r2 fin tip radius [m], t fin thickness [m], h heat
 * transfer coefficient [W/(m2 K)], k fin conductivity [W/(m K)].
 *
 * <p>As a {@link FinEfficiencyMethod} (id {@value #ID}, "Schmidt equivalent radius, exact annular
 * solution") it takes r1 = Dc/2 and r2 = Schmidt's equivalent radius
 * ({@link SchmidtFinEfficiency#equivalentRadiusRatio}) without tip correction, since a continuous
 * plate fin has no free edge.
 *
 * <p>Validity: exact for the one-dimensional model; that model holds for Bi = h (t/2)/k &le; 0.1
 * (common practice). The equivalent-radius variant adds the approximation of the hexagonal or
 * rectangular fin by an annulus, for which no published scatter was found; against a
 * two-dimensional finite-difference solution of the continuous plate fin (reference data
 * {@code fin_plate2d_fd.csv}) it lies within 2&nbsp;% for eta_f &ge; 0.5 and up to 6.3&nbsp;%
 * low below that.
 *
 * <p>Example: r1 = 5 mm, r2 = 12 mm, t = 0.2 mm, h = 80 W/(m2 K), k = 200 W/(m K), no tip
 * correction: eta_f = 0.908751. The same as the plate-fin method for the cell in the example of
 * {@link SchmidtFinEfficiency} (Re/r = 2.63841): eta_f = 0.852720.
 */
public final class AnnularFinEfficiency implements FinEfficiencyMethod {

    /** Identifier in case files. */
    public static final String ID = "schmidt-radius-exact-annular";

    /** The published source. */
    public static final Citation SOURCE = Citation.of("Gardner 1945",
            "K. A. Gardner, Efficiency of extended surface, Transactions of the ASME 67 (1945) "
                    + "621-631; as tabulated in F. P. Incropera, D. P. DeWitt, T. L. Bergman, "
                    + "A. S. Lavine, Fundamentals of Heat and Mass Transfer, 6th ed., Wiley, 2007, "
                    + "Table 3.5 (annular fin of rectangular profile)");

    /** Validity: Bi = h (t/2)/k up to 0.1 (one-dimensional conduction; common practice). */
    public static final Validity VALIDITY = Validity.assessed("for one-dimensional fin conduction (common practice)",
            Limit.of("Bi", 0, 0.1));

    /** The single instance (stateless), as the equivalent-radius plate-fin method. */
    public static final AnnularFinEfficiency INSTANCE = new AnnularFinEfficiency();

    private static final String NAME = "Gardner 1945 annular fin with Schmidt equivalent radius";

    /** Below this m (r2c - r1) the efficiency equals 1 to within 1e-14. */
    private static final double NEGLIGIBLE_ML = 1e-7;

    private AnnularFinEfficiency() {
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public Citation source() {
        return SOURCE;
    }

    /**
     * Exact efficiency of an annular fin of uniform thickness.
     *
     * @param r1            fin root radius [m], &gt; 0
     * @param r2            fin tip radius [m], &gt; r1
     * @param t             fin thickness [m], &gt; 0
     * @param h             heat transfer coefficient [W/(m2 K)], &gt; 0
     * @param k             fin conductivity [W/(m K)], &gt; 0
     * @param tipCorrection whether to use the corrected tip radius r2 + t/2 (a convecting tip)
     * @return eta_f in (0, 1]
     * @throws InputException naming {@code r1}, {@code r2}, {@code t}, {@code h} or {@code k}
     */
    public static double efficiency(double r1, double r2, double t, double h, double k,
            boolean tipCorrection) {
        Check.positive("r1", r1);
        Check.positive("r2", r2);
        Check.positive("t", t);
        Check.positive("h", h);
        Check.positive("k", k);
        if (!(r2 > r1)) {
            throw new InputException("r2", Msg.NOT_ABOVE, r2, r1);
        }
        double r2c = tipCorrection ? r2 + 0.5 * t : r2;
        double m = Math.sqrt(2 * h / (k * t));
        if (m * (r2c - r1) < NEGLIGIBLE_ML) {
            return 1.0;
        }
        double a = m * r1;
        double b = m * r2c;
        double e = Math.exp(-2 * (b - a));
        double num = Bessel.k1e(a) * Bessel.i1e(b) - Bessel.i1e(a) * Bessel.k1e(b) * e;
        double den = Bessel.k0e(a) * Bessel.i1e(b) + Bessel.i0e(a) * Bessel.k1e(b) * e;
        double eta = 2 * r1 / (m * (r2c - r1) * (r2c + r1)) * num / den;
        return Math.min(eta, 1.0);
    }

    /**
     * {@inheritDoc}
     *
     * <p>Uses r1 = Dc/2 and Schmidt's equivalent radius as r2, insulated tip; warns when Bi lies
     * outside {@link #VALIDITY}.
     */
    @Override
    public double efficiency(PlateFinCell cell, double h, double kFin, Warnings w) {
        Objects.requireNonNull(cell, "cell");
        Objects.requireNonNull(w, "w");
        Check.positive("h", h);
        Check.positive("kFin", kFin);
        double r1 = cell.collarRadius();
        double r2 = r1 * SchmidtFinEfficiency.equivalentRadiusRatio(cell);
        double eta = efficiency(r1, r2, cell.finThickness(), h, kFin, false);
        VALIDITY.check(NAME, "Bi", h * 0.5 * cell.finThickness() / kFin, w);
        return eta;
    }
}
