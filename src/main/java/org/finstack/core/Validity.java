package org.finstack.core;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The validity range of a published method: a set of {@link Limit}s, checked on every call.
 * A value outside its range does not stop the calculation; it adds a warning that names the
 * method, the variable, the value and the published range.
 */
public final class Validity {

    private final Map<String, Limit> limits;
    private final String basis;

    private Validity(String basis, List<Limit> limits) {
        this.basis = basis;
        Map<String, Limit> m = new LinkedHashMap<>();
        for (Limit l : limits) {
            if (m.put(l.variable(), l) != null) {
                throw new IllegalArgumentException("duplicate limit for " + l.variable());
            }
        }
        this.limits = Map.copyOf(m);
    }

    /**
     * @param limits the method's limits
     * @return the validity range
     */
    public static Validity of(Limit... limits) {
        return new Validity("published range", List.of(limits));
    }

    /**
     * A range not stated by the method's source but assessed otherwise (e.g. against an exact
     * solution); warnings name that basis instead of calling the range published.
     *
     * @param basis  how the range was found, completing "outside the range ..."
     * @param limits the limits
     * @return the validity range
     */
    public static Validity assessed(String basis, Limit... limits) {
        return new Validity("range " + basis + ",", List.of(limits));
    }

    /** @return the limits, keyed by variable name */
    public Map<String, Limit> limits() {
        return limits;
    }

    /**
     * @param variable the variable's name
     * @return its limit
     * @throws IllegalArgumentException if the method states no limit for it
     */
    public Limit limit(String variable) {
        Limit l = limits.get(variable);
        if (l == null) {
            throw new IllegalArgumentException("no limit stated for " + variable);
        }
        return l;
    }

    /**
     * Checks one value; outside the range adds a warning.
     *
     * @param method   the method's short name, e.g. {@code "Wang, Chi & Chang 2000 plain fin"}
     * @param variable the variable's name (must have a limit)
     * @param value    the value, in the limit's unit
     * @param warnings where warnings go
     * @return whether the value is inside the range
     */
    public boolean check(String method, String variable, double value, Warnings warnings) {
        Limit l = limit(variable);
        if (l.contains(value)) {
            return true;
        }
        if (!warnings.keeps()) {
            return false;
        }
        String unit = l.unit().isEmpty() ? "" : " " + l.unit();
        warnings.add(String.format(Locale.ROOT, "%s: %s = %s%s is outside the %s %s to %s%s",
                method, variable, Numbers.brief(value), unit, basis, Numbers.brief(l.min()),
                Numbers.brief(l.max()), unit));
        return false;
    }
}
