package org.finstack.study.search;

import java.nio.file.Path;
import java.util.List;
import org.finstack.io.ProjectFiles;
import org.finstack.material.Materials;
import org.finstack.study.Project;

/** Projects and small search spaces shared by the search tests (kept small so the tests stay quick); the patterns are the library's (common practice). */
final class SearchFixtures {

    /** The demo project: R-134a condenser, isothermal model, 950 x 420 x 100 mm opening, 4 circuits, 7 kW. */
    static final Path ISOTHERMAL = Path.of("examples/projects/otterby-condenser-options.finstack.json");

    /** The search example: the same condenser with its full refrigerant side (zone model) and a louvered option. */
    static final Path ZONES = Path.of("examples/projects/otterby-condenser-search.finstack.json");

    private SearchFixtures() {
    }

    static Project project(Path p) {
        return ProjectFiles.read(p);
    }

    /** The 3/8 in pattern only, copper tubes and aluminium fins, rows 2 to 3: 2 x 5 fin densities = 10 candidates. */
    static SearchSpace small(Project p) {
        Materials lib = Materials.library();
        return SearchSpace.forProject(p).withPatterns(List.of("3/8in-25.4x22")).withRows(2, 3)
                .withMaterials(List.of(lib.tube("t", "copper")), List.of(lib.fin("f", "aluminium")));
    }
}
