package tetrapod.model.spec;

import java.util.List;

/**
 * Loads given in the model file, with defaults filled in. Units as in the file: forces kN,
 * moments kN·m, in tower axes; the units of wind, ancillaries and ice are given on their records.
 * Wind, ancillaries and ice act on a generated tower's panels; an explicit frame has only nodal
 * loads (and combinations of dead and nodal loads).
 *
 * @param nodal        forces and moments at nodes
 * @param wind         the wind method and its parameters, or null for no wind
 * @param ancillaries  point and linear items carried by the tower
 * @param ice          radial ice on members and ancillaries, or null for no ice
 * @param combinations the user's factored combinations; empty for the default set of the wind method
 * @param sweepStep    azimuth step of the wind sweep, degrees; 360 is a whole number of steps
 * @param actionFactors the partial factors for actions of the default combinations; null until
 *                     the design basis fills it in ({@link TowerSpec} does), and then taken from
 *                     the wind method (asce7: ASCE 7, otherwise EN 1993-3-1 Annex A class 2)
 */
public record LoadsSpec(List<NodalLoadSpec> nodal, WindSpec wind, List<AncillarySpec> ancillaries, IceSpec ice,
                        List<CombinationSpec> combinations, double sweepStep, ActionFactors actionFactors) {

    /** Default azimuth step of the wind sweep, degrees. */
    public static final double DEFAULT_SWEEP_STEP = 5.0;

    public static final LoadsSpec NONE = new LoadsSpec(List.of());

    public LoadsSpec {
        nodal = nodal == null ? List.of() : List.copyOf(nodal);
        ancillaries = ancillaries == null ? List.of() : List.copyOf(ancillaries);
        combinations = combinations == null ? List.of() : List.copyOf(combinations);
    }

    /** Loads whose action factors follow the design basis (or the wind method when there is none). */
    public LoadsSpec(List<NodalLoadSpec> nodal, WindSpec wind, List<AncillarySpec> ancillaries, IceSpec ice,
                     List<CombinationSpec> combinations, double sweepStep) {
        this(nodal, wind, ancillaries, ice, combinations, sweepStep, null);
    }

    /** Nodal loads only: no wind, ancillaries or ice, the default combinations and sweep step. */
    public LoadsSpec(List<NodalLoadSpec> nodal) {
        this(nodal, null, List.of(), null, List.of(), DEFAULT_SWEEP_STEP);
    }

    /** These loads with the given action factors. */
    public LoadsSpec withWind(WindSpec w) {
        return new LoadsSpec(nodal, w, ancillaries, ice, combinations, sweepStep, actionFactors);
    }

    public LoadsSpec withActionFactors(ActionFactors factors) {
        return new LoadsSpec(nodal, wind, ancillaries, ice, combinations, sweepStep, factors);
    }

    /** The action factors, or when none were set those of the wind method: ASCE 7 for asce7, else EN 1993-3-1 class 2. */
    public ActionFactors actionFactorsOrDefault() {
        if (actionFactors != null) {
            return actionFactors;
        }
        return ActionFactors.defaultFor(wind instanceof WindSpec.Asce7 ? DesignBasis.US : DesignBasis.EN);
    }

    public boolean hasWind() {
        return wind != null;
    }

    public boolean hasIce() {
        return ice != null;
    }

    /**
     * What of these loads an explicit frame can carry: the nodal loads, the combinations that use
     * only dead and nodal loads, and the sweep step. Wind, ancillaries and ice need a generated
     * tower's panels.
     */
    public LoadsSpec forExplicitFrame() {
        List<CombinationSpec> kept = combinations.stream()
                .filter(c -> c.factors().keySet().stream().allMatch(a -> a == LoadAction.DEAD || a == LoadAction.NODAL))
                .toList();
        return new LoadsSpec(nodal, null, List.of(), null, kept, sweepStep, actionFactors);
    }

    /** A load at a node: Fx, Fy, Fz (kN) and Mx, My, Mz (kN·m). */
    public record NodalLoadSpec(int node, double fx, double fy, double fz, double mx, double my, double mz) { }
}
