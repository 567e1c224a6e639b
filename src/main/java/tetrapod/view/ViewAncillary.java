package tetrapod.view;

import java.util.Objects;
import tetrapod.model.Face;

/**
 * An item the tower carries, drawn as a simple shape at its heights: a point item (platform,
 * antenna, lamp) as a ring round the tower at {@code zFrom} = {@code zTo}; a linear item
 * (ladder, stair, cable tray) as a bar up the face it runs on.
 *
 * @param zFrom bottom height, m
 * @param zTo   top height, m (equal to zFrom for a point item)
 * @param face  the face a linear item runs on ({@link Face#NONE}: drawn on the −y face)
 */
public record ViewAncillary(String name, double zFrom, double zTo, Face face) {
    public ViewAncillary {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(face, "face");
        if (!(zTo >= zFrom)) {
            throw new IllegalArgumentException("ancillary '" + name + "': top " + zTo + " below bottom " + zFrom);
        }
    }

    public boolean isPoint() {
        return zTo == zFrom;
    }
}
