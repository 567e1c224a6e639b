package tetrapod.view;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.util.HashMap;
import java.util.Map;

/**
 * Rasterises label text with Java2D (the platform's fonts, nothing shipped) into images, once per
 * distinct text, style and image height. Plain labels get a halo in the background colour so that
 * they read over lines; boxed labels sit on a light panel. Not thread-safe.
 */
final class LabelPainter {

    private static final Color HALO = new Color(0xF7, 0xF7, 0xF5, 215);
    private static final Color PANEL = new Color(255, 255, 255, 235);
    private static final Color PANEL_EDGE = new Color(0xB8BEC4);

    private final double scale;
    private final Map<String, BufferedImage> cache = new HashMap<>();
    private final Map<Legend, BufferedImage> legends = new HashMap<>();

    /** For an image {@code imageHeight} px high. */
    LabelPainter(int imageHeight) {
        this.scale = imageHeight / 1000.0;
    }

    double scale() {
        return scale;
    }

    BufferedImage text(String text, LabelStyle style) {
        return cache.computeIfAbsent(style.name() + '\u0000' + text, k -> paint(text, style));
    }

    BufferedImage legend(Legend legend) {
        return legends.computeIfAbsent(legend, l -> LegendPainter.paint(l, scale));
    }

    Font font(LabelStyle style) {
        return font(style.size, style.bold, scale);
    }

    static Font font(double referenceSize, boolean bold, double scale) {
        return new Font(Font.SANS_SERIF, bold ? Font.BOLD : Font.PLAIN, (int) Math.max(9, Math.round(referenceSize * scale)));
    }

    private BufferedImage paint(String text, LabelStyle style) {
        Font font = font(style);
        String[] lines = text.split("\n", -1);
        FontMetrics fm = metrics(font);
        int pad = style.boxed ? (int) Math.round(8 * scale) + 2 : 2;
        int lineHeight = fm.getHeight();
        int width = 1;
        for (String line : lines) {
            width = Math.max(width, fm.stringWidth(line) + 2);
        }
        BufferedImage image = new BufferedImage(width + 2 * pad, lineHeight * lines.length + 2 * pad,
                BufferedImage.TYPE_INT_ARGB);
        Graphics2D g = graphics(image);
        try {
            if (style.boxed) {
                int arc = (int) Math.round(8 * scale);
                g.setColor(PANEL);
                g.fillRoundRect(0, 0, image.getWidth() - 1, image.getHeight() - 1, arc, arc);
                g.setColor(PANEL_EDGE);
                g.setStroke(new BasicStroke(1f));
                g.drawRoundRect(0, 0, image.getWidth() - 1, image.getHeight() - 1, arc, arc);
            }
            g.setFont(font);
            for (int k = 0; k < lines.length; k++) {
                int x = pad;
                int y = pad + k * lineHeight + fm.getAscent();
                if (!style.boxed) {
                    g.setColor(HALO);
                    for (int dx = -1; dx <= 1; dx++) {
                        for (int dy = -1; dy <= 1; dy++) {
                            if (dx != 0 || dy != 0) {
                                g.drawString(lines[k], x + dx, y + dy);
                            }
                        }
                    }
                }
                g.setColor(style.colour.awt());
                g.drawString(lines[k], x, y);
            }
        } finally {
            g.dispose();
        }
        return image;
    }

    static FontMetrics metrics(Font font) {
        BufferedImage scratch = new BufferedImage(1, 1, BufferedImage.TYPE_INT_ARGB);
        Graphics2D g = graphics(scratch);  // the same hints as the drawing, so that widths agree
        try {
            return g.getFontMetrics(font);
        } finally {
            g.dispose();
        }
    }

    static Graphics2D graphics(BufferedImage image) {
        Graphics2D g = image.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
        return g;
    }
}
