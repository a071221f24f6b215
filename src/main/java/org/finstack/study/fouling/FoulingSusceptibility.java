package org.finstack.study.fouling;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.finstack.core.Citation;
import org.finstack.core.Numbers;
import org.finstack.geometry.CoilGeometry;

/**
 * Warns when a fin chosen for a dusty duty is of a kind that published fouling tests found to
 * foul fastest. Bell &amp; Groll (2011) loaded plate-fin and louvered-fin coils with ASHRAE and
 * Arizona test dust and found the louvered coils with fin pitches below 2.0 mm "significantly more
 * prone to fouling" than louvered coils of larger pitch, and the wavy plate-fin coil
 * "significantly less sensitive" (abstract of the paper). Two warnings follow:
 * <ul>
 * <li>a louvered fin: louvers catch dust (Bell &amp; Groll 2011);</li>
 * <li>a dense fin, above {@link #DENSE_FINS_PER_INCH} fins per inch (a fin pitch below
 *     2.54 mm): the threshold is common practice for dusty duties, set a little wider than the
 *     2.0 mm of Bell &amp; Groll's louvered coils because a plate fin holds dust on its leading
 *     edges alike.</li>
 * </ul>
 *
 * <p>Worked example: a louvered coil at 14 fpi (fin pitch 1.814 mm) draws both warnings; a plain
 * coil at 6 fpi draws none.
 */
public final class FoulingSusceptibility {

    /** The fouling tests the warnings rest on. */
    public static final Citation SOURCE = Citation.of("Bell & Groll 2011",
            "Bell I.H., Groll E.A. (2011). Air-side particulate fouling of microchannel heat exchangers:"
                    + " experimental comparison of air-side pressure drop and heat transfer with plate-fin heat"
                    + " exchanger. Applied Thermal Engineering 31(5), 742-749.");

    /** Fin density above which a dusty duty is warned of [fins per inch]; common practice. */
    public static final double DENSE_FINS_PER_INCH = 10;

    private static final double INCH = 0.0254; // m, exact by definition (NIST SP 811)

    private FoulingSusceptibility() {
    }

    /**
     * @param coil the coil chosen for a dusty duty
     * @return the warnings (empty when neither applies)
     */
    public static List<String> warnings(CoilGeometry coil) {
        List<String> out = new ArrayList<>();
        double fpi = INCH / coil.finPitch();
        if (CoilGeometry.LOUVERED.equalsIgnoreCase(coil.finType().strip())) {
            out.add("louvered fins foul faster in dusty air than plain or wavy plate fins (" + SOURCE.key()
                    + "); expect the pressure drop to rise sooner than this study's uniform layer suggests");
        }
        if (fpi > DENSE_FINS_PER_INCH) {
            out.add(String.format(Locale.ROOT, "%s fins per inch is dense for a dusty duty (above %s fpi; %s found"
                    + " fin pitches below 2 mm markedly more prone to fouling): dust bridges the fin gaps at the"
                    + " coil face", Numbers.brief(fpi), Numbers.brief(DENSE_FINS_PER_INCH), SOURCE.key()));
        }
        return out;
    }
}
