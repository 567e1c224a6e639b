package tetrapod.view;

import static org.lwjgl.opengl.GL33C.*;
import static org.lwjgl.system.MemoryUtil.memAllocInt;
import static org.lwjgl.system.MemoryUtil.memFree;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.nio.IntBuffer;

/**
 * A multisampled framebuffer to draw into, and a single-sampled one it is resolved into before
 * the pixels are read back. Needs a current context.
 */
final class OffscreenTarget implements AutoCloseable {

    private final int width;
    private final int height;
    private final int samples;
    private final int msFbo;
    private final int msColour;
    private final int msDepth;
    private final int resolveFbo;
    private final int resolveColour;

    /** {@code samples} is capped at what the implementation offers ({@code GL_MAX_SAMPLES}). */
    OffscreenTarget(int width, int height, int samples) {
        int max = glGetInteger(GL_MAX_RENDERBUFFER_SIZE);
        if (width > max || height > max) {
            throw new IllegalArgumentException("image " + width + " x " + height + " px is larger than this OpenGL allows ("
                    + max + " px)");
        }
        this.width = width;
        this.height = height;
        this.samples = Math.max(0, Math.min(samples, glGetInteger(GL_MAX_SAMPLES)));
        msFbo = glGenFramebuffers();
        msColour = glGenRenderbuffers();
        msDepth = glGenRenderbuffers();
        glBindFramebuffer(GL_FRAMEBUFFER, msFbo);
        glBindRenderbuffer(GL_RENDERBUFFER, msColour);
        glRenderbufferStorageMultisample(GL_RENDERBUFFER, this.samples, GL_RGBA8, width, height);
        glFramebufferRenderbuffer(GL_FRAMEBUFFER, GL_COLOR_ATTACHMENT0, GL_RENDERBUFFER, msColour);
        glBindRenderbuffer(GL_RENDERBUFFER, msDepth);
        glRenderbufferStorageMultisample(GL_RENDERBUFFER, this.samples, GL_DEPTH24_STENCIL8, width, height);
        glFramebufferRenderbuffer(GL_FRAMEBUFFER, GL_DEPTH_STENCIL_ATTACHMENT, GL_RENDERBUFFER, msDepth);
        check("multisampled");
        resolveFbo = glGenFramebuffers();
        resolveColour = glGenRenderbuffers();
        glBindFramebuffer(GL_FRAMEBUFFER, resolveFbo);
        glBindRenderbuffer(GL_RENDERBUFFER, resolveColour);
        glRenderbufferStorage(GL_RENDERBUFFER, GL_RGBA8, width, height);
        glFramebufferRenderbuffer(GL_FRAMEBUFFER, GL_COLOR_ATTACHMENT0, GL_RENDERBUFFER, resolveColour);
        check("resolve");
        glBindRenderbuffer(GL_RENDERBUFFER, 0);
        bind();
    }

    private static void check(String which) {
        int status = glCheckFramebufferStatus(GL_FRAMEBUFFER);
        if (status != GL_FRAMEBUFFER_COMPLETE) {
            throw new IllegalStateException(which + " framebuffer incomplete: 0x" + Integer.toHexString(status));
        }
    }

    /** Makes the multisampled framebuffer the one drawn into. */
    void bind() {
        glBindFramebuffer(GL_FRAMEBUFFER, msFbo);
    }

    /** Resolves the samples and reads the image back, top row first. */
    BufferedImage read() {
        glBindFramebuffer(GL_READ_FRAMEBUFFER, msFbo);
        glBindFramebuffer(GL_DRAW_FRAMEBUFFER, resolveFbo);
        glBlitFramebuffer(0, 0, width, height, 0, 0, width, height, GL_COLOR_BUFFER_BIT, GL_NEAREST);
        glBindFramebuffer(GL_READ_FRAMEBUFFER, resolveFbo);
        glPixelStorei(GL_PACK_ALIGNMENT, 1);
        IntBuffer pixels = memAllocInt(width * height);
        try {
            // one int per pixel, 0xAARRGGBB: the layout of a TYPE_INT_RGB raster (whose alpha byte is ignored)
            glReadPixels(0, 0, width, height, GL_BGRA, GL_UNSIGNED_INT_8_8_8_8_REV, pixels);
            BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
            int[] out = ((DataBufferInt) image.getRaster().getDataBuffer()).getData();
            for (int row = 0; row < height; row++) {
                pixels.get((height - 1 - row) * width, out, row * width, width);  // OpenGL's first row is the bottom one
            }
            for (int k = 0; k < out.length; k++) {
                out[k] &= 0xffffff;
            }
            return image;
        } finally {
            memFree(pixels);
            bind();
        }
    }

    @Override
    public void close() {
        glBindFramebuffer(GL_FRAMEBUFFER, 0);
        glDeleteFramebuffers(msFbo);
        glDeleteFramebuffers(resolveFbo);
        glDeleteRenderbuffers(msColour);
        glDeleteRenderbuffers(msDepth);
        glDeleteRenderbuffers(resolveColour);
    }
}
