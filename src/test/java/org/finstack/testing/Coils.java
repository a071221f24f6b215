package org.finstack.testing;

import org.finstack.geometry.Arrangement;
import org.finstack.geometry.CoilGeometry;
import org.finstack.material.Materials;

/** Coils used by several tests: the product issue's example condenser and Kays & London's reference surface 8.0-3/8T. */
public final class Coils {

    private static final double INCH = 0.0254; // NIST SP 811, Appendix B.9: 1 in = 0.0254 m exactly

    private Coils() {
    }

    /**
     * The condenser of the example case: 3/8 in copper tubes on 25.4 x 22 mm, 3 rows of
     * 16, 900 mm finned, 2.1 mm aluminium fins 0.115 mm thick, 4 circuits.
     *
     * @return the coil
     */
    public static CoilGeometry exampleCondenser() {
        Materials lib = Materials.library();
        return new CoilGeometry(9.52e-3, 0.30e-3, lib.tube("t", "copper"), Arrangement.STAGGERED, 25.4e-3, 22.0e-3,
                3, 16, 0.900, "plain", 2.1e-3, 0.115e-3, lib.fin("f", "aluminium"), 4, null, 0);
    }

    /**
     * Kays &amp; London surface 8.0-3/8T (circular tubes, continuous plain fins): tube (collar)
     * outside diameter 0.402 in, fin pitch 8.0 per inch, fin thickness 0.013 in, staggered on
     * 1.00 in x 0.866 in. Our tube diameter is the collar less two fin thicknesses.
     *
     * @param rows rows in the air direction
     * @return the coil
     */
    public static CoilGeometry kaysLondon8T(int rows) {
        Materials lib = Materials.library();
        double t = 0.013 * INCH;
        return new CoilGeometry(0.402 * INCH - 2 * t, 0.025 * INCH, lib.tube("t", "copper"), Arrangement.STAGGERED,
                1.00 * INCH, 0.866 * INCH, rows, 10, 0.5, "plain", INCH / 8.0, t,
                lib.fin("f", "aluminium"), 1, null, 0);
    }
}
