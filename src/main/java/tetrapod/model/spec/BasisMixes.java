package tetrapod.model.spec;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The family of each family-bound value of a model (see {@link DesignBasis}), the basis a model
 * without the {@code basis} key takes, and the values that do not follow the basis.
 */
public final class BasisMixes {

    private BasisMixes() { }

    /** Every family-bound value of the model, in file order, with its family. */
    public static List<BasisMix> bound(LoadsSpec loads, ChecksSpec checks) {
        List<BasisMix> out = new ArrayList<>();
        if (loads.wind() instanceof WindSpec.En1991) {
            out.add(new BasisMix("loads.wind.method", DesignBasis.EN, "EN 1991-1-4 wind"));
        } else if (loads.wind() instanceof WindSpec.Asce7) {
            out.add(new BasisMix("loads.wind.method", DesignBasis.US, "ASCE 7 wind"));
        }
        if (loads.ice() != null && loads.ice().thickness() instanceof IceSpec.Asce7Map) {
            out.add(new BasisMix("loads.ice.nominalThickness_mm", DesignBasis.US, "ASCE 7 chapter 10 mapped ice"));
        }
        if (loads.actionFactors() != null) {
            ActionFactorSet set = loads.actionFactors().set();
            out.add(new BasisMix("loads.actionFactors", set.family(), "action factors " + set.jsonName()));
        }
        if (checks != null) {
            out.add(checks.method() == CheckMethod.ASCE10
                    ? new BasisMix("checks.method", DesignBasis.US, "ASCE 10 member and bolt checks")
                    : new BasisMix("checks.method", DesignBasis.EN, "EN 1993 member and bolt checks"));
            checks.foundationSpec().ifPresent(f -> {
                if (f.uplift() instanceof FoundationSpec.PartialFactor) {
                    out.add(new BasisMix("checks.foundation.uplift.gammaStabilising", DesignBasis.EN,
                            "EN 1997-1 UPL uplift"));
                }
                if (f.anchorRods() instanceof FoundationSpec.RodsByGrade) {
                    out.add(new BasisMix("checks.foundation.anchorRods.grade", DesignBasis.EN,
                            "EN 1993-1-8 anchor rods by grade"));
                }
            });
        }
        return List.copyOf(out);
    }

    /**
     * The basis of a model that does not name one: the family of its wind method, else of its
     * check method, else of its action factors; EN when none of them is given.
     *
     * @param windMethod   the wind method named in the file, or null
     * @param checkMethod  the check method named in the file, or null
     * @param factorSet    the action factors named in the file, or null
     */
    public static DesignBasis derive(String windMethod, CheckMethod checkMethod, ActionFactorSet factorSet) {
        return windFamily(windMethod)
                .or(() -> Optional.ofNullable(checkMethod).map(m -> m == CheckMethod.ASCE10 ? DesignBasis.US : DesignBasis.EN))
                .or(() -> Optional.ofNullable(factorSet).map(ActionFactorSet::family))
                .orElse(DesignBasis.EN);
    }

    private static Optional<DesignBasis> windFamily(String windMethod) {
        if ("en1991".equals(windMethod)) {
            return Optional.of(DesignBasis.EN);
        }
        return "asce7".equals(windMethod) ? Optional.of(DesignBasis.US) : Optional.empty();
    }

    /** What a key takes in a model of {@code basis}, for messages. */
    public static String allowed(String key, DesignBasis basis) {
        boolean en = basis == DesignBasis.EN;
        return switch (key) {
            case "loads.wind.method" -> en ? "en1991 or uniform" : "asce7 or uniform";
            case "loads.ice.nominalThickness_mm" -> en ? "thickness_mm (the design thickness)" : "nominalThickness_mm";
            case "loads.actionFactors" -> en ? "en1993-3-1 or en1990" : "asce7";
            case "checks.method" -> en ? "en1993" : "asce10";
            case "checks.foundation.uplift.gammaStabilising" -> en ? "gammaStabilising or factorOfSafety" : "factorOfSafety";
            case "checks.foundation.anchorRods.grade" -> en ? "grade, or allowableTension and allowableShear"
                    : "allowableTension and allowableShear";
            default -> throw new IllegalArgumentException("not a family-bound key: " + key);
        };
    }

    /** The values of the model that belong to the other family than its basis. */
    public static List<BasisMix> of(TowerSpec spec) {
        return bound(spec.loads(), spec.checks()).stream().filter(m -> m.family() != spec.basis()).toList();
    }
}
