package org.finstack.airside;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;

import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * The air-side correlations Finstack knows, keyed by their {@code ID} constants. Immutable.
 *
 * <p>Fin types: "plain", "wavy", "louvered". The plain fin has {@link WangChiChang2000PlainFin}
 * and the louvered fin {@link WangLeeChangLin1999LouveredFin}; the wavy fin has no correlation
 * yet (the published coefficients could not be confirmed), so asking for it returns an empty
 * list and {@link #standard} refuses it.
 */
public final class AirSideCorrelations {

    /** The fin types a surface may have (see {@link AirSideSurface.Pattern}). */
    public static final List<String> FIN_TYPES = List.of("plain", "wavy", "louvered");

    private static final Map<String, AirSideCorrelation> BY_ID;

    static {
        Map<String, AirSideCorrelation> m = new LinkedHashMap<>();
        for (AirSideCorrelation c : List.<AirSideCorrelation>of(WangChiChang2000PlainFin.INSTANCE,
                WangLeeChangLin1999LouveredFin.INSTANCE)) {
            if (m.put(c.id(), c) != null) {
                throw new IllegalStateException("duplicate correlation id " + c.id());
            }
        }
        BY_ID = Collections.unmodifiableMap(m);
    }

    private AirSideCorrelations() {
    }

    /** @return every correlation, in registration order */
    public static List<AirSideCorrelation> all() {
        return List.copyOf(BY_ID.values());
    }

    /**
     * @param id a correlation's {@link AirSideCorrelation#id()}
     * @return the correlation
     * @throws InputException (field {@code airSide.correlation}) if no correlation has that id
     */
    public static AirSideCorrelation byId(String id) {
        AirSideCorrelation c = id == null ? null : BY_ID.get(id);
        if (c == null) {
            throw new InputException("airSide.correlation", Msg.UNKNOWN_NAME, id, String.join(", ", BY_ID.keySet()));
        }
        return c;
    }

    /**
     * The correlation a rating uses for a fin type: the first registered for it.
     *
     * @param field   the input field naming the fin type, for messages
     * @param finType a fin type as the user wrote it (any case)
     * @return the correlation
     * @throws InputException naming the field, for an unknown fin type or one without a correlation yet
     */
    public static AirSideCorrelation standard(String field, String finType) {
        String type = finType == null ? "" : finType.strip().toLowerCase(Locale.ROOT);
        String ready = BY_ID.values().stream().map(AirSideCorrelation::finType).distinct()
                .collect(Collectors.joining(", "));
        if (!FIN_TYPES.contains(type)) {
            throw new InputException(field, Msg.UNKNOWN_NAME, finType, ready);
        }
        return BY_ID.values().stream().filter(c -> c.finType().equals(type)).findFirst()
                .orElseThrow(() -> new InputException(field, Msg.NO_CORRELATION, type, ready));
    }

    /**
     * @param finType one of {@link #FIN_TYPES}
     * @return the correlations fitted to that fin type (possibly none)
     * @throws InputException (field {@code airSide.finType}) for an unknown fin type
     */
    public static List<AirSideCorrelation> byFinType(String finType) {
        if (finType == null || !FIN_TYPES.contains(finType)) {
            throw new InputException("airSide.finType", Msg.UNKNOWN_NAME, finType, String.join(", ", FIN_TYPES));
        }
        return BY_ID.values().stream().filter(c -> c.finType().equals(finType)).toList();
    }
}
