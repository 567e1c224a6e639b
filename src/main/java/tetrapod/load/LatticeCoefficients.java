package tetrapod.load;

/** The force coefficients of a four-leg lattice panel by a published method. Closed family. */
public sealed interface LatticeCoefficients
        permits En1993LatticeCoefficients, Asce7TrussedTowerCoefficients, UniformCoefficients {

    /**
     * The coefficient for wind normal to a face with these areas.
     *
     * @param face         areas of the windward face (not modified)
     * @param flowVelocity wind velocity at the panel for the Reynolds number of circular members, m/s
     *                     (used by EN 1993-3-1 only)
     */
    FaceCoefficient of(FaceAreas face, double flowVelocity);
}
