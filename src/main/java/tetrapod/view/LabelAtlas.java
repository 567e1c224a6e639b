package tetrapod.view;

import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;

/**
 * Packs overlay images (labels, legend) side by side in rows into one image, for one texture.
 * Knows where each image went, as texture coordinates.
 */
final class LabelAtlas {

    /** Texture coordinates of one packed image: u0, v0 (top left), u1, v1. */
    record Uv(float u0, float v0, float u1, float v1) { }

    private static final int GAP = 1;

    final BufferedImage image;
    private final Map<BufferedImage, Uv> places = new IdentityHashMap<>();

    /** Packs every distinct image of {@code placed}, {@code maxWidth} px wide at most. */
    LabelAtlas(List<PlacedImage> placed, int maxWidth) {
        Map<BufferedImage, int[]> at = new IdentityHashMap<>();
        int width = 1;
        for (PlacedImage p : placed) {
            width = Math.max(width, p.image().getWidth());
        }
        width = Math.max(width, Math.min(maxWidth, 1024));
        int x = 0;
        int y = 0;
        int row = 0;
        for (PlacedImage p : placed) {
            BufferedImage im = p.image();
            if (at.containsKey(im)) {
                continue;
            }
            if (x + im.getWidth() > width) {
                x = 0;
                y += row + GAP;
                row = 0;
            }
            at.put(im, new int[] {x, y});
            x += im.getWidth() + GAP;
            row = Math.max(row, im.getHeight());
        }
        int height = Math.max(1, y + row);
        image = new BufferedImage(width, height, BufferedImage.TYPE_INT_ARGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setComposite(java.awt.AlphaComposite.Src);
            for (Map.Entry<BufferedImage, int[]> e : at.entrySet()) {
                BufferedImage im = e.getKey();
                int[] xy = e.getValue();
                g.drawImage(im, xy[0], xy[1], null);
                places.put(im, new Uv((float) xy[0] / width, (float) xy[1] / height,
                        (float) (xy[0] + im.getWidth()) / width, (float) (xy[1] + im.getHeight()) / height));
            }
        } finally {
            g.dispose();
        }
    }

    Uv uv(BufferedImage im) {
        Uv uv = places.get(im);
        if (uv == null) {
            throw new IllegalArgumentException("image not in the atlas");
        }
        return uv;
    }

    /** Whether every image of {@code placed} is in this atlas. */
    boolean holds(List<PlacedImage> placed) {
        for (PlacedImage p : placed) {
            if (!places.containsKey(p.image())) {
                return false;
            }
        }
        return true;
    }
}
