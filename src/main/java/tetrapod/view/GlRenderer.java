package tetrapod.view;

import static org.lwjgl.opengl.GL33C.*;
import static org.lwjgl.system.MemoryUtil.memAlloc;
import static org.lwjgl.system.MemoryUtil.memAllocFloat;
import static org.lwjgl.system.MemoryUtil.memFree;

import java.awt.image.BufferedImage;
import java.nio.ByteBuffer;
import java.nio.FloatBuffer;
import java.util.List;
import org.lwjgl.system.MemoryStack;

/**
 * Draws a {@link Scene} with OpenGL 3.3 core into whatever framebuffer is bound: every segment
 * instance in one instanced draw of a 4-vertex strip (shaders/segment.*), then the labels and
 * legend as textured quads from one atlas (shaders/overlay.*). Needs a current context; not
 * thread-safe. Re-uploads instances only when it is given a different scene.
 */
final class GlRenderer implements AutoCloseable {

    private static final int OVERLAY_FLOATS_PER_VERTEX = 4;

    private final ShaderProgram segments;
    private final ShaderProgram overlay;
    private final int uViewProjection;
    private final int uSegmentViewport;
    private final int uPixelScale;
    private final int uOverlayViewport;
    private final int segmentVao;
    private final int segmentVbo;
    private final int triadVao;
    private final int triadVbo;
    private final int triadInstances;
    private final int overlayVao;
    private final int overlayVbo;
    private final int atlasTexture;

    private Scene uploaded;
    private int instances;
    private LabelAtlas atlas;
    private LabelPainter painter;

    GlRenderer() {
        segments = new ShaderProgram("segment.vert", "segment.frag");
        overlay = new ShaderProgram("overlay.vert", "overlay.frag");
        uViewProjection = segments.uniform("uViewProjection");
        uSegmentViewport = segments.uniform("uViewport");
        uPixelScale = segments.uniform("uPixelScale");
        uOverlayViewport = overlay.uniform("uViewport");
        glUseProgram(overlay.id);
        glUniform1i(overlay.uniform("uAtlas"), 0);

        segmentVao = glGenVertexArrays();
        segmentVbo = glGenBuffers();
        instanceLayout(segmentVao, segmentVbo);
        triadVao = glGenVertexArrays();
        triadVbo = glGenBuffers();
        instanceLayout(triadVao, triadVbo);
        SegmentInstances triad = AxisTriad.segments();
        triadInstances = triad.count();
        upload(triadVbo, List.of(triad));

        overlayVao = glGenVertexArrays();
        overlayVbo = glGenBuffers();
        glBindVertexArray(overlayVao);
        glBindBuffer(GL_ARRAY_BUFFER, overlayVbo);
        int overlayStride = OVERLAY_FLOATS_PER_VERTEX * Float.BYTES;
        glEnableVertexAttribArray(0);
        glVertexAttribPointer(0, 2, GL_FLOAT, false, overlayStride, 0);
        glEnableVertexAttribArray(1);
        glVertexAttribPointer(1, 2, GL_FLOAT, false, overlayStride, 2L * Float.BYTES);
        glBindVertexArray(0);

        atlasTexture = glGenTextures();
        glBindTexture(GL_TEXTURE_2D, atlasTexture);
        glTexParameteri(GL_TEXTURE_2D, GL_TEXTURE_MIN_FILTER, GL_NEAREST);
        glTexParameteri(GL_TEXTURE_2D, GL_TEXTURE_MAG_FILTER, GL_NEAREST);
        glTexParameteri(GL_TEXTURE_2D, GL_TEXTURE_WRAP_S, GL_CLAMP_TO_EDGE);
        glTexParameteri(GL_TEXTURE_2D, GL_TEXTURE_WRAP_T, GL_CLAMP_TO_EDGE);
    }

    /** Segment instances from {@code vbo} as the vertex attributes of {@code vao} (see shaders/segment.vert). */
    private static void instanceLayout(int vao, int vbo) {
        glBindVertexArray(vao);
        glBindBuffer(GL_ARRAY_BUFFER, vbo);
        int stride = SegmentInstances.FLOATS * Float.BYTES;
        int[] sizes = {3, 3, 3, 2, 1};
        long offset = 0;
        for (int loc = 0; loc < sizes.length; loc++) {
            glEnableVertexAttribArray(loc);
            glVertexAttribPointer(loc, sizes[loc], GL_FLOAT, false, stride, offset);
            glVertexAttribDivisor(loc, 1);
            offset += (long) sizes[loc] * Float.BYTES;
        }
        glBindVertexArray(0);
    }

    /** Clears the bound framebuffer and draws the scene seen by {@code camera} on a {@code width} × {@code height} viewport. */
    void draw(Scene scene, Camera camera, int width, int height) {
        if (painter == null || painter.scale() != height / 1000.0) {
            painter = new LabelPainter(height);
            atlas = null;
        }
        draw(scene, camera, width, height, OverlayLayout.place(scene, new Projector(camera, width, height), painter));
    }

    /** The same, with the overlay images already placed (see {@link OverlayLayout}). */
    void draw(Scene scene, Camera camera, int width, int height, List<PlacedImage> overlay) {
        if (scene != uploaded) {
            upload(scene);
        }
        glViewport(0, 0, width, height);
        Rgb bg = Scene.BACKGROUND;
        glClearColor(bg.r(), bg.g(), bg.b(), 1f);
        glClear(GL_COLOR_BUFFER_BIT | GL_DEPTH_BUFFER_BIT);

        glEnable(GL_DEPTH_TEST);
        glDepthFunc(GL_LEQUAL);
        glDisable(GL_BLEND);
        glDisable(GL_CULL_FACE);
        glUseProgram(segments.id);
        try (MemoryStack stack = MemoryStack.stackPush()) {
            FloatBuffer m = stack.mallocFloat(16);
            camera.viewProjection(width, height, new org.joml.Matrix4f()).get(m);
            glUniformMatrix4fv(uViewProjection, false, m);
        }
        glUniform2f(uSegmentViewport, width, height);
        glUniform1f(uPixelScale, height / 1000f);
        glBindVertexArray(segmentVao);
        glDrawArraysInstanced(GL_TRIANGLE_STRIP, 0, 4, instances);
        if (scene.axisTriad()) {
            drawTriad(camera, width, height);
        }

        drawOverlay(overlay, width, height);
        glBindVertexArray(0);
        glUseProgram(0);
    }

    /** The axis triad in its own viewport, over the tower (its depth cleared), with the camera's rotation only. */
    private void drawTriad(Camera camera, int width, int height) {
        ScreenRect v = AxisTriad.viewport(width, height);
        int side = (int) v.width();
        int x = (int) v.x0();
        int y = height - (int) v.y1();  // OpenGL counts rows from the bottom
        glEnable(GL_SCISSOR_TEST);
        glScissor(x, y, side, side);
        glClear(GL_DEPTH_BUFFER_BIT);
        glViewport(x, y, side, side);
        try (MemoryStack stack = MemoryStack.stackPush()) {
            FloatBuffer m = stack.mallocFloat(16);
            AxisTriad.camera(camera).viewProjection(side, side, new org.joml.Matrix4f()).get(m);
            glUniformMatrix4fv(uViewProjection, false, m);
        }
        glUniform2f(uSegmentViewport, side, side);
        glUniform1f(uPixelScale, side / 1000f);
        glBindVertexArray(triadVao);
        glDrawArraysInstanced(GL_TRIANGLE_STRIP, 0, 4, triadInstances);
        glDisable(GL_SCISSOR_TEST);
        glViewport(0, 0, width, height);
    }

    private void upload(Scene scene) {
        instances = upload(segmentVbo, List.of(scene.ground(), scene.decorations(), scene.members()));
        uploaded = scene;
    }

    /** Writes {@code batches} into {@code vbo}; returns how many instances. */
    private static int upload(int vbo, List<SegmentInstances> batches) {
        int total = 0;
        for (SegmentInstances b : batches) {
            total += b.count();
        }
        FloatBuffer buffer = memAllocFloat(Math.max(1, total * SegmentInstances.FLOATS));
        try {
            for (SegmentInstances b : batches) {
                b.writeTo(buffer);
            }
            buffer.flip();
            glBindBuffer(GL_ARRAY_BUFFER, vbo);
            glBufferData(GL_ARRAY_BUFFER, buffer, GL_STATIC_DRAW);
        } finally {
            memFree(buffer);
        }
        return total;
    }

    private void drawOverlay(List<PlacedImage> placed, int width, int height) {
        if (placed.isEmpty()) {
            return;
        }
        if (atlas == null || !atlas.holds(placed)) {
            atlas = new LabelAtlas(placed, 2048);
            uploadAtlas(atlas.image);
        }
        FloatBuffer quads = memAllocFloat(placed.size() * 6 * OVERLAY_FLOATS_PER_VERTEX);
        try {
            for (PlacedImage p : placed) {
                LabelAtlas.Uv uv = atlas.uv(p.image());
                float x0 = p.x();
                float y0 = p.y();
                float x1 = x0 + p.image().getWidth();
                float y1 = y0 + p.image().getHeight();
                quads.put(x0).put(y0).put(uv.u0()).put(uv.v0());
                quads.put(x1).put(y0).put(uv.u1()).put(uv.v0());
                quads.put(x1).put(y1).put(uv.u1()).put(uv.v1());
                quads.put(x0).put(y0).put(uv.u0()).put(uv.v0());
                quads.put(x1).put(y1).put(uv.u1()).put(uv.v1());
                quads.put(x0).put(y1).put(uv.u0()).put(uv.v1());
            }
            quads.flip();
            glBindBuffer(GL_ARRAY_BUFFER, overlayVbo);
            glBufferData(GL_ARRAY_BUFFER, quads, GL_STREAM_DRAW);
        } finally {
            memFree(quads);
        }
        glDisable(GL_DEPTH_TEST);
        glEnable(GL_BLEND);
        glBlendFuncSeparate(GL_SRC_ALPHA, GL_ONE_MINUS_SRC_ALPHA, GL_ONE, GL_ONE_MINUS_SRC_ALPHA);
        glUseProgram(overlay.id);
        glUniform2f(uOverlayViewport, width, height);
        glActiveTexture(GL_TEXTURE0);
        glBindTexture(GL_TEXTURE_2D, atlasTexture);
        glBindVertexArray(overlayVao);
        glDrawArrays(GL_TRIANGLES, 0, placed.size() * 6);
        glDisable(GL_BLEND);
    }

    private void uploadAtlas(BufferedImage image) {
        int w = image.getWidth();
        int h = image.getHeight();
        int[] argb = image.getRGB(0, 0, w, h, null, 0, w);
        ByteBuffer rgba = memAlloc(w * h * 4);
        try {
            for (int p : argb) {
                rgba.put((byte) (p >> 16)).put((byte) (p >> 8)).put((byte) p).put((byte) (p >>> 24));
            }
            rgba.flip();
            glBindTexture(GL_TEXTURE_2D, atlasTexture);
            glPixelStorei(GL_UNPACK_ALIGNMENT, 1);
            glTexImage2D(GL_TEXTURE_2D, 0, GL_RGBA8, w, h, 0, GL_RGBA, GL_UNSIGNED_BYTE, rgba);
        } finally {
            memFree(rgba);
        }
    }

    @Override
    public void close() {
        glDeleteTextures(atlasTexture);
        glDeleteBuffers(segmentVbo);
        glDeleteBuffers(triadVbo);
        glDeleteVertexArrays(triadVao);
        glDeleteBuffers(overlayVbo);
        glDeleteVertexArrays(segmentVao);
        glDeleteVertexArrays(overlayVao);
        segments.close();
        overlay.close();
    }
}
