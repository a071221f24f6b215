package org.finstack.study.pressure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/** Tube ratings with the shipped allowable stresses, against the copper tube handbook and by hand. */
class TubePressureRatingTest {

    /** 1 psi in pascal (NIST SP 811, Appendix B). */
    private static final double PSI = 0.45359237 * 9.80665 / (0.0254 * 0.0254);
    private static final double D = 0.375 * 0.0254;
    private static final double T = 0.030 * 0.0254;

    /** Degrees Fahrenheit to kelvin (NIST SP 811, Appendix B.8). */
    private static double kelvin(double f) {
        return (f + 459.67) / 1.8;
    }

    /** The worked example of the class Javadoc, repeated: 7.0715 MPa, S = 41.369 MPa. */
    @Test
    void workedExampleAnnealedCopperAt100F() {
        PressureRating r = TubePressureRating.allowablePressure("copper", D, T, kelvin(100));
        Reference.assertRelative(7.0715e6, r.allowableGauge(), 1e-4, "3/8 x 0.030 in annealed copper at 100 F");
        Reference.assertRelative(41.369e6, r.stress(), 1e-4, "S = 6000 psi");
        assertThat(r.temper()).isEqualTo(Temper.ANNEALED);
        assertThat(r.method()).isEqualTo(AsmeB31StraightPipe.SOURCE);
        assertThat(r.stressSource().key()).isEqualTo("cda-cth");
    }

    /**
     * Copper Tube Handbook Table 3c, Type M 1/2 in row (read): annealed 494 psi at 100 F, 420 at
     * 150 F, 247 at 400 F; drawn 850 at 100 F. The rule is linear in S, so the ratios of the
     * table are the ratios of the allowable stresses the file holds.
     */
    @Test
    void copperTubeHandbookTable3cTemperatureAndTemperRatios() {
        double at100 = TubePressureRating.allowablePressure("copper", D, T, kelvin(100)).allowableGauge();
        double at150 = TubePressureRating.allowablePressure("copper", D, T, kelvin(150)).allowableGauge();
        double at400 = TubePressureRating.allowablePressure("copper", D, T, kelvin(400)).allowableGauge();
        double drawn = TubePressureRating.allowablePressure("copper", Temper.DRAWN, D, T, kelvin(100), 0, 1)
                .allowableGauge();
        Reference.assertRelative(420.0 / 494, at150 / at100, 0.01, "Table 3c 150 F / 100 F annealed");
        Reference.assertRelative(247.0 / 494, at400 / at100, 0.01, "Table 3c 400 F / 100 F annealed");
        Reference.assertRelative(850.0 / 494, drawn / at100, 0.01, "Table 3c drawn / annealed at 100 F");
    }

    /**
     * ASTM B280 ACR tube, maximum pressure at 150 F from a supplier's data sheet ("Pressure Rating
     * of Copper Pipes and Tubes", High Purity Gas Delivery Systems, table "Tube - Copper - ASTM
     * B280 - Refrigeration Type", read): 1/4 x 0.030 in 1195, 3/8 x 0.032 836, 1/2 x 0.032 618,
     * 5/8 x 0.035 525, 3/4 x 0.035 435, 7/8 x 0.045 495, 1-1/8 x 0.050 420, 1-5/8 x 0.060 347 psi
     * (its 1-3/8 in row repeats the Type L value and is left out). The sheet names no temper; the
     * annealed stress at 150 F with the minimum wall taken as 90 % of nominal (ASTM wall tolerance
     * about 10 %, from memory) reproduces it within 3 %.
     */
    @Test
    void acrTubeRatingsAt150FromASupplierSheet() {
        double[][] rows = {
            {0.250, 0.030, 1195}, {0.375, 0.032, 836}, {0.500, 0.032, 618}, {0.625, 0.035, 525},
            {0.750, 0.035, 435}, {0.875, 0.045, 495}, {1.125, 0.050, 420}, {1.625, 0.060, 347},
        };
        for (double[] r : rows) {
            double p = TubePressureRating.allowablePressure("copper", r[0] * 0.0254, 0.9 * r[1] * 0.0254, kelvin(150))
                    .allowableGauge();
            Reference.assertRelative(r[2] * PSI, p, 0.03, "ACR " + r[0] + " x " + r[1] + " in at 150 F");
        }
    }

    /** By hand: at 125 F the stress is midway between 6000 and 5100 psi, 5550 psi. */
    @Test
    void stressIsInterpolatedLinearlyBetweenListedTemperatures() {
        PressureRating r = TubePressureRating.allowablePressure("copper", D, T, kelvin(125));
        Reference.assertRelative(5550 * PSI, r.stress(), 1e-9, "annealed copper at 125 F");
        PressureRating cold = TubePressureRating.allowablePressure("copper", D, T, 253.15);
        Reference.assertRelative(6000 * PSI, cold.stress(), 1e-12, "below 100 F the 100 F value applies");
    }

    @Test
    void everyTubeMaterialOfTheLibraryIsRated() {
        for (String id : List.of("copper", "copper-etp", "aluminium-3003", "cupronickel-90-10", "stainless-304",
                "carbon-steel")) {
            PressureRating r = TubePressureRating.allowablePressure(id, 9.52e-3, 0.35e-3, 323.15);
            assertThat(r.allowableGauge()).as(id).isPositive().isFinite();
            assertThat(r.materialId()).isEqualTo(id);
            assertThat(r.notes()).as(id).isNotEmpty();
        }
        assertThat(AllowableStressTable.standard().materialIds()).containsExactly("copper", "copper-etp",
                "aluminium-3003", "cupronickel-90-10", "stainless-304", "carbon-steel");
    }

    @Test
    void aliasesOfTheMaterialLibraryResolve() {
        assertThat(TubePressureRating.allowablePressure("C12200", D, T, 300).materialId()).isEqualTo("copper");
        assertThat(TubePressureRating.allowablePressure("SS304", D, T, 300).materialId()).isEqualTo("stainless-304");
        assertThat(TubePressureRating.allowablePressure("90/10", D, T, 300).materialId())
                .isEqualTo("cupronickel-90-10");
    }

    @Test
    void finStockAndUnknownMaterialsAreRefusedOnTheTubeMaterialField() {
        for (String name : new String[] {"aluminium", "brass", "", null}) {
            assertThatThrownBy(() -> TubePressureRating.allowablePressure(name, D, T, 300))
                    .as("material %s", name)
                    .isInstanceOfSatisfying(InputException.class, e -> {
                        assertThat(e.field()).isEqualTo("coil.tubeMaterial");
                        assertThat(e.msg()).isEqualTo(Msg.UNKNOWN_NAME);
                    });
        }
    }

    /** Common practice: stainless steel tube is far stronger than annealed copper of the same size. */
    @Test
    void stainlessRatesAboveCopperAndCopperAboveAnnealedAluminium() {
        double cu = TubePressureRating.allowablePressure("copper", 15.88e-3, 0.6e-3, 320).allowableGauge();
        double ss = TubePressureRating.allowablePressure("stainless-304", 15.88e-3, 0.6e-3, 320).allowableGauge();
        double al = TubePressureRating.allowablePressure("aluminium-3003", 15.88e-3, 0.6e-3, 320).allowableGauge();
        assertThat(ss).isGreaterThan(cu);
        assertThat(cu).isGreaterThan(al);
    }

    @Test
    void drawnTemperRatesHigherAndFallsBackToAnnealedWhereNoDrawnValueIsHeld() {
        PressureRating annealed = TubePressureRating.allowablePressure("copper", Temper.ANNEALED, D, T, 320, 0, 1);
        PressureRating drawn = TubePressureRating.allowablePressure("copper", Temper.DRAWN, D, T, 320, 0, 1);
        assertThat(drawn.allowableGauge()).isGreaterThan(annealed.allowableGauge());
        assertThat(drawn.notes().get(0)).contains("Drawn-temper");
        PressureRating ss = TubePressureRating.allowablePressure("stainless-304", Temper.DRAWN, D, T, 320, 0, 1);
        assertThat(ss.temper()).isEqualTo(Temper.ANNEALED);
        assertThat(String.join(" ", ss.notes())).contains("no drawn-temper value is held");
    }

    @Test
    void shortFormStatesTheAnnealedCoilTubeAssumptionAndTheMakersRatingGoverns() {
        PressureRating r = TubePressureRating.allowablePressure("copper", D, T, 320);
        String notes = String.join(" ", r.notes());
        assertThat(notes).contains("Annealed-temper stress used").contains("brazed").contains("maker's rated design pressure");
        assertThat(TubePressureRating.allowablePressure("carbon-steel", D, T, 320).notes())
                .anyMatch(n -> n.contains("No corrosion allowance"));
    }

    @Test
    void designTemperaturesOutsideTheTablesAreRefused() {
        assertThatThrownBy(() -> TubePressureRating.allowablePressure("copper", D, T, 600))
                .isInstanceOfSatisfying(InputException.class, e -> {
                    assertThat(e.field()).isEqualTo("designTemperature");
                    assertThat(e.msg()).isEqualTo(Msg.OUT_OF_BOUNDS);
                });
        // carbon steel below -20 F (244.26 K) needs impact testing (from memory): refused
        assertThatThrownBy(() -> TubePressureRating.allowablePressure("carbon-steel", D, T, 233.15))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.field()).isEqualTo("designTemperature"));
        // ASME B31.5 covers piping down to -320 F (77.6 K) (read): copper at 80 K is rated
        assertThat(TubePressureRating.allowablePressure("copper", D, T, 80).allowableGauge()).isPositive();
        // aluminium values are held to 150 F (338.7 K) only
        assertThatThrownBy(() -> TubePressureRating.allowablePressure("aluminium-3003", D, T, 340))
                .isInstanceOf(InputException.class);
        assertThatThrownBy(() -> TubePressureRating.allowablePressure("copper", D, T, Double.NaN))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.field()).isEqualTo("designTemperature"));
    }

    @Test
    void impossibleTubesAreRefusedOnTheCoilFields() {
        assertThatThrownBy(() -> TubePressureRating.allowablePressure("copper", 9.52e-3, 5e-3, 300))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.field()).isEqualTo("coil.tubeWall"));
        assertThatThrownBy(() -> TubePressureRating.allowablePressure("copper", -9.52e-3, 0.3e-3, 300))
                .isInstanceOfSatisfying(InputException.class,
                        e -> assertThat(e.field()).isEqualTo("coil.tubeOuterDiameter"));
        assertThatThrownBy(() -> TubePressureRating.allowablePressure("copper", 9.52e-3, 0, 300))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.field()).isEqualTo("coil.tubeWall"));
    }

    @Test
    void everyStressValueNamesAResolvableSourceAndCopperHoldsBothTempers() {
        AllowableStressTable table = AllowableStressTable.standard();
        for (String id : table.materialIds()) {
            AllowableStress s = table.stress(id, Temper.ANNEALED, 300);
            assertThat(table.references()).containsValue(s.source());
            assertThat(s.note()).as(id).isNotBlank();
            if (!s.source().key().equals("cda-cth")) {
                assertThat(s.note()).as("%s: a recalled value says so", id).contains("from memory");
            }
        }
        assertThat(table.holds("copper", Temper.DRAWN)).isTrue();
        assertThat(table.holds("stainless-304", Temper.DRAWN)).isFalse();
        Reference.assertRelative(kelvin(400), table.maxTemperature("copper", Temper.ANNEALED), 1e-12, "copper to 400 F");
        Reference.assertRelative(kelvin(-320), table.minTemperature("copper"), 1e-12, "copper from -320 F");
    }
}
