package tetrapod.view;

import org.joml.Matrix4f;
import org.joml.Vector4f;

/**
 * Projects world points to image pixels with one camera and viewport, exactly as the vertex shaders
 * do; the software renderer, picking, label placement and the tests all go through it.
 * Not thread-safe (holds a scratch vector).
 */
public final class Projector {

    private final Camera camera;
    private final Matrix4f viewProjection;
    private final int width;
    private final int height;
    private final Vector4f clip = new Vector4f();

    public Projector(Camera camera, int width, int height) {
        if (width < 1 || height < 1) {
            throw new IllegalArgumentException("viewport must be at least 1 x 1 px, was " + width + " x " + height);
        }
        this.camera = camera;
        this.viewProjection = camera.viewProjection(width, height, new Matrix4f());
        this.width = width;
        this.height = height;
    }

    public Camera camera() {
        return camera;
    }

    public int width() {
        return width;
    }

    public int height() {
        return height;
    }

    /** Read-only view of projection × view. */
    public org.joml.Matrix4fc viewProjection() {
        return viewProjection;
    }

    /**
     * Writes {x px, y px (down), depth in [-1, 1], clip w} of the world point into {@code out} and
     * returns whether the point is in front of the eye (w > 0).
     */
    public boolean project(double x, double y, double z, double[] out) {
        viewProjection.transform((float) x, (float) y, (float) z, 1f, clip);
        out[3] = clip.w;
        if (!(clip.w > 0)) {
            return false;
        }
        out[0] = (clip.x / clip.w + 1) * 0.5 * width;
        out[1] = (1 - clip.y / clip.w) * 0.5 * height;
        out[2] = clip.z / clip.w;
        return true;
    }

    /** The width in image pixels of {@code referencePixels} (see the package conventions). */
    public double pixels(double referencePixels) {
        return referencePixels * height / 1000.0;
    }
}
