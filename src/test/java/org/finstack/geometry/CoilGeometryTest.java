package org.finstack.geometry;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.finstack.testing.Reference.assertRelative;

import org.finstack.core.InputException;
import org.finstack.testing.Coils;
import org.junit.jupiter.api.Test;

/**
 * Derived geometry against Kays &amp; London's tabulated surface data, a copper tube's weight per
 * length against the ASTM B280 table, and invariants of the area and passage formulas.
 */
class CoilGeometryTest {

    private static final double FOOT = 0.3048; // NIST SP 811, Appendix B.9: 1 ft = 0.3048 m exactly

    /**
     * Kays &amp; London, Compact Heat Exchangers, 3rd ed. (1984), Fig. 10-91, surface 8.0-3/8T:
     * Dh = 0.01192 ft, sigma = 0.534, alpha = 179 ft2/ft3, fin area / total area = 0.913 (from
     * memory; the four values agree with each other through Dh = 4 sigma / alpha).
     */
    @Test
    void kaysLondonSurface8T() {
        CoilGeometry g = Coils.kaysLondon8T(4);
        DerivedGeometry d = g.derive();
        double volume = d.faceArea() * d.depth();
        assertRelative(0.01192 * FOOT, d.hydraulicDiameter(), 0.005, "Dh of K&L 8.0-3/8T");
        assertRelative(0.534, d.sigma(), 0.005, "sigma of K&L 8.0-3/8T");
        assertRelative(179 / FOOT, d.airSideArea() / volume, 0.005, "alpha of K&L 8.0-3/8T");
        assertRelative(0.913, d.finAreaRatio(), 0.002, "fin area ratio of K&L 8.0-3/8T");
    }

    /**
     * ASTM B280 (seamless copper tube for air conditioning and refrigeration field service),
     * table of dimensions and weights: 3/8 in OD, 0.030 in wall: 0.126 lb/ft (from memory).
     * C12200 density 8940 kg/m3 from the material library.
     */
    @Test
    void astmB280CopperTubeWeightPerFoot() {
        CoilGeometry g = Coils.exampleCondenser().withTubeWall(0.030 * 0.0254);
        CoilGeometry one = new CoilGeometry(0.375 * 0.0254, 0.030 * 0.0254, g.tubeMaterial(), g.arrangement(),
                g.transversePitch(), g.rowPitch(), 1, 1, FOOT, "plain", g.finPitch(),
                g.finThickness(), g.finMaterial(), 1, null, 0);
        double lbPerFt = one.derive().tubeMass() / 0.45359237; // NIST SP 811: 1 lb = 0.45359237 kg
        assertRelative(0.126, lbPerFt, 0.01, "ASTM B280 3/8 x 0.030 copper tube weight");
    }

    @Test
    void collarIsTubePlusTwoFinThicknesses() {
        CoilGeometry g = Coils.exampleCondenser();
        assertThat(g.collarDiameter()).isEqualTo(9.52e-3 + 2 * 0.115e-3);
        assertThat(g.insideDiameter()).isEqualTo(9.52e-3 - 2 * 0.30e-3);
    }

    /** Invariant: every area, volume and mass is proportional to the finned length. */
    @Test
    void doublingFinnedLengthDoublesAreasVolumeAndMass() {
        CoilGeometry g = Coils.exampleCondenser();
        DerivedGeometry a = g.derive();
        DerivedGeometry b = g.withFinnedLength(2 * g.finnedLength()).derive();
        assertRelative(2 * a.airSideArea(), b.airSideArea(), 1e-12, "air-side area");
        assertRelative(2 * a.finArea(), b.finArea(), 1e-12, "fin area");
        assertRelative(2 * a.insideArea(), b.insideArea(), 1e-12, "inside area");
        assertRelative(2 * a.minFlowArea(), b.minFlowArea(), 1e-12, "free-flow area");
        assertRelative(2 * a.internalVolume(), b.internalVolume(), 1e-12, "internal volume");
        assertRelative(2 * a.metalMass(), b.metalMass(), 1e-12, "metal mass");
        assertRelative(a.hydraulicDiameter(), b.hydraulicDiameter(), 1e-12, "hydraulic diameter");
    }

    /** Invariant: denser fins add area and narrow the passages. */
    @Test
    void denserFinsAddAreaAndNarrowPassages() {
        CoilGeometry g = Coils.exampleCondenser();
        DerivedGeometry sparse = g.withFinPitch(3e-3).derive();
        DerivedGeometry dense = g.withFinPitch(1.6e-3).derive();
        assertThat(dense.airSideArea()).isGreaterThan(sparse.airSideArea());
        assertThat(dense.minFlowArea()).isLessThan(sparse.minFlowArea());
        assertThat(dense.hydraulicDiameter()).isLessThan(sparse.hydraulicDiameter());
    }

    /** For a staggered pattern the diagonal gap governs when rows are close (geometry of the pattern). */
    @Test
    void staggeredMinimumAreaTakesTheSmallerGap() {
        CoilGeometry wide = Coils.exampleCondenser();
        DerivedGeometry d = wide.derive();
        double transverse = (wide.transversePitch() - d.collarDiameter());
        double open = wide.finnedLength() - d.finCount() * wide.finThickness();
        assertRelative(wide.tubesPerRow() * transverse * open, d.minFlowArea(), 1e-12, "transverse gap governs");
        CoilGeometry tight = new CoilGeometry(wide.tubeOuterDiameter(), wide.tubeWall(), wide.tubeMaterial(),
                Arrangement.STAGGERED, 30e-3, 11e-3, 2, 16, 0.9, "plain", 2.1e-3, 0.115e-3,
                wide.finMaterial(), 4, null, 0);
        DerivedGeometry t = tight.derive();
        double diagonal = 2 * (Math.hypot(15e-3, 11e-3) - t.collarDiameter());
        assertRelative(16 * diagonal * open, t.minFlowArea(), 1e-12, "diagonal gap governs");
    }

    /**
     * A fin pitch as long as the coil or longer (a "2000 mm" typed for "2.0 mm") holds not one fin
     * gap; rated, the correlations gave a pressure drop of 1e119 Pa. Refused at the geometry.
     */
    @Test
    void finPitchNotBelowTheFinnedLengthIsRefused() {
        CoilGeometry g = Coils.exampleCondenser();
        assertThatThrownBy(() -> g.withFinPitch(2.0)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("finPitch: fin pitch 2 m must be less than the finned length");
        assertThatThrownBy(() -> g.withFinPitch(g.finnedLength())).isInstanceOf(InputException.class)
                .hasMessageStartingWith("finPitch:");
    }

    @Test
    void impossibleGeometryIsRefusedNamingTheField() {
        CoilGeometry g = Coils.exampleCondenser();
        assertThatThrownBy(() -> g.withFinPitch(0.1e-3)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("finPitch: fin pitch");
        assertThatThrownBy(() -> g.withTubeWall(5e-3)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("tubeWall:");
        assertThatThrownBy(() -> g.withRows(0)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("rows:");
        assertThatThrownBy(() -> new CoilGeometry(9.52e-3, 0.3e-3, g.tubeMaterial(), Arrangement.STAGGERED, 9.6e-3,
                22e-3, 3, 16, 0.9, "plain", 2.1e-3, 0.115e-3, g.finMaterial(), 4, null, 0))
                .isInstanceOf(InputException.class).hasMessageStartingWith("transversePitch:");
        assertThatThrownBy(() -> new CoilGeometry(9.52e-3, 0.3e-3, g.tubeMaterial(), Arrangement.INLINE, 25.4e-3,
                9e-3, 3, 16, 0.9, "plain", 2.1e-3, 0.115e-3, g.finMaterial(), 4, null, 0))
                .isInstanceOf(InputException.class).hasMessageStartingWith("rowPitch:");
        assertThatThrownBy(() -> new CoilGeometry(9.52e-3, 0.3e-3, g.tubeMaterial(), Arrangement.INLINE, 25.4e-3,
                22e-3, 3, 16, 0.9, "plain", 2.1e-3, 0.115e-3, g.finMaterial(), 49, null, 0))
                .isInstanceOf(InputException.class).hasMessageStartingWith("circuits:");
    }
}
