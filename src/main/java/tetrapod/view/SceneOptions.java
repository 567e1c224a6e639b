package tetrapod.view;

import java.util.Objects;

/**
 * What to show of a {@link ViewData}: which case, which colouring, and which decorations.
 *
 * @param deformationScale factor on displacements for the deformed shape; 0 chooses one
 *                         (the largest displacement drawn as about 5 % of the tower's size)
 */
public record SceneOptions(int caseIndex, Colouring colouring, boolean deformed, double deformationScale,
                           boolean grid, boolean axes, boolean reactions, boolean wind, boolean legend,
                           boolean caption) {

    public SceneOptions {
        Objects.requireNonNull(colouring, "colouring");
        if (caseIndex < 0) {
            throw new IllegalArgumentException("case index must be >= 0, was " + caseIndex);
        }
        if (!(deformationScale >= 0) || !Double.isFinite(deformationScale)) {
            throw new IllegalArgumentException("deformation scale must be >= 0, was " + deformationScale);
        }
    }

    /** The first case in the data's colouring, undeformed, with every decoration. */
    public static SceneOptions defaults(ViewData data) {
        return new SceneOptions(0, data.colouring(), false, 0, true, true, true, true, true, true);
    }

    /** Members and supports only: no grid, axes, arrows, legend or caption. */
    public SceneOptions membersOnly() {
        return new SceneOptions(caseIndex, colouring, deformed, deformationScale, false, false, false, false, false,
                false);
    }

    public SceneOptions withCase(int index) {
        return new SceneOptions(index, colouring, deformed, deformationScale, grid, axes, reactions, wind, legend,
                caption);
    }

    public SceneOptions withColouring(Colouring c) {
        return new SceneOptions(caseIndex, c, deformed, deformationScale, grid, axes, reactions, wind, legend, caption);
    }

    public SceneOptions withDeformed(boolean on) {
        return new SceneOptions(caseIndex, colouring, on, deformationScale, grid, axes, reactions, wind, legend,
                caption);
    }

    public SceneOptions withWind(boolean on) {
        return new SceneOptions(caseIndex, colouring, deformed, deformationScale, grid, axes, reactions, on, legend,
                caption);
    }

    public SceneOptions withAxes(boolean on) {
        return new SceneOptions(caseIndex, colouring, deformed, deformationScale, grid, on, reactions, wind, legend,
                caption);
    }

    public SceneOptions withGrid(boolean on) {
        return new SceneOptions(caseIndex, colouring, deformed, deformationScale, on, axes, reactions, wind, legend,
                caption);
    }
}
