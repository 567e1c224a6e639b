package tetrapod.view;

/** An sRGB colour, each channel in [0, 1] (gamma-encoded, as stored in an image). */
public record Rgb(float r, float g, float b) {

    public Rgb {
        if (!(r >= 0 && r <= 1 && g >= 0 && g <= 1 && b >= 0 && b <= 1)) {
            throw new IllegalArgumentException("colour channels must be in [0, 1]: " + r + ", " + g + ", " + b);
        }
    }

    /** From {@code 0xRRGGBB}. */
    public static Rgb hex(int rgb) {
        return new Rgb(((rgb >> 16) & 0xff) / 255f, ((rgb >> 8) & 0xff) / 255f, (rgb & 0xff) / 255f);
    }

    /** Channels clamped into [0, 1]. */
    static Rgb clamped(double r, double g, double b) {
        return new Rgb(clamp(r), clamp(g), clamp(b));
    }

    private static float clamp(double v) {
        return (float) Math.max(0, Math.min(1, v));
    }

    /** {@code 0xRRGGBB}, each channel rounded to 8 bits. */
    public int packed() {
        return (byte8(r) << 16) | (byte8(g) << 8) | byte8(b);
    }

    public java.awt.Color awt() {
        return new java.awt.Color(packed());
    }

    /** Largest difference of one 8-bit channel between this colour and {@code 0xRRGGBB}. */
    public int channelDistance(int rgb) {
        int p = packed();
        int d = 0;
        for (int shift = 0; shift <= 16; shift += 8) {
            d = Math.max(d, Math.abs(((p >> shift) & 0xff) - ((rgb >> shift) & 0xff)));
        }
        return d;
    }

    private static int byte8(float v) {
        return Math.round(v * 255f);
    }

    @Override
    public String toString() {
        return String.format("#%06X", packed());
    }
}
