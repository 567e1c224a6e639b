package tetrapod.view;

import java.awt.Graphics2D;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import java.util.Arrays;
import java.util.List;

/**
 * Draws a scene with Java2D when no OpenGL can be had: the same quads (computed as the vertex
 * shader computes them, through {@link Projector}), painted far to near instead of depth-tested,
 * and the same label images.
 */
public final class SoftwareRenderer {

    private SoftwareRenderer() { }

    /** The scene seen by {@code camera} on a {@code width} × {@code height} image. */
    public static BufferedImage render(Scene scene, Camera camera, int width, int height) {
        Projector projector = new Projector(camera, width, height);
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = LabelPainter.graphics(image);
        try {
            g.setColor(Scene.BACKGROUND.awt());
            g.fillRect(0, 0, width, height);
            paintSorted(g, projector, List.of(scene.ground()));
            paintSorted(g, projector, List.of(scene.decorations(), scene.members()));
            if (scene.axisTriad()) {
                ScreenRect v = AxisTriad.viewport(width, height);
                Graphics2D inset = (Graphics2D) g.create((int) v.x0(), (int) v.y0(), (int) v.width(), (int) v.height());
                try {
                    paintSorted(inset, AxisTriad.projector(camera, v), List.of(AxisTriad.segments()));
                } finally {
                    inset.dispose();
                }
            }
            for (PlacedImage p : OverlayLayout.place(scene, projector, new LabelPainter(height))) {
                g.drawImage(p.image(), p.x(), p.y(), null);
            }
        } finally {
            g.dispose();
        }
        return image;
    }

    /**
     * Draws a small throw-away image the way {@link #render} draws (an antialiased fill, a label in
     * the platform's font) and finds the PNG writer: Java loads and sets up all three on first use,
     * about 0.2 s on a 2-core machine, which a spare core can do while the caller reads and analyses
     * the model (issue 15).
     */
    public static void warmUp() {
        BufferedImage image = new BufferedImage(64, 48, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = LabelPainter.graphics(image);
        try {
            Path2D.Double path = new Path2D.Double();
            path.moveTo(1.5, 1.5);
            path.lineTo(40.2, 3.7);
            path.lineTo(38.1, 30.4);
            path.closePath();
            g.setColor(Scene.BACKGROUND.awt());
            g.fill(path);
            g.drawImage(new LabelPainter(image.getHeight()).text("0.5", LabelStyle.INFO), 0, 0, null);
        } finally {
            g.dispose();
        }
        javax.imageio.ImageIO.getImageWritersByFormatName("png").hasNext();
    }

    /** Paints every instance of {@code batches}, farthest first. */
    private static void paintSorted(Graphics2D g, Projector projector, List<SegmentInstances> batches) {
        int total = 0;
        for (SegmentInstances b : batches) {
            total += b.count();
        }
        double[] corners = new double[total * 8];
        long[] order = new long[total];
        int[] colours = new int[total];
        SegmentQuad quad = new SegmentQuad();
        int n = 0;
        for (SegmentInstances b : batches) {
            for (int k = 0; k < b.count(); k++) {
                if (!quad.compute(projector, b, k)) {
                    continue;
                }
                System.arraycopy(quad.corners, 0, corners, n * 8, 8);
                colours[n] = b.colour(k).packed();
                double depth = 0.5 * (quad.startDepth + quad.endDepth);
                // sort key: depth descending (far first) in the high bits, the index in the low bits
                long key = (long) ((1 - Math.max(-1, Math.min(1, depth))) * 0.5 * ((1L << 31) - 1));
                order[n] = (key << 32) | n;
                n++;
            }
        }
        long[] sorted = Arrays.copyOf(order, n);
        Arrays.sort(sorted);
        Path2D.Double path = new Path2D.Double();
        for (long key : sorted) {
            int i = (int) (key & 0xffffffffL);
            int o = i * 8;
            path.reset();
            path.moveTo(corners[o], corners[o + 1]);
            path.lineTo(corners[o + 2], corners[o + 3]);
            path.lineTo(corners[o + 4], corners[o + 5]);
            path.lineTo(corners[o + 6], corners[o + 7]);
            path.closePath();
            g.setColor(new java.awt.Color(colours[i]));
            g.fill(path);
        }
    }
}
