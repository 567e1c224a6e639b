package tetrapod.io;

import java.util.Arrays;
import java.util.List;
import java.util.function.Function;
import tetrapod.model.Face;
import tetrapod.model.Idealisation;
import tetrapod.model.Role;
import tetrapod.model.spec.ActionFactorSet;
import tetrapod.model.spec.Asce7Edition;
import tetrapod.model.spec.Bracing;
import tetrapod.model.spec.CheckMethod;
import tetrapod.model.spec.DesignBasis;
import tetrapod.model.spec.Exposure;
import tetrapod.model.spec.Horizontals;
import tetrapod.model.spec.SupportType;
import tetrapod.model.spec.TerrainCategory;

/** The closed lists of names the model file accepts, in the order the messages list them. */
record Choices<E>(String what, List<String> names, List<E> values) {

    static final Choices<Idealisation> IDEALISATION = of("idealisation", Idealisation.values(), Idealisation::jsonName);
    static final Choices<Bracing> BRACING = of("bracing", Bracing.values(), Bracing::jsonName);
    static final Choices<Horizontals> HORIZONTALS = of("horizontals", Horizontals.values(), Horizontals::jsonName);
    static final Choices<SupportType> SUPPORT_TYPE = of("support type", SupportType.values(), SupportType::jsonName);
    static final Choices<CheckMethod> CHECK_METHOD = of("check method", CheckMethod.values(), CheckMethod::jsonName);
    static final Choices<Role> ROLE = of("role", Role.values(), Role::jsonName);
    static final Choices<TerrainCategory> TERRAIN = of("terrain category", TerrainCategory.values(), TerrainCategory::jsonName);
    static final Choices<Exposure> EXPOSURE = of("exposure", Exposure.values(), Exposure::jsonName);
    static final Choices<Asce7Edition> EDITION = of("ASCE 7 edition", Asce7Edition.values(), Asce7Edition::jsonName);
    static final Choices<DesignBasis> BASIS = of("design basis", DesignBasis.values(), DesignBasis::jsonName);
    static final Choices<ActionFactorSet> ACTION_FACTORS = of("action factors", ActionFactorSet.values(),
            ActionFactorSet::jsonName);
    static final Choices<Face> FACE = of("face", new Face[] {Face.X_PLUS, Face.X_MINUS, Face.Y_PLUS, Face.Y_MINUS},
            Face::label);

    Choices {
        names = List.copyOf(names);
        values = List.copyOf(values);
    }

    private static <E> Choices<E> of(String what, E[] values, Function<E, String> name) {
        return new Choices<>(what, Arrays.stream(values).map(name).toList(), List.of(values));
    }

    E required(Fields fields, String key) {
        return fields.requiredChoice(key, what, names, values);
    }

    E optional(Fields fields, String key, E byDefault) {
        return fields.optionalChoice(key, what, names, values, byDefault);
    }
}
