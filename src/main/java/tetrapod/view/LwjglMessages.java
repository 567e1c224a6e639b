package tetrapod.view;

import java.io.OutputStream;
import java.io.PrintStream;
import java.util.function.Supplier;
import org.lwjgl.system.Configuration;

/**
 * Where LWJGL's own diagnostic lines go while headless routes are tried: nowhere. A missing
 * libEGL or libOSMesa is an expected outcome here, and the one route line already says why each
 * route failed; LWJGL's "Failed to load a library" advice would only add noise to the output.
 * LWJGL instantiates this class by name ({@link Configuration#DEBUG_STREAM}).
 */
public final class LwjglMessages implements Supplier<PrintStream> {

    @Override
    public PrintStream get() {
        return new PrintStream(OutputStream.nullOutputStream());
    }

    /** Sends LWJGL's diagnostics here, unless someone chose a stream already; call before LWJGL loads. */
    static void silence() {
        if (Configuration.DEBUG_STREAM.get() == null && !Boolean.getBoolean("org.lwjgl.util.Debug")) {
            Configuration.DEBUG_STREAM.set(LwjglMessages.class.getName());
        }
    }
}
