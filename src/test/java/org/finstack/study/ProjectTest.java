package org.finstack.study;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.finstack.coil.CoilCase;
import org.finstack.coil.Duty;
import org.finstack.coil.FoulingResistances;
import org.finstack.coil.RefrigerantSide;
import org.finstack.coil.RefrigerantSide.Model;
import org.finstack.coil.RefrigerantSide.SaturationConvention;
import org.finstack.coil.RefrigerantSide.Target;
import org.finstack.io.CaseFiles;
import org.finstack.io.ProjectFiles;
import org.junit.jupiter.api.Test;

/**
 * Projects: options are addressed existing-first, edits make new records, overrides replace whole
 * parts; the full refrigerant side (version-2 case-file keys) survives a save and a read; a
 * version-1 project is written back without the new keys (invariants of the project format; the
 * case files under examples/ are the reference the parts are read against).
 */
class ProjectTest {

    private static final CoilCase C2 = CaseFiles.read(Path.of("examples", "otterby-rooftop-condenser.json"));

    private static Project project() {
        Conditions c = Conditions.of(C2);
        return new Project(1, "p", c, new Option("existing", C2.coil(), null),
                List.of(new Option("candidate", C2.coil().withRows(4), null)), null, null);
    }

    @Test
    void existingComesFirstAndDuplicatesAppend() {
        Project p = project();
        assertThat(p.allOptions()).extracting(Option::name).containsExactly("existing", "candidate");
        Project d = p.duplicate(0, "copy");
        assertThat(d.allOptions()).extracting(Option::name).containsExactly("existing", "candidate", "copy");
        assertThat(d.caseOf(2)).isEqualTo(p.caseOf(0));
        assertThat(p.allOptions()).hasSize(2);
        assertThat(d.remove(1).allOptions()).extracting(Option::name).containsExactly("existing", "copy");
        assertThat(p.withOption(1, p.options().get(0).withName("renamed")).options().get(0).name()).isEqualTo("renamed");
    }

    @Test
    void overridesReplaceWholeParts() {
        Project p = project();
        FoulingResistances dirty = new FoulingResistances(3e-4, 0, 0);
        Option o = p.options().get(0).withOverrides(new Overrides(null, null, dirty));
        Project q = p.withOption(1, o);
        assertThat(q.caseOf(1).fouling()).isEqualTo(dirty);
        assertThat(q.caseOf(1).air()).isEqualTo(C2.air());
        assertThat(q.caseOf(0).fouling()).isEqualTo(C2.fouling());
    }

    @Test
    void fullRefrigerantSidesSurviveSaveAndRead() {
        CoilCase wet = CaseFiles.read(Path.of("examples", "otterby-dairy-cooler-wet.json"));
        List<RefrigerantSide> sides = List.of(wet.refrigerant(),
                new RefrigerantSide("R134a", Duty.EVAPORATOR, 268.15, SaturationConvention.MID, 0, 303.15, 0,
                        new Target.Capacity(9000, 5), Model.ZONES, 10),
                new RefrigerantSide("R407C", Duty.CONDENSER, 318.15, SaturationConvention.DEW, 2100, 0, 343.15,
                        new Target.MassFlow(0.031), Model.TUBES, 24),
                new RefrigerantSide("R134a", Duty.CONDENSER, 318.15, SaturationConvention.DEW, 0, 0, 343.15,
                        new Target.Subcooling(0), Model.TUBES, 10));
        for (RefrigerantSide r : sides) {
            Project p = project().withConditions(Conditions.of(C2).withRefrigerant(r));
            Project back = ProjectFiles.parse(ProjectFiles.toJson(p), "round trip");
            assertThat(back.conditions().refrigerant()).as(r.toString()).isEqualTo(r);
            assertThat(back).isEqualTo(p);
        }
    }

    @Test
    void aVersionOneProjectIsWrittenWithoutTheNewKeys() {
        String json = ProjectFiles.toJson(project());
        assertThat(json).contains("\"insideCoefficient\"").doesNotContain("\"model\"", "\"segments\"",
                "\"superheat\"", "\"saturationConvention\"", "\"liquidTemperature\"");
    }

    @Test
    void theModelChooserSetsTheRefrigerantSidesModel() {
        Conditions c = Conditions.of(C2);
        assertThat(c.model()).isEqualTo(CoilModel.ISOTHERMAL);
        CoilCase full = CaseFiles.read(Path.of("examples", "otterby-rooftop-condenser-full.json"));
        Conditions zones = Conditions.of(full);
        assertThat(zones.model().id()).isEqualTo("zones");
        Conditions tubes = zones.withModel(CoilModel.byId("model", "tubes"));
        assertThat(tubes.refrigerant().model()).isEqualTo(Model.TUBES);
        assertThat(tubes.refrigerant().target()).isEqualTo(zones.refrigerant().target());
        // the isothermal model needs a given film coefficient: refused naming the field
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> zones.withModel(CoilModel.ISOTHERMAL))
                .hasMessageStartingWith("insideCoefficient");
    }

    @Test
    void damagedEntriesKeepTheirPlacesAndSurviveEdits() {
        Project.Damaged first = new Project.Damaged("options[0]", 0, "bad first", "options[0].coil: is missing", "{}");
        Project.Damaged last = new Project.Damaged("options[5]", 5, "bad last", "options[5]: must be a JSON object", "7");
        Project p = project();
        Project d = new Project(p.version(), p.name(), p.conditions(), p.existing(), p.options(), p.constraints(),
                p.notes(), List.of(last, first));
        // existing first; a damaged entry at its slot; one past the end of the list goes last
        assertThat(d.entries()).extracting(e -> e.readable() ? "option " + e.option() : e.damaged().name())
                .containsExactly("option 0", "bad first", "option 1", "bad last");
        // edits keep the damaged entries: none is ever lost
        assertThat(d.duplicate(1, "copy").damaged()).containsExactly(last, first);
        assertThat(d.remove(1).damaged()).containsExactly(last, first);
        assertThat(d.addOption(new Option("added", C2.coil(), null)).damaged()).containsExactly(last, first);
        assertThat(d.withName("n").withNotes("x").withConditions(p.conditions()).damaged()).hasSize(2);
        assertThat(d.withConstraints(Constraints.NONE.withRoom(new Constraints.Room(10, 4, 1, false))).damaged())
                .hasSize(2);
        assertThat(d.withOption(0, p.existing().withName("renamed")).damaged()).hasSize(2);
        // the seven-part constructor is the project without damaged entries
        assertThat(p.damaged()).isEmpty();
        assertThat(p.entries()).allMatch(Project.Entry::readable);
    }

    @Test
    void roomRefusesNonPositiveValuesNamingTheField() {
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> new Constraints.Room(0, 4, 1, false))
                .isInstanceOf(org.finstack.core.InputException.class).hasMessageStartingWith("volume:");
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> new Constraints.Room(10, 4, Double.NaN, true))
                .isInstanceOf(org.finstack.core.InputException.class).hasMessageStartingWith("releaseHeight:");
    }
}
