package org.finstack.study.search;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Size;
import org.junit.jupiter.api.Test;

/**
 * The ranking order as documented in {@link Ranking} and the Pareto front: hand-made sets whose
 * answers were worked out by hand, and the definition of dominance checked by brute force
 * (an invariant) on random sets.
 */
class RankingTest {

    private static Ranking.Entry e(String name, double kw, double pa, Double charge, double mass) {
        return new Ranking.Entry(name, kw * 1000, pa, charge, mass);
    }

    /** Hand-made: B dominates C and G, D dominates E, A and F tie (neither dominates). Front: A, B, D, F. */
    @Test
    void paretoFrontOfAHandMadeSet() {
        List<Ranking.Entry> set = List.of(e("A", 10, 50, null, 1), e("B", 8, 30, null, 1), e("C", 8, 40, null, 1),
                e("D", 12, 80, null, 1), e("E", 9, 80, null, 1), e("F", 10, 50, null, 1), e("G", 5, 30, null, 1));
        boolean[] front = Ranking.paretoFront(set);
        List<String> on = new ArrayList<>();
        for (int i = 0; i < set.size(); i++) {
            if (front[i]) {
                on.add(set.get(i).name());
            }
        }
        assertThat(on).containsExactly("A", "B", "D", "F");
    }

    /**
     * Hand-made, requirement 9 kW: meeting are P (10 kW, 50 Pa, 1 kg charge, 5 kg), Q (10 kW, 50 Pa,
     * 1 kg, 4 kg), R (12 kW, 50 Pa, 0.8 kg, 9 kg), S (9 kW exactly, 70 Pa); short are T (8.5 kW) and
     * U (6 kW, 10 Pa). Order by hand: R (least charge at 50 Pa), Q (lighter than P), P, S; then T, U.
     */
    @Test
    void meetingFirstByPressureDropChargeMassThenShortByCapacity() {
        List<Ranking.Entry> set = List.of(e("U", 6, 10, 0.5, 1), e("P", 10, 50, 1.0, 5), e("T", 8.5, 90, 0.9, 2),
                e("S", 9, 70, 1.0, 3), e("Q", 10, 50, 1.0, 4), e("R", 12, 50, 0.8, 9));
        assertThat(names(set, 9000)).containsExactly("R", "Q", "P", "S", "T", "U");
    }

    /** Without a requirement: largest capacity first, ties by pressure drop. */
    @Test
    void withoutRequirementLargestCapacityFirst() {
        List<Ranking.Entry> set = List.of(e("U", 6, 10, null, 1), e("P", 10, 50, null, 5), e("R", 12, 60, null, 9),
                e("Q", 10, 40, null, 4));
        assertThat(names(set, 0)).containsExactly("R", "Q", "P", "U");
        assertThat(set).allMatch(x -> Ranking.meets(0, x));
    }

    /** A candidate without a charge (isothermal model) sorts after one with a charge at equal pressure drop. */
    @Test
    void missingChargeSortsAfterAGivenOne() {
        List<Ranking.Entry> set = List.of(e("none", 10, 50, null, 1), e("given", 10, 50, 2.0, 5));
        assertThat(names(set, 1)).containsExactly("given", "none");
    }

    private static List<String> names(List<Ranking.Entry> set, double requirement) {
        return Arrays.stream(Ranking.rank(set, requirement)).mapToObj(i -> set.get(i).name()).toList();
    }

    /** Invariant: the fast front equals the definition (no other entry at least as good in both, better in one). */
    @Property(tries = 300)
    void frontMatchesTheDefinition(@ForAll @Size(max = 40) List<@IntRange(min = 1, max = 12) Integer> caps,
            @ForAll @Size(max = 40) List<@IntRange(min = 1, max = 12) Integer> drops) {
        int n = Math.min(caps.size(), drops.size());
        List<Ranking.Entry> set = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            set.add(e("c" + i, caps.get(i), drops.get(i), null, 1));
        }
        boolean[] front = Ranking.paretoFront(set);
        for (int i = 0; i < n; i++) {
            boolean dominated = false;
            for (int j = 0; j < n; j++) {
                Ranking.Entry a = set.get(j);
                Ranking.Entry b = set.get(i);
                if (a.capacity() >= b.capacity() && a.airPressureDrop() <= b.airPressureDrop()
                        && (a.capacity() > b.capacity() || a.airPressureDrop() < b.airPressureDrop())) {
                    dominated = true;
                }
            }
            assertThat(front[i]).as("entry %d", i).isEqualTo(!dominated);
        }
    }

    /** Invariant: with a requirement every meeting entry precedes every short one. */
    @Property(tries = 200)
    void meetingEntriesPrecedeShortOnes(@ForAll @Size(max = 30) List<@IntRange(min = 1, max = 20) Integer> caps,
            @ForAll @IntRange(min = 1, max = 20) int requiredKw) {
        List<Ranking.Entry> set = new ArrayList<>();
        for (int i = 0; i < caps.size(); i++) {
            set.add(e("c" + i, caps.get(i), 100 - caps.get(i), null, 1));
        }
        int[] order = Ranking.rank(set, requiredKw * 1000.0);
        boolean seenShort = false;
        for (int i : order) {
            boolean meets = Ranking.meets(requiredKw * 1000.0, set.get(i));
            assertThat(meets && seenShort).isFalse();
            seenShort |= !meets;
        }
    }
}
