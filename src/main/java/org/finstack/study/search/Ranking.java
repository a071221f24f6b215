package org.finstack.study.search;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * The order a search presents its candidates in, and the Pareto front of capacity against air
 * pressure drop.
 *
 * <p><b>Order.</b> With a required capacity Q_req &gt; 0, candidates that meet it
 * (capacity &ge; Q_req) come first, ordered by
 * <ol>
 *   <li>air pressure drop, lowest first (the fan's burden and its energy),</li>
 *   <li>refrigerant charge, lowest first (full models only; a candidate without one after those with one),</li>
 *   <li>metal mass of tubes and fins, lowest first (material and cost),</li>
 *   <li>name (so the order never depends on thread timing);</li>
 * </ol>
 * then those that fall short, largest capacity first (the nearest miss first), then by the same
 * pressure drop, charge, mass and name. Without a requirement (Q_req = 0) every candidate counts
 * as meeting it and the order is by capacity, largest first, then pressure drop, charge, mass and
 * name.
 *
 * <p><b>Pareto front.</b> A candidate is Pareto-optimal when no other has at least its capacity
 * and at most its air pressure drop with one of the two strictly better. Candidates with equal
 * capacity and equal pressure drop do not dominate each other.
 */
public final class Ranking {

    private Ranking() {
    }

    /**
     * What the order and the front look at.
     *
     * @param name            candidate name
     * @param capacity        [W]
     * @param airPressureDrop [Pa]
     * @param charge          refrigerant charge [kg], or {@code null} when the model gives none
     * @param metalMass       [kg]
     */
    public record Entry(String name, double capacity, double airPressureDrop, Double charge, double metalMass) {

        /** Checks the name is present. */
        public Entry {
            Objects.requireNonNull(name, "name");
        }
    }

    /**
     * @param requirement required capacity [W], or 0 for none
     * @param e           an entry
     * @return whether the entry meets the requirement
     */
    public static boolean meets(double requirement, Entry e) {
        return requirement <= 0 || e.capacity() >= requirement;
    }

    /**
     * @param requirement required capacity [W], or 0 for none
     * @return the documented order
     */
    public static Comparator<Entry> order(double requirement) {
        Comparator<Entry> tail = Comparator.comparingDouble(Entry::airPressureDrop)
                .thenComparing(Entry::charge, Comparator.nullsLast(Comparator.naturalOrder()))
                .thenComparingDouble(Entry::metalMass)
                .thenComparing(Entry::name);
        Comparator<Entry> byCapacity = Comparator.comparingDouble(Entry::capacity).reversed().thenComparing(tail);
        if (requirement <= 0) {
            return byCapacity;
        }
        return (a, b) -> {
            boolean ma = meets(requirement, a);
            boolean mb = meets(requirement, b);
            if (ma != mb) {
                return ma ? -1 : 1;
            }
            return ma ? tail.compare(a, b) : byCapacity.compare(a, b);
        };
    }

    /**
     * @param entries     entries in any order
     * @param requirement required capacity [W], or 0 for none
     * @return the positions of {@code entries} in the documented order
     */
    public static int[] rank(List<Entry> entries, double requirement) {
        Comparator<Entry> c = order(requirement);
        List<Integer> idx = new ArrayList<>();
        for (int i = 0; i < entries.size(); i++) {
            idx.add(i);
        }
        idx.sort((a, b) -> c.compare(entries.get(a), entries.get(b)));
        return idx.stream().mapToInt(Integer::intValue).toArray();
    }

    /**
     * Marks the Pareto front of capacity (higher is better) against air pressure drop (lower is
     * better), in O(n log n): sorted by pressure drop, an entry is on the front when its capacity
     * exceeds that of every entry with a strictly lower pressure drop and is the largest among
     * those with its own pressure drop.
     *
     * @param entries entries in any order
     * @return for each entry, whether it is Pareto-optimal
     */
    public static boolean[] paretoFront(List<Entry> entries) {
        int n = entries.size();
        List<Integer> idx = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            idx.add(i);
        }
        idx.sort(Comparator.<Integer>comparingDouble(i -> entries.get(i).airPressureDrop())
                .thenComparing(Comparator.<Integer>comparingDouble(i -> entries.get(i).capacity()).reversed()));
        boolean[] front = new boolean[n];
        double bestBefore = Double.NEGATIVE_INFINITY;
        int k = 0;
        while (k < n) {
            double dp = entries.get(idx.get(k)).airPressureDrop();
            double groupBest = entries.get(idx.get(k)).capacity();
            int end = k;
            while (end < n && entries.get(idx.get(end)).airPressureDrop() == dp) {
                double q = entries.get(idx.get(end)).capacity();
                front[idx.get(end)] = q > bestBefore && q == groupBest;
                end++;
            }
            bestBefore = Math.max(bestBefore, groupBest);
            k = end;
        }
        return front;
    }
}
