package org.finstack.study;

import java.util.Arrays;
import java.util.Objects;
import java.util.stream.Collectors;
import org.finstack.coil.CoilCase;
import org.finstack.coil.IsothermalCoilModel;
import org.finstack.coil.Rating;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * The rating models a user may choose between. Each entry's id is its model class's own
 * {@code ID} constant. One model exists today; the zone and tube-by-tube models join this list
 * when they are built, and a chooser in the workbench lists {@link #values()}.
 */
public enum CoilModel {
    /** Dry coil, refrigerant at one saturation temperature, given inside coefficient. */
    ISOTHERMAL(IsothermalCoilModel.ID) {
        @Override
        public Rating rate(CoilCase c) {
            return new IsothermalCoilModel().rate(c);
        }
    };

    private final String id;

    CoilModel(String id) {
        this.id = id;
    }

    /** @return the model's id, as reported in {@link Rating#model()} */
    public String id() {
        return id;
    }

    /**
     * Rates a case with this model.
     *
     * @param c the case
     * @return the rating
     */
    public abstract Rating rate(CoilCase c);

    /**
     * @param field input field, for messages
     * @param id    a model id
     * @return the model
     */
    public static CoilModel byId(String field, String id) {
        Objects.requireNonNull(id, "id");
        for (CoilModel m : values()) {
            if (m.id.equalsIgnoreCase(id.strip())) {
                return m;
            }
        }
        throw new InputException(field, Msg.UNKNOWN_NAME, id,
                Arrays.stream(values()).map(CoilModel::id).collect(Collectors.joining(", ")));
    }
}
