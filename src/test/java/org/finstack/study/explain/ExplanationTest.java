package org.finstack.study.explain;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.finstack.coil.Rating;
import org.finstack.io.CaseFiles;
import org.finstack.io.ProjectFiles;
import org.finstack.study.compare.Comparison;
import org.junit.jupiter.api.Test;

/**
 * The explanations are deterministic and carry no invented numbers: every percentage in them is
 * one of the computed shares or changes, rounded as the class says (invariants; the reference is
 * the rating itself).
 */
class ExplanationTest {

    private static final Pattern PERCENT = Pattern.compile("(\\d+(?:\\.\\d)?) %");

    @Test
    void sameInputsGiveTheSameSentences() {
        var c = CaseFiles.read(Path.of("examples/otterby-rooftop-condenser-full.json"));
        assertThat(Explanation.forCoil(Sensitivity.of(c))).isEqualTo(Explanation.forCoil(Sensitivity.of(c)));
        var p = ProjectFiles.read(ComparisonPaths.FULL);
        assertThat(Explanation.tradeOffs(Comparison.of(p))).isEqualTo(Explanation.tradeOffs(Comparison.of(p)));
    }

    @Test
    void resistanceSentenceStatesTheComputedShares() {
        Rating r = Sensitivity.of(CaseFiles.read(Path.of("examples/otterby-rooftop-condenser-full.json"))).baseRating();
        Map<String, Double> s = r.resistances().shares();
        String text = Explanation.resistances(r);
        String air = Explanation.share(s.get("airFilm") + s.get("fin"));
        assertThat(text).startsWith("The air film and fins hold back " + air);
        assertThat(text).contains(Explanation.share(s.get("insideFilm") + s.get("insideFouling")));
    }

    @Test
    void everyPercentageInACoilExplanationIsAComputedOne() {
        Sensitivity.Result s = Sensitivity.of(SensitivityTest.CASES.get(1));
        List<String> allowed = new ArrayList<>(List.of("10", "1"));
        Map<String, Double> sh = s.baseRating().resistances().shares();
        for (double v : new double[] {sh.get("airFilm") + sh.get("fin"), sh.get("airFouling") + sh.get("coating"),
                sh.get("insideFilm") + sh.get("insideFouling"), sh.get("wall") + sh.get("contact")}) {
            allowed.add(number(Explanation.share(v)));
        }
        for (var e : s.effects()) {
            allowed.add(number(Explanation.share(e.capacityFraction())));
            allowed.add(number(Explanation.share(e.airPressureDropFraction())));
        }
        allowed.add(number(Explanation.share(s.cleaning().capacityFraction())));
        allowed.add(number(Explanation.share(s.cleaning().airPressureDropFraction())));
        for (String sentence : Explanation.forCoil(s)) {
            Matcher m = PERCENT.matcher(sentence);
            while (m.find()) {
                assertThat(allowed).as(sentence).contains(m.group(1));
            }
        }
    }

    @Test
    void recommendationNamesTheRecommendedOption() {
        Comparison c = Comparison.of(ProjectFiles.read(ComparisonPaths.FULL));
        assertThat(Explanation.recommendation(c)).startsWith("Recommended: " + c.recommended().orElseThrow().name());
    }

    private static String number(String share) {
        return share.replace(" %", "").replace("under 1", "1");
    }

    /** Paths of the example projects. */
    static final class ComparisonPaths {
        static final Path FULL = Path.of("examples/projects/otterby-condenser-options-full.finstack.json");
    }
}
