package tetrapod.view;

/** What a key or mouse gesture asks of the viewer. */
public sealed interface ViewerAction {

    /** Turn about the target (radians). */
    record Orbit(double dYaw, double dPitch) implements ViewerAction { }

    /** Move sideways by a drag of (dx, dy) image px. */
    record Pan(double dxPx, double dyPx) implements ViewerAction { }

    /** Distance × factor (below 1: closer). */
    record Zoom(double factor) implements ViewerAction { }

    /** Step through the cases (wind azimuths, envelope) by {@code step}, wrapping. */
    record StepCase(int step) implements ViewerAction { }

    /** The next colouring the data offers. */
    record NextColouring() implements ViewerAction { }

    /** A given colouring (ignored when the data does not offer it). */
    record UseColouring(Colouring colouring) implements ViewerAction { }

    record ToggleDeformed() implements ViewerAction { }

    record ToggleGrid() implements ViewerAction { }

    record ToggleHelp() implements ViewerAction { }

    /** Frame the whole tower again from the default direction. */
    record ResetCamera() implements ViewerAction { }

    /** Pick the member at image pixel (x, y); a click on nothing clears the pick. */
    record Pick(double x, double y) implements ViewerAction { }

    /** Save the current view as a PNG. */
    record Snapshot() implements ViewerAction { }

    record Close() implements ViewerAction { }
}
