package org.finstack.study;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CancellationException;
import org.finstack.coil.CoilCase;
import org.finstack.coil.IsothermalCoilModel;
import org.finstack.io.CaseFiles;
import org.finstack.material.Material;
import org.finstack.material.Materials;
import org.junit.jupiter.api.Test;

/**
 * Sweeps: each point is the rating model's own result for the changed case, trends go the way
 * the physics says (more fins, rows, air or a clean coil carry more heat), an impossible value
 * gives a point with its reason, and a cancelled sweep stops (the rating model is the reference;
 * the trends are common practice).
 */
class SweepTest {

    private static final CoilCase BASE = CaseFiles.read(Path.of("examples", "otterby-rooftop-condenser.json"));

    @Test
    void eachPointIsTheModelsRatingOfTheChangedCase() {
        List<Sweep.Point> pts = Sweep.over(BASE, Sweep.Parameter.ROWS, new double[] {2, 4});
        assertThat(pts.get(1).rating().capacity())
                .isEqualTo(new IsothermalCoilModel().rate(BASE.withCoil(BASE.coil().withRows(4))).capacity());
        assertThat(Sweep.Parameter.ROWS.valueIn(BASE)).isEqualTo(3);
        assertThat(Sweep.Parameter.FIN_DENSITY.valueIn(BASE)).isCloseTo(1 / 2.1e-3,
                org.assertj.core.data.Percentage.withPercentage(1e-10));
    }

    @Test
    void capacityRisesWithFinDensityRowsAndFaceVelocity() {
        for (var c : List.of(new Object[] {Sweep.Parameter.FIN_DENSITY, Sweep.range(150, 600, 6)},
                new Object[] {Sweep.Parameter.ROWS, new double[] {1, 2, 3, 4, 5, 6}},
                new Object[] {Sweep.Parameter.FACE_VELOCITY, Sweep.range(1, 4, 6)})) {
            List<Sweep.Point> pts = Sweep.over(BASE, (Sweep.Parameter) c[0], (double[]) c[1]);
            for (int i = 1; i < pts.size(); i++) {
                assertThat(pts.get(i).rating().capacity()).as("%s", c[0])
                        .isGreaterThan(pts.get(i - 1).rating().capacity());
                assertThat(pts.get(i).rating().airPressureDrop()).as("%s", c[0])
                        .isGreaterThan(pts.get(i - 1).rating().airPressureDrop());
            }
        }
    }

    @Test
    void airSideFoulingCostsCapacityAndTheWallHoldsLittleBack() {
        List<Sweep.Point> dirt = Sweep.over(BASE, Sweep.Parameter.AIR_FOULING, new double[] {0, 2e-4, 5e-4});
        assertThat(dirt.get(1).rating().capacity()).isLessThan(dirt.get(0).rating().capacity());
        assertThat(dirt.get(2).rating().capacity()).isLessThan(dirt.get(1).rating().capacity());
        List<Sweep.Point> wall = Sweep.over(BASE, Sweep.Parameter.TUBE_WALL, new double[] {0.3e-3, 1.0e-3});
        // a copper wall's own conduction stays well under 1 % of 1/UA even at 1 mm; a thicker wall
        // still costs a little capacity, because the bore and so the inside area shrink
        for (Sweep.Point p : wall) {
            assertThat(p.rating().resistances().wall() / p.rating().resistances().total()).isLessThan(0.01);
        }
        assertThat(wall.get(1).rating().capacity()).isLessThan(wall.get(0).rating().capacity());
    }

    @Test
    void tubeMaterialsAreSweptByName() {
        List<Material> tubes = Materials.library().materials().stream().filter(Material::forTubes).toList();
        List<Sweep.Point> pts = Sweep.overTubeMaterials(BASE, tubes, CoilModel.ISOTHERMAL, Progress.NONE);
        assertThat(pts).extracting(Sweep.Point::label).containsExactlyElementsOf(tubes.stream().map(Material::id).toList());
        assertThat(pts).allMatch(Sweep.Point::rated);
    }

    @Test
    void anImpossibleValueGivesItsReasonNotAHole() {
        // 0.1 mm pitch is less than the 0.115 mm fin: the coil cannot exist
        List<Sweep.Point> pts = Sweep.over(BASE, Sweep.Parameter.FIN_DENSITY, new double[] {400, 10_000});
        assertThat(pts.get(0).rated()).isTrue();
        assertThat(pts.get(1).rated()).isFalse();
        assertThat(pts.get(1).error()).contains("finPitch");
    }

    @Test
    void cancellingStopsTheSweep() {
        int[] steps = {0};
        Progress stopAfterTwo = new Progress() {
            @Override
            public void step(int done, int total) {
                steps[0] = done;
            }

            @Override
            public boolean cancelled() {
                return steps[0] >= 2;
            }
        };
        assertThatThrownBy(() -> Sweep.over(BASE, Sweep.Parameter.ROWS, new double[] {1, 2, 3, 4}, CoilModel.ISOTHERMAL,
                stopAfterTwo)).isInstanceOf(CancellationException.class);
        assertThat(steps[0]).isEqualTo(2);
    }

    @Test
    void modelRegistryRoundTripsItsIds() {
        assertThat(CoilModel.values()).extracting(CoilModel::kind)
                .containsExactly(org.finstack.coil.RefrigerantSide.Model.values());
        for (CoilModel m : CoilModel.values()) {
            assertThat(CoilModel.byId("model", m.id())).isEqualTo(m);
        }
        assertThat(CoilModel.ISOTHERMAL.id()).isEqualTo(IsothermalCoilModel.ID);
        assertThat(CoilModel.byId("model", "zones").id()).isEqualTo(org.finstack.coil.ZoneCoilModel.ID);
        assertThatThrownBy(() -> CoilModel.byId("model", "nonsense")).hasMessageStartingWith("model:");
    }

    @Test
    void aZoneSweepPointIsTheDispatchersRatingOfTheChangedCase() {
        CoilCase full = CaseFiles.read(Path.of("examples", "otterby-rooftop-condenser-full.json"));
        CoilModel zones = CoilModel.of(full);
        assertThat(zones.id()).isEqualTo("zones");
        List<Sweep.Point> pts = Sweep.over(full, Sweep.Parameter.ROWS, new double[] {4}, zones, Progress.NONE);
        assertThat(pts.get(0).rating().capacity())
                .isEqualTo(org.finstack.coil.CoilModels.rate(full.withCoil(full.coil().withRows(4))).capacity());
        assertThat(pts.get(0).rating().model()).isEqualTo("zones");
    }
}
