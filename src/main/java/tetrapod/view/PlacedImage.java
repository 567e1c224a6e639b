package tetrapod.view;

import java.awt.image.BufferedImage;
import java.util.Objects;

/** An overlay image (label or legend) at pixel ({@code x}, {@code y}) of the image, its top-left corner. */
record PlacedImage(BufferedImage image, int x, int y) {
    PlacedImage {
        Objects.requireNonNull(image, "image");
    }
}
