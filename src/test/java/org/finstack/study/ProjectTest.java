package org.finstack.study;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.finstack.coil.CoilCase;
import org.finstack.coil.FoulingResistances;
import org.finstack.io.CaseFiles;
import org.junit.jupiter.api.Test;

/** Projects: options are addressed existing-first, edits make new records, overrides replace whole parts. */
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
}
