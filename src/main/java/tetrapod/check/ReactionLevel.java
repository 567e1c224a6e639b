package tetrapod.check;

/**
 * Which reactions a footing rule takes: factored ones (a partial-factor rule: EN 1997-1 UPL,
 * EN 1993-1-8 anchor rods) or unfactored service ones (an allowable-stress rule: a factor of
 * safety on uplift or sliding, an allowable bearing pressure, allowable rod stresses).
 */
public enum ReactionLevel {
    FACTORED,
    SERVICE;

    public String jsonName() {
        return this == FACTORED ? "factored" : "service";
    }
}
