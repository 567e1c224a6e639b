package tetrapod.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.lwjgl.glfw.GLFW.*;

import java.util.Optional;
import org.junit.jupiter.api.Test;

class InputMapTest {

    private final InputMap input = new InputMap();

    @Test
    void arrowsOrbitAndShiftArrowsPan() {
        assertEquals(Optional.of(new ViewerAction.Orbit(-InputMap.ORBIT_STEP, 0)), input.key(GLFW_KEY_LEFT, 0));
        assertEquals(Optional.of(new ViewerAction.Orbit(InputMap.ORBIT_STEP, 0)), input.key(GLFW_KEY_RIGHT, 0));
        assertEquals(Optional.of(new ViewerAction.Orbit(0, InputMap.ORBIT_STEP)), input.key(GLFW_KEY_UP, 0));
        assertEquals(Optional.of(new ViewerAction.Pan(InputMap.PAN_STEP, 0)), input.key(GLFW_KEY_LEFT, GLFW_MOD_SHIFT));
        assertEquals(Optional.of(new ViewerAction.Pan(0, -InputMap.PAN_STEP)), input.key(GLFW_KEY_DOWN, GLFW_MOD_SHIFT));
    }

    @Test
    void otherKeys() {
        assertEquals(Optional.of(new ViewerAction.Zoom(InputMap.ZOOM_STEP)), input.key(GLFW_KEY_EQUAL, 0));
        assertEquals(Optional.of(new ViewerAction.Zoom(1 / InputMap.ZOOM_STEP)), input.key(GLFW_KEY_MINUS, 0));
        assertEquals(Optional.of(new ViewerAction.StepCase(1)), input.key(GLFW_KEY_RIGHT_BRACKET, 0));
        assertEquals(Optional.of(new ViewerAction.StepCase(-1)), input.key(GLFW_KEY_LEFT_BRACKET, 0));
        assertEquals(Optional.of(new ViewerAction.NextColouring()), input.key(GLFW_KEY_C, 0));
        assertEquals(Optional.of(new ViewerAction.UseColouring(Colouring.UTILISATION)), input.key(GLFW_KEY_3, 0));
        assertEquals(Optional.of(new ViewerAction.UseColouring(Colouring.ROLE)), input.key(GLFW_KEY_1, 0));
        assertEquals(Optional.of(new ViewerAction.ToggleDeformed()), input.key(GLFW_KEY_D, 0));
        assertEquals(Optional.of(new ViewerAction.Snapshot()), input.key(GLFW_KEY_P, 0));
        assertEquals(Optional.of(new ViewerAction.ResetCamera()), input.key(GLFW_KEY_R, 0));
        assertEquals(Optional.of(new ViewerAction.Close()), input.key(GLFW_KEY_ESCAPE, 0));
        assertEquals(Optional.empty(), input.key(GLFW_KEY_Z, 0));
    }

    @Test
    void leftDragOrbitsByThePixelsMoved() {
        input.press(GLFW_MOUSE_BUTTON_LEFT, 0, 100, 100);
        assertEquals(Optional.empty(), input.move(101, 101), "within the click slop nothing happens");
        Optional<ViewerAction> a = input.move(130, 90);
        assertEquals(Optional.of(new ViewerAction.Orbit(-29 * InputMap.ORBIT_PER_PIXEL, -11 * InputMap.ORBIT_PER_PIXEL)), a);
        assertEquals(Optional.of(new ViewerAction.Orbit(-10 * InputMap.ORBIT_PER_PIXEL, 0)), input.move(140, 90));
        assertEquals(Optional.empty(), input.release(GLFW_MOUSE_BUTTON_LEFT, 140, 90), "a drag is not a click");
        assertEquals(Optional.empty(), input.move(150, 90), "no button held");
    }

    @Test
    void rightDragAndShiftDragPan() {
        input.press(GLFW_MOUSE_BUTTON_RIGHT, 0, 10, 10);
        assertEquals(Optional.of(new ViewerAction.Pan(20, -5)), input.move(30, 5));
        input.release(GLFW_MOUSE_BUTTON_RIGHT, 30, 5);
        input.press(GLFW_MOUSE_BUTTON_LEFT, GLFW_MOD_SHIFT, 10, 10);
        assertEquals(Optional.of(new ViewerAction.Pan(-8, 0)), input.move(2, 10));
        assertEquals(Optional.empty(), input.release(GLFW_MOUSE_BUTTON_LEFT, 2, 10));
    }

    @Test
    void aClickPicksAndTheWheelZooms() {
        input.press(GLFW_MOUSE_BUTTON_LEFT, 0, 200, 300);
        input.move(201, 301);
        assertEquals(Optional.of(new ViewerAction.Pick(201, 301)), input.release(GLFW_MOUSE_BUTTON_LEFT, 201, 301));
        Optional<ViewerAction> zoom = input.scroll(2);
        assertTrue(zoom.isPresent());
        assertEquals(InputMap.ZOOM_STEP * InputMap.ZOOM_STEP, ((ViewerAction.Zoom) zoom.get()).factor(), 1e-12);
        assertEquals(Optional.empty(), input.scroll(0));
    }
}
