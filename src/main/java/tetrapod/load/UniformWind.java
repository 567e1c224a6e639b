package tetrapod.load;

/**
 * A constant pressure on the projected member area of the windward face at every height, for
 * reproducing historical or hand calculations. No profile, no gust or direction factor; the panel
 * force is {@code pressure × forceCoefficient × A} in every direction.
 *
 * @param pressure         Pa
 * @param forceCoefficient dimensionless factor on the projected member area of the windward face
 */
public record UniformWind(double pressure, double forceCoefficient) implements WindProfile {

    public UniformWind {
        if (!(pressure > 0) || !(forceCoefficient > 0)) {
            throw new IllegalArgumentException("pressure and force coefficient must be > 0");
        }
    }

    @Override
    public String method() {
        return "uniform";
    }

    @Override
    public double pressure(double z) {
        return pressure;
    }

    @Override
    public double directionalFactor(double azimuthDeg) {
        return 1.0;
    }

    @Override
    public double responseFactor() {
        return 1.0;
    }

    @Override
    public LatticeCoefficients coefficients() {
        return new UniformCoefficients(forceCoefficient);
    }

    @Override
    public double flowVelocity(double z) {
        return 0;
    }

    /** This wind with another pressure (the pressure that comes with ice), Pa. */
    public UniformWind withPressure(double p) {
        return new UniformWind(p, forceCoefficient);
    }
}
