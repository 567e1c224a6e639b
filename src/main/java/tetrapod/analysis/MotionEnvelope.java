package tetrapod.analysis;

import java.util.Objects;

/** The largest sway, tilt and twist of a level or an ancillary over every azimuth of the sweep. */
public record MotionEnvelope(MotionPeak sway, MotionPeak tilt, MotionPeak twist) {

    public MotionEnvelope {
        Objects.requireNonNull(sway, "sway");
        Objects.requireNonNull(tilt, "tilt");
        Objects.requireNonNull(twist, "twist");
    }

    public MotionPeak of(Movement m) {
        return switch (m) {
            case SWAY -> sway;
            case TILT -> tilt;
            case TWIST -> twist;
        };
    }
}
