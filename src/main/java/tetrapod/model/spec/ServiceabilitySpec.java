package tetrapod.model.spec;

import java.util.List;
import java.util.Objects;

/**
 * {@code serviceability}: the wind the tower's movement is computed under, and the movement each
 * level and each ancillary may have. File units: years, m/s, mm, m, degrees. Applies to a
 * generated tower only.
 *
 * @param wind        the service wind; null for the default of the wind method (see
 *                    {@code load.ServiceWind})
 * @param levels      limits on ranges of panel levels (a level inside several ranges takes the
 *                    strictest of each limit)
 * @param ancillaries limits on ancillaries, by name
 */
public record ServiceabilitySpec(ServiceWindSpec wind, List<LevelLimitSpec> levels,
                                 List<AncillaryLimitSpec> ancillaries) {

    /** No serviceability key: the default service wind, no limits. */
    public static final ServiceabilitySpec NONE = new ServiceabilitySpec(null, List.of(), List.of());

    public ServiceabilitySpec {
        levels = levels == null ? List.of() : List.copyOf(levels);
        ancillaries = ancillaries == null ? List.of() : List.copyOf(ancillaries);
    }

    /** Whether nothing was given (the file has no serviceability key, or an empty one). */
    public boolean isEmpty() {
        return wind == null && levels.isEmpty() && ancillaries.isEmpty();
    }

    /** How the service wind is given; one record per way. */
    public sealed interface ServiceWindSpec permits ReturnPeriod, ProbabilityFactor, Speed, WindFactor {

        /** Its key in the file. */
        String key();

        /** Its value in file units. */
        double value();
    }

    /** EN 1991-1-4: the return period, years; c_prob from 4.2 Note 2 with p = 1/T. */
    public record ReturnPeriod(double years) implements ServiceWindSpec {
        @Override
        public String key() {
            return "returnPeriod";
        }

        @Override
        public double value() {
            return years;
        }
    }

    /** EN 1991-1-4: c_prob given directly (a National Annex value, say), the factor on v_b. */
    public record ProbabilityFactor(double factor) implements ServiceWindSpec {
        @Override
        public String key() {
            return "probabilityFactor";
        }

        @Override
        public double value() {
            return factor;
        }
    }

    /** ASCE 7: the service wind speed (of the serviceability maps for the chosen MRI), m/s. */
    public record Speed(double speed) implements ServiceWindSpec {
        @Override
        public String key() {
            return "speed";
        }

        @Override
        public double value() {
            return speed;
        }
    }

    /** ASCE 7 or uniform: a factor on the strength-level wind force (on the pressure). */
    public record WindFactor(double factor) implements ServiceWindSpec {
        @Override
        public String key() {
            return "windFactor";
        }

        @Override
        public double value() {
            return factor;
        }
    }

    /**
     * The movement allowed, file units; NaN where no limit is given.
     *
     * @param swayMm          horizontal displacement, mm
     * @param swayHeightRatio the sway allowed is the height over this number (e.g. 200 for z/200)
     * @param tiltDeg         rotation about a horizontal axis, degrees
     * @param twistDeg        rotation about the vertical, degrees
     */
    public record LimitSpec(double swayMm, double swayHeightRatio, double tiltDeg, double twistDeg) {

        public static final LimitSpec NONE = new LimitSpec(Double.NaN, Double.NaN, Double.NaN, Double.NaN);

        /** Whether no limit is given. */
        public boolean isEmpty() {
            return Double.isNaN(swayMm) && Double.isNaN(swayHeightRatio) && Double.isNaN(tiltDeg)
                    && Double.isNaN(twistDeg);
        }
    }

    /**
     * Limits on the panel levels from height {@code from} to {@code to} (m, both included; NaN:
     * from the base, to the top).
     */
    public record LevelLimitSpec(double from, double to, LimitSpec limits) {
        public LevelLimitSpec {
            Objects.requireNonNull(limits, "limits");
        }
    }

    /** Limits on the ancillary called {@code name} ({@code loads.ancillaries[].name}). */
    public record AncillaryLimitSpec(String name, LimitSpec limits) {
        public AncillaryLimitSpec {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(limits, "limits");
        }
    }
}
