package tetrapod.view;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;

/** Draws a {@link Legend} on a light panel: title, colour bar with numbered ticks, swatches. */
final class LegendPainter {

    private static final double BAR_HEIGHT = 230;
    private static final double BAR_WIDTH = 20;
    private static final double SWATCH = 15;
    private static final double PAD = 12;

    private LegendPainter() { }

    static BufferedImage paint(Legend legend, double scale) {
        Font title = LabelPainter.font(16, true, scale);
        Font text = LabelPainter.font(14, false, scale);
        FontMetrics tm = LabelPainter.metrics(title);
        FontMetrics fm = LabelPainter.metrics(text);
        int pad = px(PAD, scale);
        int barW = px(BAR_WIDTH, scale);
        int barH = legend.bar().isEmpty() ? 0 : px(BAR_HEIGHT, scale);
        int sw = px(SWATCH, scale);
        int gap = px(6, scale);
        int rowH = Math.max(sw, fm.getHeight()) + gap;

        int width = tm.stringWidth(legend.title());
        for (Legend.Tick t : legend.ticks()) {
            width = Math.max(width, barW + gap + px(6, scale) + fm.stringWidth(t.label()));
        }
        for (Legend.Swatch s : legend.swatches()) {
            width = Math.max(width, sw + gap + fm.stringWidth(s.label()));
        }
        int barTop = pad + tm.getHeight() + gap + fm.getAscent() / 2;
        int swatchTop = barTop + barH + (barH > 0 ? fm.getAscent() / 2 + 2 * gap : 0);
        int height = swatchTop + legend.swatches().size() * rowH + pad;
        BufferedImage image = new BufferedImage(width + 2 * pad, height, BufferedImage.TYPE_INT_ARGB);
        Graphics2D g = LabelPainter.graphics(image);
        try {
            int arc = px(10, scale);
            g.setColor(new Color(255, 255, 255, 235));
            g.fillRoundRect(0, 0, image.getWidth() - 1, image.getHeight() - 1, arc, arc);
            g.setColor(new Color(0xB8BEC4));
            g.setStroke(new BasicStroke(1f));
            g.drawRoundRect(0, 0, image.getWidth() - 1, image.getHeight() - 1, arc, arc);
            g.setColor(new Color(0x22262B));
            g.setFont(title);
            g.drawString(legend.title(), pad, pad + tm.getAscent());
            g.setFont(text);
            if (barH > 0) {
                int n = legend.bar().size();
                for (int k = 0; k < barH; k++) {
                    double t = 1 - (k + 0.5) / barH;  // top of the bar is the top of the scale
                    g.setColor(legend.bar().get((int) Math.min(n - 1, Math.floor(t * n))).awt());
                    g.fillRect(pad, barTop + k, barW, 1);
                }
                g.setColor(new Color(0x50565C));
                g.drawRect(pad, barTop, barW, barH);
                for (Legend.Tick t : legend.ticks()) {
                    int y = barTop + (int) Math.round((1 - t.position()) * barH);
                    g.drawLine(pad + barW, y, pad + barW + px(6, scale), y);
                    g.drawString(t.label(), pad + barW + px(6, scale) + gap, y + fm.getAscent() / 2 - 1);
                }
            }
            for (int k = 0; k < legend.swatches().size(); k++) {
                Legend.Swatch s = legend.swatches().get(k);
                int y = swatchTop + k * rowH;
                g.setColor(s.colour().awt());
                g.fillRect(pad, y, sw, sw);
                g.setColor(new Color(0x50565C));
                g.drawRect(pad, y, sw, sw);
                g.drawString(s.label(), pad + sw + gap, y + sw / 2 + fm.getAscent() / 2 - 1);
            }
        } finally {
            g.dispose();
        }
        return image;
    }

    private static int px(double reference, double scale) {
        return (int) Math.max(1, Math.round(reference * scale));
    }
}
