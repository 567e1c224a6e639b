package tetrapod.view;

import java.util.List;
import java.util.Objects;

/**
 * What a colour scale means, for people: a title, an optional continuous bar (colours from bottom
 * to top) with numbered ticks, and swatches for categories or special values.
 */
public record Legend(String title, List<Rgb> bar, List<Tick> ticks, List<Swatch> swatches) {

    /** A label at {@code position} along the bar, 0 = bottom, 1 = top. */
    public record Tick(double position, String label) {
        public Tick {
            Objects.requireNonNull(label, "label");
        }
    }

    /** A colour and what it stands for. */
    public record Swatch(Rgb colour, String label) {
        public Swatch {
            Objects.requireNonNull(colour, "colour");
            Objects.requireNonNull(label, "label");
        }
    }

    public Legend {
        Objects.requireNonNull(title, "title");
        bar = List.copyOf(bar);
        ticks = List.copyOf(ticks);
        swatches = List.copyOf(swatches);
    }

    /** How many bar colours a scale's legend samples. */
    static final int BAR_SAMPLES = 64;
}
