package org.finstack.airside;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Limit;
import org.finstack.core.Msg;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Wang, Lee, Chang &amp; Lin (1999) correlation for louvered plate fins on staggered round
 * tubes, for two rows or more.
 *
 * <p>Colburn factor, ReDc &lt; 1000:
 * <pre>
 *   j = 14.3117 ReDc^J1 (Fp/Dc)^J2 (Lh/Lp)^J3 (Fp/Pl)^J4 (Pl/Pt)^-1.724
 *   J1 = -0.991 - 0.1055 (Pl/Pt)^3.1 ln(Lh/Lp)
 *   J2 = -0.7344 + 2.1059 N^0.55 / (ln ReDc - 3.2)
 *   J3 = 0.08485 (Pl/Pt)^-4.4 N^-0.68
 *   J4 = -0.1741 ln N
 * </pre>
 * ReDc &ge; 1000:
 * <pre>
 *   j = 1.1373 ReDc^J5 (Fp/Pl)^J6 (Lh/Lp)^J7 (Pl/Pt)^J8 N^0.3545
 *   J5 = -0.6027 + 0.02593 (Pl/Dh)^0.52 N^-0.5 ln(Lh/Lp)
 *   J6 = -0.4776 + 0.40774 N^0.7 / (ln ReDc - 4.4)
 *   J7 = -0.58655 (Fp/Dh)^2.3 (Pl/Pt)^-1.6 N^-0.65
 *   J8 = 0.0814 (ln ReDc - 3)
 * </pre>
 * Fanning friction factor, N &ge; 2:
 * <pre>
 *   f = 0.06393 ReDc^F5 (Fp/Dc)^F6 (Dh/Dc)^F7 (Lh/Lp)^F8 N^F9 (ln ReDc - 4.0)^-1.093
 *   F5 = 0.1395 - 0.0101 (Fp/Pl)^0.58 (Lh/Lp)^-2 ln(Ao/At) (Pl/Pt)^1.9
 *   F6 = -6.4367 / ln ReDc
 *   F7 = 0.07191 ln ReDc
 *   F8 = -2.0585 (Fp/Pt)^1.67 ln ReDc
 *   F9 = 0.1036 ln(Pl/Pt)
 * </pre>
 * where ReDc [-] is the Reynolds number on the collar diameter and the velocity in the minimum
 * free-flow area, Dc [m] the collar diameter, Dh [m] the hydraulic diameter 4 Amin L / Ao,
 * Pt [m] the transverse pitch, Pl [m] the row pitch, Fp [m] the fin pitch, Lp [m] the louver
 * pitch, Lh [m] the louver height, N [-] the number of rows and Ao/At [-] the total air-side
 * area over the bare-tube outside area ({@link AirSideSurface#bareTubeAreaRatio()}). The two j
 * branches do not meet at ReDc = 1000 (the high branch is some 7 to 15 % higher there for
 * usual geometries); the published switch is kept as printed.
 *
 * <p><b>Transcription.</b> The coefficients above follow the transcription of Jacobi, Park,
 * Tafti &amp; Zhang (2001) as carried in the Modelica FluidDissipation library (functions
 * {@code kc_roundTube_KC} and {@code dp_roundTube_DP}), and agree with the implementer's
 * recollection of the paper's equations (from memory); the paper itself was not at hand. The
 * paper's one-row friction correlation is <em>not</em> implemented: the transcription and the
 * recollection disagree on two of its exponents, so a one-row surface is refused rather than
 * rated with a guessed formula.
 *
 * <p>Published scatter (from memory, abstract of the paper): 95.5 % of the j data and 90.8 % of
 * the f data within ±15 %; 49 samples.
 *
 * <p>Validity: ReDc 300 to 7000 (the range FluidDissipation states for this correlation, and the
 * paper's, from memory); geometry of the database (from memory): Dc 6.93 to 10.42 mm, Pt 17.7
 * to 25.4 mm, Pl 12.7 to 22 mm, Fp 1.21 to 2.49 mm, Lp 1.7 to 3.75 mm, Lh 0.79 to 1.4 mm,
 * N 1 to 6, staggered tubes. Outside it the value is still returned with a warning; an inline
 * layout also adds a warning.
 *
 * <p>Worked example: Dc = 10.23 mm, Dh = 2.27 mm, Pt = 25.4 mm, Pl = 19.05 mm, Fp = 1.8 mm,
 * fin thickness 0.115 mm (so Ao/At = 15.164), Lp = 2.4 mm, Lh = 1.0 mm, N = 2, staggered,
 * ReDc = 2000 give j = 0.023741 and f = 0.084205.
 */
public final class WangLeeChangLin1999LouveredFin implements AirSideCorrelation {

    /** Identifier in {@link AirSideCorrelations}. */
    public static final String ID = "wang-lee-chang-lin-1999-louvered";

    /** Fin type. */
    public static final String FIN_TYPE = "louvered";

    /** The paper. */
    public static final Citation SOURCE = Citation.of("Wang, Lee, Chang & Lin 1999",
            "Wang, C.-C., Lee, C.-J., Chang, C.-T., Lin, S.-P., 1999, \"Heat transfer and friction"
                    + " correlation for compact louvered fin-and-tube heat exchangers\", Int. J. Heat Mass"
                    + " Transfer 42:1945-1956");

    /** The transcription the coefficients were checked against. */
    public static final Citation TRANSCRIPTION = Citation.of("Jacobi et al. 2001",
            "Jacobi, A.M., Park, Y., Tafti, D., Zhang, X., 2001, \"An assessment of the state of the art,"
                    + " and potential design improvements, for flat-tube heat exchangers in air conditioning"
                    + " and refrigeration applications - phase I\", ARTI final report; as transcribed in the"
                    + " Modelica FluidDissipation library, HeatTransfer.HeatExchanger.kc_roundTube_KC and"
                    + " PressureLoss.HeatExchanger.dp_roundTube_DP");

    /** Published range (geometry in millimetres). */
    public static final Validity VALIDITY = Validity.of(
            Limit.of("ReDc", 300, 7000), // FluidDissipation kc_roundTube/dp_roundTube documentation; paper from memory
            Limit.of("Dc", 6.93, 10.42, "mm"), // Wang et al. 1999 database, from memory
            Limit.of("Pt", 17.7, 25.4, "mm"), // idem, from memory
            Limit.of("Pl", 12.7, 22.0, "mm"), // idem, from memory
            Limit.of("Fp", 1.21, 2.49, "mm"), // idem, from memory
            Limit.of("Lp", 1.7, 3.75, "mm"), // idem, from memory
            Limit.of("Lh", 0.79, 1.4, "mm"), // idem, from memory
            Limit.of("N", 1, 6)); // idem, from memory

    /** Share of the j data within ±15 % (abstract of the paper, from memory). */
    public static final double SCATTER_J = 0.955;
    /** Share of the f data within ±15 % (abstract of the paper, from memory). */
    public static final double SCATTER_F = 0.908;
    /** The band of both shares, ±15 % (abstract of the paper, from memory). */
    public static final double SCATTER_BAND = 0.15;

    /** ReDc at which the published j correlation changes branch (Wang et al. 1999, via Jacobi et al. 2001). */
    public static final double RE_BRANCH = 1000;

    /**
     * Lowest ReDc at which the formula is evaluated at all: the friction factor has
     * {@code (ln ReDc - 4.0)} raised to a negative power and the low-Re j branch divides by
     * {@code ln ReDc - 3.2}, so both blow up near ReDc = 55 and 25.
     */
    static final double RE_COMPUTABLE_MIN = 100;
    /** Highest ReDc at which the formula is evaluated at all. */
    static final double RE_COMPUTABLE_MAX = 1e6;

    private static final String METHOD = "Wang, Lee, Chang & Lin 1999 louvered fin";

    /** The single instance (the class holds no state). */
    public static final WangLeeChangLin1999LouveredFin INSTANCE = new WangLeeChangLin1999LouveredFin();

    private WangLeeChangLin1999LouveredFin() {
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
     * @param s    the surface; its pattern must be {@link AirSideSurface.Pattern.Louvered} and it
     *             must have two rows or more
     * @param reDc Reynolds number on the collar diameter [-], between 100 and 1e6
     * @param w    where range warnings go
     * @return j and f
     * @throws InputException for a surface without louvers (field {@code pattern}), a one-row
     *                        surface (field {@code rows}), or a ReDc where the formula cannot be
     *                        evaluated (field {@code reDc})
     */
    @Override
    public JF evaluate(AirSideSurface s, double reDc, Warnings w) {
        if (s == null) {
            throw new InputException("surface", Msg.MISSING);
        }
        if (!(s.pattern() instanceof AirSideSurface.Pattern.Louvered louvers)) {
            throw new InputException("pattern", Msg.IMPOSSIBLE, METHOD + " needs a louvered fin (louver pitch and"
                    + " louver height); the surface has " + s.finType() + " fins");
        }
        if (s.rows() < 2) {
            throw new InputException("rows", Msg.IMPOSSIBLE, METHOD + ": the one-row friction correlation is not"
                    + " implemented (its published exponents could not be confirmed); give two rows or more");
        }
        Check.within("reDc", reDc, RE_COMPUTABLE_MIN, RE_COMPUTABLE_MAX);
        double dc = s.collarDiameter();
        double dh = s.hydraulicDiameter();
        double pt = s.transversePitch();
        double pl = s.rowPitch();
        double fp = s.finPitch();
        double lp = louvers.louverPitch();
        double lh = louvers.louverHeight();
        int n = s.rows();
        double areaRatio = s.bareTubeAreaRatio();
        if (!(areaRatio > 1)) {
            throw new InputException("surface", Msg.IMPOSSIBLE, METHOD + ": the fins add no area to the tubes"
                    + " (Ao/At = " + areaRatio + "); check the pitches and the collar diameter");
        }

        VALIDITY.check(METHOD, "ReDc", reDc, w);
        VALIDITY.check(METHOD, "Dc", dc * 1e3, w);
        VALIDITY.check(METHOD, "Pt", pt * 1e3, w);
        VALIDITY.check(METHOD, "Pl", pl * 1e3, w);
        VALIDITY.check(METHOD, "Fp", fp * 1e3, w);
        VALIDITY.check(METHOD, "Lp", lp * 1e3, w);
        VALIDITY.check(METHOD, "Lh", lh * 1e3, w);
        VALIDITY.check(METHOD, "N", n, w);
        if (!s.staggered()) {
            w.add(METHOD + ": fitted to staggered tube layouts; the surface is inline");
        }

        double ln = Math.log(reDc);
        double louver = lh / lp;
        double j;
        if (reDc < RE_BRANCH) {
            double j1 = -0.991 - 0.1055 * Math.pow(pl / pt, 3.1) * Math.log(louver);
            double j2 = -0.7344 + 2.1059 * Math.pow(n, 0.55) / (ln - 3.2);
            double j3 = 0.08485 * Math.pow(pl / pt, -4.4) * Math.pow(n, -0.68);
            double j4 = -0.1741 * Math.log(n);
            j = 14.3117 * Math.pow(reDc, j1) * Math.pow(fp / dc, j2) * Math.pow(louver, j3)
                    * Math.pow(fp / pl, j4) * Math.pow(pl / pt, -1.724);
        } else {
            double j5 = -0.6027 + 0.02593 * Math.pow(pl / dh, 0.52) * Math.pow(n, -0.5) * Math.log(louver);
            double j6 = -0.4776 + 0.40774 * Math.pow(n, 0.7) / (ln - 4.4);
            double j7 = -0.58655 * Math.pow(fp / dh, 2.3) * Math.pow(pl / pt, -1.6) * Math.pow(n, -0.65);
            double j8 = 0.0814 * (ln - 3);
            j = 1.1373 * Math.pow(reDc, j5) * Math.pow(fp / pl, j6) * Math.pow(louver, j7)
                    * Math.pow(pl / pt, j8) * Math.pow(n, 0.3545);
        }
        double f5 = 0.1395 - 0.0101 * Math.pow(fp / pl, 0.58) * Math.pow(louver, -2) * Math.log(areaRatio)
                * Math.pow(pl / pt, 1.9);
        double f6 = -6.4367 / ln;
        double f7 = 0.07191 * ln;
        double f8 = -2.0585 * Math.pow(fp / pt, 1.67) * ln;
        double f9 = 0.1036 * Math.log(pl / pt);
        double f = 0.06393 * Math.pow(reDc, f5) * Math.pow(fp / dc, f6) * Math.pow(dh / dc, f7)
                * Math.pow(louver, f8) * Math.pow(n, f9) * Math.pow(ln - 4.0, -1.093);
        if (!(Double.isFinite(j) && j > 0 && Double.isFinite(f) && f > 0)) {
            throw new InputException("surface", Msg.IMPOSSIBLE,
                    METHOD + " cannot be evaluated for this geometry at ReDc = " + reDc);
        }
        return new JF(j, f);
    }
}
