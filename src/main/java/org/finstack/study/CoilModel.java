package org.finstack.study;

import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.stream.Collectors;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.Rating;
import org.finstack.coil.RefrigerantSide;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * The rating models a user may choose between: one entry per {@link RefrigerantSide.Model}, so a
 * model added there appears here (and in the workbench's chooser, which lists {@link #values()})
 * without a second list to keep in step. Rating goes through {@link CoilModels#rate}, the one
 * dispatch by model; a model not in the build is refused there with the reason.
 *
 * @param kind the refrigerant side's model this entry stands for
 */
public record CoilModel(RefrigerantSide.Model kind) {

    /** The isothermal model (given film coefficient), the default of version-1 cases. */
    public static final CoilModel ISOTHERMAL = new CoilModel(RefrigerantSide.Model.ISOTHERMAL);

    /** Checks the kind is present. */
    public CoilModel {
        Objects.requireNonNull(kind, "kind");
    }

    /** @return every model, in the order of {@link RefrigerantSide.Model} */
    public static List<CoilModel> values() {
        return Arrays.stream(RefrigerantSide.Model.values()).map(CoilModel::new).toList();
    }

    /**
     * @param c a case
     * @return the model the case names
     */
    public static CoilModel of(CoilCase c) {
        return new CoilModel(c.refrigerant().model());
    }

    /** @return the model's id, as written in case files and reported in {@link Rating#model()} */
    public String id() {
        return kind.id();
    }

    /**
     * @param r a refrigerant side
     * @return the same side to be rated by this model (every other value kept)
     * @throws InputException when the side lacks what this model needs (e.g. a film coefficient
     *                        for the isothermal model, a target for the others), naming the field
     */
    public RefrigerantSide applyTo(RefrigerantSide r) {
        if (r.model() == kind) {
            return r;
        }
        return new RefrigerantSide(r.fluid(), r.duty(), r.saturationTemperature(), r.convention(),
                r.insideCoefficient(), r.liquidTemperature(), r.inletTemperature(), r.target(), kind, r.segments());
    }

    /**
     * Rates a case with this model, through {@link CoilModels#rate}.
     *
     * @param c the case
     * @return the rating
     */
    public Rating rate(CoilCase c) {
        return CoilModels.rate(c.refrigerant().model() == kind ? c : c.withRefrigerant(applyTo(c.refrigerant())));
    }

    /**
     * @param field input field, for messages
     * @param id    a model id
     * @return the model
     */
    public static CoilModel byId(String field, String id) {
        Objects.requireNonNull(id, "id");
        for (CoilModel m : values()) {
            if (m.id().equalsIgnoreCase(id.strip())) {
                return m;
            }
        }
        throw new InputException(field, Msg.UNKNOWN_NAME, id,
                values().stream().map(CoilModel::id).collect(Collectors.joining(", ")));
    }
}
