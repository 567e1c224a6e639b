package tetrapod.generate;

import tetrapod.model.Face;
import tetrapod.model.Vec3;

/**
 * One face of one panel: a planar trapezoid (a rectangle in a prismatic segment). "Start" is the
 * corner on leg k, "end" the corner on leg k+1 (mod 4), so that every face is seen in the same
 * counter-clockwise sense from above.
 */
record PanelFace(Face face, Vec3 bottomStart, Vec3 bottomEnd, Vec3 topStart, Vec3 topEnd) {

    double zBottom() {
        return bottomStart.z();
    }

    double zTop() {
        return topStart.z();
    }
}
