package tetrapod.load;

import java.util.Locale;
import java.util.Objects;
import tetrapod.common.Units;
import tetrapod.model.spec.ServiceabilitySpec;
import tetrapod.model.spec.ServiceabilitySpec.ServiceWindSpec;
import tetrapod.model.spec.WindSpec;

/**
 * The wind the tower's movement is computed under, formed by the same method as the strength wind
 * with a lower speed or pressure, so that the pressure profile, the force coefficients (and the flow
 * regime of circular members, which depends on the speed) are worked out again at the service level.
 *
 * <ul>
 * <li>en1991: v_b,0 × c_prob, c_prob from the return period (EN 1991-1-4 4.2 Note 2,
 *     {@link En1991ProbabilityFactor}) or as given; default 50 years, c_prob = 1: the characteristic
 *     wind of EN 1990 (6.14b).</li>
 * <li>asce7: the service speed of ASCE 7's serviceability maps for the chosen MRI (the commentary to
 *     Appendix C), or a factor on the strength-level wind force (V × √factor); default 0.6, the
 *     factor ASCE 7 §2.4.1 puts on the strength-level wind for allowable stress design (Tetrapod's
 *     default, no published serviceability value).</li>
 * <li>uniform: a factor on the pressure; default 1.0 (the pressure as given).</li>
 * </ul>
 *
 * @param profile           the service wind's profile
 * @param rule              how it was formed, for people
 * @param returnPeriod      years (NaN unless given)
 * @param probabilityFactor c_prob (NaN except for en1991)
 * @param speed             v_b,0 × c_prob (en1991) or the service V (asce7), m/s; NaN for uniform
 * @param pressureRatio     service pressure over the strength wind's pressure at every height
 *                          (c_prob², (V_s/V)², the factor)
 */
public record ServiceWind(WindProfile profile, String rule, double returnPeriod, double probabilityFactor, double speed,
                          double pressureRatio) {

    /** Return period of the characteristic wind of EN 1991-1-4 4.2 (1), years. */
    public static final double CHARACTERISTIC_RETURN_PERIOD = 50;
    /** Factor on the strength-level ASCE 7 wind without a service speed: ASCE 7 §2.4.1's 0.6. */
    public static final double ASCE7_DEFAULT_FACTOR = 0.6;

    public ServiceWind {
        Objects.requireNonNull(profile, "profile");
        Objects.requireNonNull(rule, "rule");
    }

    /**
     * The service wind of {@code wind} as {@code given} (null for the method's default).
     *
     * @throws IllegalArgumentException when {@code given} does not go with the method (the reader refuses that first)
     */
    public static ServiceWind of(WindSpec wind, ServiceWindSpec given) {
        WindProfile strength = WindProfiles.of(wind);
        if (strength instanceof En1991Wind en) {
            double t = Double.NaN;
            double c;
            String how;
            if (given == null || given instanceof ServiceabilitySpec.ReturnPeriod) {
                t = given == null ? CHARACTERISTIC_RETURN_PERIOD : given.value();
                c = En1991ProbabilityFactor.ofReturnPeriod(t);
                how = String.format(Locale.ROOT, "%s-year return period%s; c_prob by EN 1991-1-4 4.2 Note 2 with K = 0.2, "
                        + "n = 0.5", PlainNumbers.of(t), given == null ? ", the characteristic wind" : "");
            } else if (given instanceof ServiceabilitySpec.ProbabilityFactor) {
                c = given.value();
                how = "c_prob as given";
            } else {
                throw refused(wind, given);
            }
            double v = en.basicSpeed() * c;
            return new ServiceWind(en.withBasicSpeed(v), String.format(Locale.ROOT, "EN 1991-1-4 wind at v_b,0 × c_prob = "
                    + "%.2f × %.4f = %.2f m/s (%s)", en.basicSpeed(), c, v, how), t, c, v, c * c);
        }
        if (strength instanceof Asce7Wind a) {
            if (given instanceof ServiceabilitySpec.Speed) {
                double v = given.value();
                double ratio = (v / a.speed()) * (v / a.speed());
                return new ServiceWind(a.withSpeed(v), String.format(Locale.ROOT, "ASCE 7 velocity pressure at the service "
                        + "speed V = %.2f m/s as given (strength-level V = %.2f m/s)", v, a.speed()), Double.NaN,
                        Double.NaN, v, ratio);
            }
            if (given == null || given instanceof ServiceabilitySpec.WindFactor) {
                double f = given == null ? ASCE7_DEFAULT_FACTOR : given.value();
                double v = a.speed() * Math.sqrt(f);
                return new ServiceWind(a.withSpeed(v), String.format(Locale.ROOT, "%.2f × the strength-level ASCE 7 wind "
                        + "(V = %.2f m/s × √%.2f = %.2f m/s)%s", f, a.speed(), f, v, given == null
                        ? ", Tetrapod's default: the ASD factor of ASCE 7 §2.4.1; give the service speed of the chosen "
                        + "MRI as serviceability.wind.speed" : " as given"), Double.NaN, Double.NaN, v, f);
            }
            throw refused(wind, given);
        }
        UniformWind u = (UniformWind) strength;
        if (given != null && !(given instanceof ServiceabilitySpec.WindFactor)) {
            throw refused(wind, given);
        }
        double f = given == null ? 1.0 : given.value();
        return new ServiceWind(u.withPressure(u.pressure() * f), String.format(Locale.ROOT, "%.2f × the uniform pressure "
                + "%.3f kPa%s", f, u.pressure() / Units.KPA, given == null ? " (the pressure as given)" : ""), Double.NaN,
                Double.NaN, Double.NaN, f);
    }

    private static IllegalArgumentException refused(WindSpec wind, ServiceWindSpec given) {
        return new IllegalArgumentException("serviceability.wind." + given.key() + " does not go with the "
                + wind.method() + " wind");
    }
}
