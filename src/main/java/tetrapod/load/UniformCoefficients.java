package tetrapod.load;

/**
 * The uniform-pressure method's coefficient: one user-given factor on the windward face's
 * projected member area, the same from every direction.
 *
 * @param forceCoefficient dimensionless
 */
public record UniformCoefficients(double forceCoefficient) implements LatticeCoefficients {

    @Override
    public FaceCoefficient of(FaceAreas face, double flowVelocity) {
        return new FaceCoefficient(forceCoefficient, 0);
    }
}
