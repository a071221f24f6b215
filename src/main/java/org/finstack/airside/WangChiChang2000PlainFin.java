package org.finstack.airside;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Limit;
import org.finstack.core.Msg;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Wang, Chi &amp; Chang (2000) correlation for plain (flat, continuous) fins on staggered round
 * tubes.
 *
 * <p>Colburn factor, one row (N = 1):
 * <pre>
 *   j = 0.108 ReDc^-0.29 (Pt/Pl)^P1 (Fp/Dc)^-1.084 (Fp/Dh)^-0.786 (Fp/Pt)^P2
 *   P1 = 1.9 - 0.23 ln ReDc
 *   P2 = -0.236 + 0.126 ln ReDc
 * </pre>
 * two rows or more (N &ge; 2):
 * <pre>
 *   j = 0.086 ReDc^P3 N^P4 (Fp/Dc)^P5 (Fp/Dh)^P6 (Fp/Pt)^-0.93
 *   P3 = -0.361 - 0.042 N / ln ReDc + 0.158 ln(N (Fp/Dc)^0.41)
 *   P4 = -1.224 - 0.076 (Pl/Dh)^1.42 / ln ReDc
 *   P5 = -0.083 + 0.058 N / ln ReDc
 *   P6 = -5.735 + 1.21 ln(ReDc / N)
 * </pre>
 * Fanning friction factor (all N):
 * <pre>
 *   f = 0.0267 ReDc^F1 (Pt/Pl)^F2 (Fp/Dc)^F3
 *   F1 = -0.764 + 0.739 Pt/Pl + 0.177 Fp/Dc - 0.00758 / N
 *   F2 = -15.689 + 64.021 / ln ReDc
 *   F3 = 1.696 - 15.695 / ln ReDc
 * </pre>
 * where ReDc [-] is the Reynolds number on the collar diameter and the velocity in the minimum
 * free-flow area, Dc [m] the collar diameter, Dh [m] the hydraulic diameter 4 Amin L / Ao,
 * Pt [m] the transverse pitch, Pl [m] the row pitch, Fp [m] the fin pitch and N [-] the number
 * of rows. The friction factor is the one of the core pressure-drop equation with entrance and
 * exit losses folded in ({@link KaysLondonCorePressureDrop#withoutEndLosses}); the heat-transfer
 * correlation includes the fin-collar contact conductance of the tested coils.
 *
 * <p>Published scatter: 88.6 % of the database within ±15 % for j (mean deviation 7.51 %),
 * 85.1 % within ±15 % for f (mean deviation 8.31 %); 74 samples (abstract of the paper).
 *
 * <p>Validity (the database range, as summarised by Shah &amp; Sekulic 2003, section 7.5.4):
 * ReDc 300 to 20 000, Dc 6.9 to 13.6 mm, Dh 1.30 to 9.37 mm, Pt 20.4 to 31.8 mm, Pl 12.7 to
 * 32 mm, Fp 1.0 to 8.7 mm, N 1 to 6, staggered tubes. Outside it the value is still returned with
 * a warning; an inline layout also adds a warning.
 *
 * <p>Worked example: Dc = 10.23 mm, Dh = 2.76 mm, Pt = 25.4 mm, Pl = 22.0 mm, Fp = 2.23 mm,
 * fin thickness 0.115 mm, N = 2, staggered, ReDc = 1000 give j = 0.018925 and f = 0.060103.
 */
public final class WangChiChang2000PlainFin implements AirSideCorrelation {

    /** Identifier in {@link AirSideCorrelations}. */
    public static final String ID = "wang-chi-chang-2000-plain";

    /** Fin type. */
    public static final String FIN_TYPE = "plain";

    /** The paper. */
    public static final Citation SOURCE = Citation.of("Wang, Chi & Chang 2000",
            "Wang, C.-C., Chi, K.-Y., Chang, C.-J., 2000, \"Heat transfer and friction characteristics"
                    + " of plain fin-and-tube heat exchangers, part II: Correlation\", Int. J. Heat Mass"
                    + " Transfer 43:2693-2700");

    /** Published range (geometry in millimetres). */
    public static final Validity VALIDITY = Validity.of(
            Limit.of("ReDc", 300, 20_000), // Wang, Chi & Chang 2000 database, via Shah & Sekulic 2003 s. 7.5.4
            Limit.of("Dc", 6.9, 13.6, "mm"), // idem
            Limit.of("Dh", 1.30, 9.37, "mm"), // idem
            Limit.of("Pt", 20.4, 31.8, "mm"), // idem
            Limit.of("Pl", 12.7, 32.0, "mm"), // idem
            Limit.of("Fp", 1.0, 8.7, "mm"), // idem
            Limit.of("N", 1, 6)); // idem

    /** Share of the j data within ±15 % (abstract of the paper). */
    public static final double SCATTER_J = 0.886;
    /** Share of the f data within ±15 % (abstract of the paper). */
    public static final double SCATTER_F = 0.851;
    /** The band of both shares, ±15 % (abstract of the paper). */
    public static final double SCATTER_BAND = 0.15;

    /** Lowest ReDc at which the formula is evaluated at all (ln ReDc appears in denominators). */
    static final double RE_COMPUTABLE_MIN = 10;
    /** Highest ReDc at which the formula is evaluated at all. */
    static final double RE_COMPUTABLE_MAX = 1e6;

    private static final String METHOD = "Wang, Chi & Chang 2000 plain fin";

    /** The single instance (the class holds no state). */
    public static final WangChiChang2000PlainFin INSTANCE = new WangChiChang2000PlainFin();

    private WangChiChang2000PlainFin() {
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String finType() {
        return FIN_TYPE;
    }

    @Override
    public Citation source() {
        return SOURCE;
    }

    @Override
    public Validity validity() {
        return VALIDITY;
    }

    @Override
    public double scatterJ() {
        return SCATTER_J;
    }

    @Override
    public double scatterF() {
        return SCATTER_F;
    }

    @Override
    public double scatterBand() {
        return SCATTER_BAND;
    }

    /**
     * Evaluates the correlation.
     *
     * @param s    the surface (any fin pattern is accepted, a non-plain one with a warning)
     * @param reDc Reynolds number on the collar diameter [-], between 10 and 1e6
     * @param w    where range warnings go
     * @return j and f
     */
    @Override
    public JF evaluate(AirSideSurface s, double reDc, Warnings w) {
        if (s == null) {
            throw new InputException("surface", Msg.MISSING);
        }
        Check.within("reDc", reDc, RE_COMPUTABLE_MIN, RE_COMPUTABLE_MAX);
        double dc = s.collarDiameter();
        double dh = s.hydraulicDiameter();
        double pt = s.transversePitch();
        double pl = s.rowPitch();
        double fp = s.finPitch();
        int n = s.rows();

        VALIDITY.check(METHOD, "ReDc", reDc, w);
        VALIDITY.check(METHOD, "Dc", dc * 1e3, w);
        VALIDITY.check(METHOD, "Dh", dh * 1e3, w);
        VALIDITY.check(METHOD, "Pt", pt * 1e3, w);
        VALIDITY.check(METHOD, "Pl", pl * 1e3, w);
        VALIDITY.check(METHOD, "Fp", fp * 1e3, w);
        VALIDITY.check(METHOD, "N", n, w);
        if (!s.staggered()) {
            w.add(METHOD + ": fitted to staggered tube layouts; the surface is inline");
        }
        if (!FIN_TYPE.equals(s.finType())) {
            w.add(METHOD + ": fitted to plain fins; the surface has " + s.finType() + " fins");
        }

        double ln = Math.log(reDc);
        double j;
        if (n == 1) {
            double p1 = 1.9 - 0.23 * ln;
            double p2 = -0.236 + 0.126 * ln;
            j = 0.108 * Math.pow(reDc, -0.29) * Math.pow(pt / pl, p1) * Math.pow(fp / dc, -1.084)
                    * Math.pow(fp / dh, -0.786) * Math.pow(fp / pt, p2);
        } else {
            double p3 = -0.361 - 0.042 * n / ln + 0.158 * Math.log(n * Math.pow(fp / dc, 0.41));
            double p4 = -1.224 - 0.076 * Math.pow(pl / dh, 1.42) / ln;
            double p5 = -0.083 + 0.058 * n / ln;
            double p6 = -5.735 + 1.21 * Math.log(reDc / n);
            j = 0.086 * Math.pow(reDc, p3) * Math.pow(n, p4) * Math.pow(fp / dc, p5)
                    * Math.pow(fp / dh, p6) * Math.pow(fp / pt, -0.93);
        }
        double f1 = -0.764 + 0.739 * pt / pl + 0.177 * fp / dc - 0.00758 / n;
        double f2 = -15.689 + 64.021 / ln;
        double f3 = 1.696 - 15.695 / ln;
        double f = 0.0267 * Math.pow(reDc, f1) * Math.pow(pt / pl, f2) * Math.pow(fp / dc, f3);
        if (!(Double.isFinite(j) && j > 0 && Double.isFinite(f) && f > 0)) {
            throw new InputException("surface", Msg.IMPOSSIBLE,
                    METHOD + " cannot be evaluated for this geometry at ReDc = " + reDc);
        }
        return new JF(j, f);
    }
}
