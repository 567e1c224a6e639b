package tetrapod.view;

import java.util.Objects;
import org.joml.Matrix4f;
import org.joml.Vector3f;
import tetrapod.model.Vec3;

/**
 * An orbiting perspective camera looking at {@code target}; immutable, every change returns a new
 * camera. The eye sits at {@code distance} from the target in the direction given by
 * {@code yaw} (radians from +x towards +y) and {@code pitch} (radians above the horizontal).
 * World up is +z.
 *
 * @param fovY       vertical field of view, radians
 * @param depthRange how far in front of and behind the target the scene reaches, m (sets near/far)
 */
public record Camera(Vec3 target, double yaw, double pitch, double distance, double fovY, double depthRange) {

    public static final double MAX_PITCH = Math.toRadians(89);
    public static final double DEFAULT_FOV_Y = Math.toRadians(35);
    /** Looking from between the −y face and the +x face, a little above: legs and both faces show. */
    public static final double DEFAULT_YAW = Math.toRadians(-62);
    public static final double DEFAULT_PITCH = Math.toRadians(16);
    /** The framed scene fills this fraction of the half-viewport in its tighter direction. */
    static final double FRAME_MARGIN = 0.9;

    public Camera {
        Objects.requireNonNull(target, "target");
        if (!(distance > 0) || !Double.isFinite(distance) || !Double.isFinite(yaw) || !Double.isFinite(pitch)
                || !(fovY > 0 && fovY < Math.PI) || !(depthRange > 0) || !Double.isFinite(depthRange)) {
            throw new IllegalArgumentException("bad camera: distance " + distance + ", yaw " + yaw + ", pitch "
                    + pitch + ", fovY " + fovY + ", depth range " + depthRange);
        }
        pitch = Math.max(-MAX_PITCH, Math.min(MAX_PITCH, pitch));
    }

    /** Where the eye is, m. */
    public Vec3 eye() {
        double c = Math.cos(pitch);
        return target.plus(new Vec3(c * Math.cos(yaw), c * Math.sin(yaw), Math.sin(pitch)).times(distance));
    }

    /** Unit vector to the right on screen, in world space (horizontal). */
    public Vec3 right() {
        return new Vec3(-Math.sin(yaw), Math.cos(yaw), 0);
    }

    /** Unit vector up on screen, in world space. */
    public Vec3 up() {
        Vec3 forward = target.minus(eye()).unit();
        return right().cross(forward);
    }

    /** Projection × view for a viewport of {@code width} × {@code height} px, written into {@code dest}. */
    public Matrix4f viewProjection(int width, int height, Matrix4f dest) {
        double near = Math.max(distance * 1e-3, distance - depthRange);
        double far = distance + depthRange;
        Vec3 eye = eye();
        return dest.setPerspective((float) fovY, (float) width / height, (float) near, (float) far)
                .lookAt(new Vector3f((float) eye.x(), (float) eye.y(), (float) eye.z()),
                        new Vector3f((float) target.x(), (float) target.y(), (float) target.z()),
                        new Vector3f(0, 0, 1));
    }

    /** Turned about the target by {@code dYaw} and tilted by {@code dPitch} (radians). */
    public Camera orbit(double dYaw, double dPitch) {
        return new Camera(target, yaw + dYaw, pitch + dPitch, distance, fovY, depthRange);
    }

    /**
     * Moved sideways so that the scene at the target's depth follows a drag of ({@code dxPx},
     * {@code dyPx}) image pixels (y down) in a viewport {@code viewportHeight} px high.
     */
    public Camera pan(double dxPx, double dyPx, int viewportHeight) {
        double worldPerPixel = 2 * distance * Math.tan(fovY / 2) / viewportHeight;
        Vec3 move = right().times(-dxPx * worldPerPixel).plus(up().times(dyPx * worldPerPixel));
        return new Camera(target.plus(move), yaw, pitch, distance, fovY, depthRange);
    }

    /** Closer ({@code factor} < 1) or further away, keeping the target. */
    public Camera zoom(double factor) {
        if (!(factor > 0) || !Double.isFinite(factor)) {
            throw new IllegalArgumentException("zoom factor must be > 0, was " + factor);
        }
        double d = Math.max(distance * factor, depthRange * 1e-3);
        return new Camera(target, yaw, pitch, d, fovY, depthRange);
    }

    /**
     * A camera looking from ({@code yaw}, {@code pitch}) at the centre of {@code bounds}, as close as
     * it can be while every corner of the box (and so everything in it) projects inside the middle
     * {@link #FRAME_MARGIN} of a {@code width} × {@code height} viewport.
     */
    public static Camera framing(Bounds bounds, int width, int height, double yaw, double pitch) {
        double radius = bounds.radius();
        double halfFovX = Math.atan(Math.tan(DEFAULT_FOV_Y / 2) * width / height);
        double halfFov = Math.min(DEFAULT_FOV_Y / 2, halfFovX);
        double far = radius / Math.sin(halfFov) / FRAME_MARGIN;  // the bounding sphere fits: always enough
        double near = radius * 1e-3;
        Camera c = new Camera(bounds.centre(), yaw, pitch, far, DEFAULT_FOV_Y, 2 * radius);
        if (!c.fits(bounds, width, height)) {
            return c;
        }
        for (int k = 0; k < 40; k++) {
            double mid = 0.5 * (near + far);
            if (c.withDistance(mid).fits(bounds, width, height)) {
                far = mid;
            } else {
                near = mid;
            }
        }
        return c.withDistance(far);
    }

    private Camera withDistance(double d) {
        return new Camera(target, yaw, pitch, d, fovY, depthRange);
    }

    private boolean fits(Bounds bounds, int width, int height) {
        Matrix4f m = viewProjection(width, height, new Matrix4f());
        org.joml.Vector4f clip = new org.joml.Vector4f();
        double near = Math.max(distance * 1e-3, distance - depthRange);
        for (Vec3 p : bounds.corners()) {
            m.transform((float) p.x(), (float) p.y(), (float) p.z(), 1f, clip);
            if (clip.w < near) {
                return false;
            }
            if (Math.abs(clip.x / clip.w) > FRAME_MARGIN || Math.abs(clip.y / clip.w) > FRAME_MARGIN) {
                return false;
            }
        }
        return true;
    }
}
