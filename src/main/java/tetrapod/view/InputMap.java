package tetrapod.view;

import static org.lwjgl.glfw.GLFW.*;

import java.util.Optional;

/**
 * Keys and mouse gestures to viewer actions, as plain Java (GLFW's key and button numbers are
 * compile-time constants; no native code runs here). One instance per window: it remembers the
 * drag in progress.
 *
 * <p>Mouse: left drag orbits, right or middle drag (or shift + left drag) pans, the wheel zooms,
 * a left click without dragging picks. Keys: see {@link #HELP}.
 */
public final class InputMap {

    public static final String HELP =
            "left drag: orbit · right drag or shift + drag: pan · wheel: zoom · click: pick a member\n"
            + "arrows: orbit · shift + arrows: pan · + / −: zoom · R: reset view\n"
            + "[ ]: previous / next case (wind azimuth) · C or 1–4: colouring (role, axial, utilisation, azimuth)\n"
            + "D: deformed shape · G: grid · P: save PNG · H: this help · Esc: close";

    /** Radians per key press of orbit. */
    public static final double ORBIT_STEP = Math.toRadians(5);
    /** Radians per pixel of orbit drag. */
    public static final double ORBIT_PER_PIXEL = 0.008;
    /** Pixels per key press of pan. */
    public static final double PAN_STEP = 40;
    /** Distance factor per key press or wheel notch towards the target. */
    public static final double ZOOM_STEP = 0.85;
    /** A press and release closer than this (px) is a click, not a drag. */
    public static final double CLICK_SLOP = 3;

    private int dragButton = -1;
    private boolean dragPans;
    private double lastX;
    private double lastY;
    private double pressX;
    private double pressY;
    private boolean moved;

    /** The action of a key press (or repeat) of GLFW key {@code key} with modifier bits {@code mods}. */
    public Optional<ViewerAction> key(int key, int mods) {
        boolean shift = (mods & GLFW_MOD_SHIFT) != 0;
        ViewerAction a = switch (key) {
            case GLFW_KEY_LEFT -> shift ? new ViewerAction.Pan(PAN_STEP, 0) : new ViewerAction.Orbit(-ORBIT_STEP, 0);
            case GLFW_KEY_RIGHT -> shift ? new ViewerAction.Pan(-PAN_STEP, 0) : new ViewerAction.Orbit(ORBIT_STEP, 0);
            case GLFW_KEY_UP -> shift ? new ViewerAction.Pan(0, PAN_STEP) : new ViewerAction.Orbit(0, ORBIT_STEP);
            case GLFW_KEY_DOWN -> shift ? new ViewerAction.Pan(0, -PAN_STEP) : new ViewerAction.Orbit(0, -ORBIT_STEP);
            case GLFW_KEY_EQUAL, GLFW_KEY_KP_ADD, GLFW_KEY_PAGE_UP -> new ViewerAction.Zoom(ZOOM_STEP);
            case GLFW_KEY_MINUS, GLFW_KEY_KP_SUBTRACT, GLFW_KEY_PAGE_DOWN -> new ViewerAction.Zoom(1 / ZOOM_STEP);
            case GLFW_KEY_LEFT_BRACKET, GLFW_KEY_COMMA -> new ViewerAction.StepCase(-1);
            case GLFW_KEY_RIGHT_BRACKET, GLFW_KEY_PERIOD -> new ViewerAction.StepCase(1);
            case GLFW_KEY_C -> new ViewerAction.NextColouring();
            case GLFW_KEY_1, GLFW_KEY_2, GLFW_KEY_3, GLFW_KEY_4 ->
                    new ViewerAction.UseColouring(Colouring.values()[key - GLFW_KEY_1]);
            case GLFW_KEY_D -> new ViewerAction.ToggleDeformed();
            case GLFW_KEY_G -> new ViewerAction.ToggleGrid();
            case GLFW_KEY_H, GLFW_KEY_F1 -> new ViewerAction.ToggleHelp();
            case GLFW_KEY_R, GLFW_KEY_HOME -> new ViewerAction.ResetCamera();
            case GLFW_KEY_P, GLFW_KEY_F12 -> new ViewerAction.Snapshot();
            case GLFW_KEY_ESCAPE, GLFW_KEY_Q -> new ViewerAction.Close();
            default -> null;
        };
        return Optional.ofNullable(a);
    }

    /** A mouse button went down at image pixel (x, y). */
    public void press(int button, int mods, double x, double y) {
        if (dragButton >= 0) {
            return;
        }
        dragButton = button;
        dragPans = button == GLFW_MOUSE_BUTTON_RIGHT || button == GLFW_MOUSE_BUTTON_MIDDLE
                || (mods & GLFW_MOD_SHIFT) != 0;
        lastX = pressX = x;
        lastY = pressY = y;
        moved = false;
    }

    /** The cursor moved to (x, y): an orbit or a pan while a button is held. */
    public Optional<ViewerAction> move(double x, double y) {
        if (dragButton < 0) {
            return Optional.empty();
        }
        if (Math.hypot(x - pressX, y - pressY) > CLICK_SLOP) {
            moved = true;
        }
        double dx = x - lastX;
        double dy = y - lastY;
        lastX = x;
        lastY = y;
        if (!moved || (dx == 0 && dy == 0)) {
            return Optional.empty();
        }
        return Optional.of(dragPans ? new ViewerAction.Pan(dx, dy)
                : new ViewerAction.Orbit(-dx * ORBIT_PER_PIXEL, dy * ORBIT_PER_PIXEL));
    }

    /** The button went up at (x, y): a pick when the left button did not drag. */
    public Optional<ViewerAction> release(int button, double x, double y) {
        if (button != dragButton) {
            return Optional.empty();
        }
        boolean click = button == GLFW_MOUSE_BUTTON_LEFT && !dragPans && !moved
                && Math.hypot(x - pressX, y - pressY) <= CLICK_SLOP;
        dragButton = -1;
        return click ? Optional.of(new ViewerAction.Pick(x, y)) : Optional.empty();
    }

    /** The wheel turned by {@code notches} (positive: away from the user, closer to the tower). */
    public Optional<ViewerAction> scroll(double notches) {
        return notches == 0 ? Optional.empty() : Optional.of(new ViewerAction.Zoom(Math.pow(ZOOM_STEP, notches)));
    }
}
