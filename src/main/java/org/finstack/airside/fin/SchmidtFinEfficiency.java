package org.finstack.airside.fin;

import java.util.Objects;
import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Schmidt's (1949) approximation for the efficiency of a plate fin around a round tube: the
 * hexagonal (staggered tubes) or rectangular (in-line tubes) fin is replaced by an annular fin of
 * equivalent radius R<sub>e</sub>, whose efficiency is in turn approximated by that of a straight
 * fin of length r&phi;.
 *
 * <p>Equations, as restated by Wang, Chi &amp; Chang (2000), eqs. for the fin efficiency in their
 * Section 2, with r = Dc/2 the collar (fin root) radius:
 * <pre>
 *   eta_f = tanh(m r phi) / (m r phi)
 *   m     = sqrt(2 h / (k t))
 *   phi   = (Re/r - 1) (1 + 0.35 ln(Re/r))
 *   staggered (hexagonal fin):   Re/r = 1.27 (XM/r) sqrt(XL/XM - 0.3)
 *                                XM = Pt/2,  XL = sqrt((Pt/2)^2 + Pl^2) / 2
 *   in line (rectangular fin):   Re/r = 1.28 (XM/r) sqrt(XL/XM - 0.2)
 *                                XM = min(Pt, Pl)/2,  XL = max(Pt, Pl)/2
 * </pre>
 * For the rectangular fin Schmidt's construction takes M as half the shorter side and L as half
 * the longer, so that &beta; = L/M &ge; 1 (as given in the ASHRAE Handbook&mdash;Fundamentals
 * restatement, from memory); Wang, Chi &amp; Chang write XM = Pt/2, XL = Pl/2, which is the same
 * when Pl &ge; Pt. For the hexagonal fin XM is half the transverse pitch and XL half the diagonal
 * pitch as Wang, Chi &amp; Chang define them; XL/XM = sqrt(1/4 + (Pl/Pt)&sup2;) &ge; 1/2, so the
 * square root is always real.
 *
 * <p>Parameters: Dc collar diameter [m], t fin thickness [m], Pt transverse pitch [m], Pl row pitch
 * [m] (all from {@link PlateFinCell}), h air-side heat transfer coefficient [W/(m2 K)], k fin
 * conductivity [W/(m K)].
 *
 * <p>Validity: the restatements consulted give no numeric range. {@link #VALIDITY} therefore
 * holds (a) the one-dimensional-conduction condition Bi = h (t/2) / k &le; 0.1 (common practice)
 * and (b) the range over which this implementation's own comparison with the exact annular-fin
 * solution ({@link AnnularFinEfficiency}) at the same equivalent radius stays within 2&nbsp;%:
 * 1 &lt; Re/r &le; 8 and eta_f &ge; 0.5 (see {@code SchmidtFinEfficiencyTest}). Scatter: no
 * published share-within-&plusmn;x&nbsp;% is stated; the sources describe it as accurate to
 * within a few percent. Against a two-dimensional finite-difference solution of the continuous
 * plate fin (24 common staggered and in-line geometries, eta_f 0.31 to 0.95; reference data
 * {@code fin_plate2d_fd.csv}) it lies within 3.5&nbsp;%, nearly always low. With the in-line
 * assignment XM = Pt/2 regardless of which pitch is shorter, the same comparison gives up to
 * 12&nbsp;% too high at Pt/Pl = 1.67, which is why M is taken as the shorter half-side.
 *
 * <p>Example: Dc = 10.23 mm, t = 0.13 mm, Pt = 25.4 mm, Pl = 22 mm, staggered, h = 60 W/(m2 K),
 * k = 200 W/(m K): Re/r = 2.63841, eta_f = 0.842629.
 */
public final class SchmidtFinEfficiency implements FinEfficiencyMethod {

    /** Identifier in case files. */
    public static final String ID = "schmidt-1949";

    /** The published source. */
    public static final Citation SOURCE = Citation.of("Schmidt 1949",
            "T. E. Schmidt, Heat transfer calculations for extended surfaces, Refrigerating "
                    + "Engineering 57 (1949) 351-357; as restated in C.-C. Wang, K.-Y. Chi, C.-J. Chang, "
                    + "Heat transfer and friction characteristics of plain fin-and-tube heat exchangers, "
                    + "part II: Correlation, International Journal of Heat and Mass Transfer 43 (2000) "
                    + "2693-2700");

    /**
     * Validity: Bi = h (t/2)/k up to 0.1 (common practice for one-dimensional fin conduction);
     * Re/r 1 to 8 and eta 0.5 to 1 (where this implementation agrees with the exact annular
     * solution within 2 %; no published range found).
     */
    public static final Validity VALIDITY = Validity.assessed("checked against exact and 2-D fin solutions",
            Limit.of("Bi", 0, 0.1),
            Limit.of("Re/r", 1, 8),
            Limit.of("eta", 0.5, 1));

    /** The single instance (stateless). */
    public static final SchmidtFinEfficiency INSTANCE = new SchmidtFinEfficiency();

    private static final String NAME = "Schmidt 1949 fin efficiency";

    // Schmidt 1949 via Wang, Chi & Chang 2000: hexagonal fin, Re/r = 1.27 psi sqrt(beta - 0.3)
    private static final double HEX_FACTOR = 1.27;
    private static final double HEX_OFFSET = 0.3;
    // Schmidt 1949 via Wang, Chi & Chang 2000: rectangular fin, Re/r = 1.28 psi sqrt(beta - 0.2)
    private static final double RECT_FACTOR = 1.28;
    private static final double RECT_OFFSET = 0.2;
    // Schmidt 1949 via Wang, Chi & Chang 2000: phi = (Re/r - 1)(1 + 0.35 ln(Re/r))
    private static final double PHI_LOG_FACTOR = 0.35;

    private SchmidtFinEfficiency() {
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
     * Schmidt's equivalent annular-fin radius ratio.
     *
     * @param cell the fin around one tube
     * @return Re/r, the equivalent outer radius over the collar radius (&gt; 1 for any valid cell)
     */
    public static double equivalentRadiusRatio(PlateFinCell cell) {
        Objects.requireNonNull(cell, "cell");
        double r = cell.collarRadius();
        if (cell.staggered()) {
            double xm = 0.5 * cell.transversePitch();
            double xl = 0.5 * cell.diagonalPitch();
            return HEX_FACTOR * (xm / r) * Math.sqrt(xl / xm - HEX_OFFSET);
        }
        double xm = 0.5 * Math.min(cell.transversePitch(), cell.rowPitch());
        double xl = 0.5 * Math.max(cell.transversePitch(), cell.rowPitch());
        return RECT_FACTOR * (xm / r) * Math.sqrt(xl / xm - RECT_OFFSET);
    }

    /**
     * Schmidt's length factor of the annular fin.
     *
     * @param reOverR Re/r [-], &ge; 1
     * @return phi = (Re/r - 1)(1 + 0.35 ln(Re/r)) [-]
     */
    public static double phi(double reOverR) {
        Check.within("reOverR", reOverR, 1, Double.MAX_VALUE);
        return (reOverR - 1) * (1 + PHI_LOG_FACTOR * Math.log(reOverR));
    }

    /**
     * {@inheritDoc}
     *
     * <p>Warns when Bi, Re/r or the result lie outside {@link #VALIDITY}.
     */
    @Override
    public double efficiency(PlateFinCell cell, double h, double kFin, Warnings w) {
        return bind(cell, kFin).efficiency(h, w);
    }

    /**
     * {@inheritDoc}
     *
     * <p>Re/r and its length factor are worked out here once; the efficiency at a coefficient h
     * is then tanh(z)/z with z = r phi (2 h / (k t))^(1/2).
     */
    @Override
    public Bound bind(PlateFinCell cell, double kFin) {
        Objects.requireNonNull(cell, "cell");
        Check.positive("kFin", kFin);
        double t = cell.finThickness();
        double reOverR = equivalentRadiusRatio(cell);
        double length = cell.collarRadius() * phi(reOverR) * Math.sqrt(2 / (kFin * t));
        return (h, w) -> {
            Objects.requireNonNull(w, "w");
            Check.positive("h", h);
            double eta = tanhOverX(length * Math.sqrt(h));
            if (w.keeps()) {
                VALIDITY.check(NAME, "Bi", h * 0.5 * t / kFin, w);
                VALIDITY.check(NAME, "Re/r", reOverR, w);
                VALIDITY.check(NAME, "eta", eta, w);
            }
            return eta;
        };
    }

    /** tanh(z)/z for z &gt;= 0, with its Taylor series near zero (where 0/0 would threaten). */
    static double tanhOverX(double z) {
        if (z < 1e-4) {
            double z2 = z * z;
            return 1 - z2 / 3 + 2 * z2 * z2 / 15;
        }
        return Math.tanh(z) / z;
    }
}
