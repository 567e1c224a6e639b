package tetrapod.view;

import java.nio.FloatBuffer;
import java.util.Arrays;
import tetrapod.model.Vec3;

/**
 * Line segments to draw as screen-facing quads, one instance each, packed as the vertex shader
 * reads them: start xyz, end xyz (m), colour rgb, width at start and at end (reference px), and a
 * cap flag (1: the quad reaches half a width beyond each end, so that joints close). A width of 0
 * at one end makes a triangle: arrow heads and support marks. Immutable once built.
 */
public final class SegmentInstances {

    /** Floats per instance, in the order of the vertex attributes in shaders/segment.vert. */
    public static final int FLOATS = 12;

    private final float[] data;
    private final int count;

    private SegmentInstances(float[] data, int count) {
        this.data = data;
        this.count = count;
    }

    public static Builder builder(int expected) {
        return new Builder(expected);
    }

    public int count() {
        return count;
    }

    public Vec3 start(int k) {
        int o = k * FLOATS;
        return new Vec3(data[o], data[o + 1], data[o + 2]);
    }

    public Vec3 end(int k) {
        int o = k * FLOATS + 3;
        return new Vec3(data[o], data[o + 1], data[o + 2]);
    }

    public Rgb colour(int k) {
        int o = k * FLOATS + 6;
        return new Rgb(data[o], data[o + 1], data[o + 2]);
    }

    public float startWidth(int k) {
        return data[k * FLOATS + 9];
    }

    public float endWidth(int k) {
        return data[k * FLOATS + 10];
    }

    public boolean caps(int k) {
        return data[k * FLOATS + 11] != 0;
    }

    /** The instances of {@code a} followed by those of {@code b}. */
    public static SegmentInstances concat(SegmentInstances a, SegmentInstances b) {
        float[] all = Arrays.copyOf(a.data, (a.count + b.count) * FLOATS);
        System.arraycopy(b.data, 0, all, a.count * FLOATS, b.count * FLOATS);
        return new SegmentInstances(all, a.count + b.count);
    }

    /** Copies every instance into {@code dest} (output) from its position; returns it. */
    public FloatBuffer writeTo(FloatBuffer dest) {
        return dest.put(data, 0, count * FLOATS);
    }

    /** Collects instances; not thread-safe. */
    public static final class Builder {
        private float[] data;
        private int count;

        private Builder(int expected) {
            data = new float[Math.max(1, expected) * FLOATS];
        }

        public Builder add(Vec3 a, Vec3 b, Rgb colour, double startWidth, double endWidth, boolean caps) {
            if ((count + 1) * FLOATS > data.length) {
                data = Arrays.copyOf(data, data.length * 2);
            }
            int o = count * FLOATS;
            data[o] = (float) a.x();
            data[o + 1] = (float) a.y();
            data[o + 2] = (float) a.z();
            data[o + 3] = (float) b.x();
            data[o + 4] = (float) b.y();
            data[o + 5] = (float) b.z();
            data[o + 6] = colour.r();
            data[o + 7] = colour.g();
            data[o + 8] = colour.b();
            data[o + 9] = (float) startWidth;
            data[o + 10] = (float) endWidth;
            data[o + 11] = caps ? 1f : 0f;
            count++;
            return this;
        }

        /** A segment of one width with caps. */
        public Builder line(Vec3 a, Vec3 b, Rgb colour, double width) {
            return add(a, b, colour, width, width, true);
        }

        public int count() {
            return count;
        }

        public SegmentInstances build() {
            return new SegmentInstances(Arrays.copyOf(data, count * FLOATS), count);
        }
    }
}
