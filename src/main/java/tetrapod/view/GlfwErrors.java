package tetrapod.view;

import java.util.ArrayList;
import java.util.List;
import org.lwjgl.glfw.GLFWErrorCallback;

/** Collects GLFW's error messages while a context is being made, so that a failure can say why. */
final class GlfwErrors extends GLFWErrorCallback {

    private final List<String> messages = new ArrayList<>();

    @Override
    public void invoke(int error, long description) {
        messages.add(String.format("0x%X %s", error, getDescription(description)));
    }

    /** The messages so far, joined; empty when there were none. */
    String text() {
        return String.join("; ", messages);
    }
}
