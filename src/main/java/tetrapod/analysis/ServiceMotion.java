package tetrapod.analysis;

import java.util.Objects;
import tetrapod.model.Face;

/** The movement envelope of a level or an ancillary beside its limits. */
public sealed interface ServiceMotion permits ServiceMotion.Level, ServiceMotion.Ancillary {

    MotionEnvelope envelope();

    ServiceLimits limits();

    /** What it is, for people: "level at 38.5 m", "dish 1.2 m". */
    String label();

    /** Whether the movement {@code m} stays within its limit; null when no limit is given. */
    default Boolean met(Movement m) {
        return limits().has(m) ? envelope().of(m).value() <= limits().of(m) : null;
    }

    /** Whether every limit given is met (true when none is given). */
    default boolean allMet() {
        for (Movement m : Movement.values()) {
            if (Boolean.FALSE.equals(met(m))) {
                return false;
            }
        }
        return true;
    }

    /**
     * A panel level of the tower.
     *
     * @param level index of the panel level, 0 at the base
     * @param z     its height, m
     */
    record Level(int level, double z, MotionEnvelope envelope, ServiceLimits limits) implements ServiceMotion {
        public Level {
            Objects.requireNonNull(envelope, "envelope");
            Objects.requireNonNull(limits, "limits");
        }

        @Override
        public String label() {
            return "level at " + tetrapod.load.CaseKey.degrees(z) + " m";
        }
    }

    /**
     * An ancillary ({@code loads.ancillaries}): a point item at zFrom = zTo, or a linear item from zFrom to zTo (m).
     *
     * @param face the face it is on ({@link Face#NONE}: the tower's axis)
     */
    record Ancillary(String name, boolean linear, Face face, double zFrom, double zTo, MotionEnvelope envelope,
                     ServiceLimits limits) implements ServiceMotion {
        public Ancillary {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(face, "face");
            Objects.requireNonNull(envelope, "envelope");
            Objects.requireNonNull(limits, "limits");
        }

        @Override
        public String label() {
            return name;
        }
    }
}
