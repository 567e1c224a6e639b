package tetrapod.view;

import java.util.Objects;

/** Text drawn on the image (several lines separated by '\n'). */
public record SceneLabel(String text, LabelStyle style, LabelAnchor anchor) {
    public SceneLabel {
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(style, "style");
        Objects.requireNonNull(anchor, "anchor");
    }
}
