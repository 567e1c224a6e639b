package tetrapod.view;

import static org.lwjgl.opengl.GL33C.*;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;

/** A linked GLSL program from the class path's {@code /shaders/}; needs a current context. */
final class ShaderProgram implements AutoCloseable {

    final int id;

    /** Compiles and links {@code /shaders/<vertex>} and {@code /shaders/<fragment>}; throws with the log on failure. */
    ShaderProgram(String vertex, String fragment) {
        int vs = compile(GL_VERTEX_SHADER, vertex);
        int fs;
        try {
            fs = compile(GL_FRAGMENT_SHADER, fragment);
        } catch (RuntimeException e) {
            glDeleteShader(vs);
            throw e;
        }
        id = glCreateProgram();
        glAttachShader(id, vs);
        glAttachShader(id, fs);
        glLinkProgram(id);
        glDeleteShader(vs);
        glDeleteShader(fs);
        if (glGetProgrami(id, GL_LINK_STATUS) == GL_FALSE) {
            String log = glGetProgramInfoLog(id);
            glDeleteProgram(id);
            throw new IllegalStateException("cannot link shaders " + vertex + " + " + fragment + ":\n" + log);
        }
    }

    int uniform(String name) {
        int location = glGetUniformLocation(id, name);
        if (location < 0) {
            throw new IllegalStateException("shader program has no uniform " + name);
        }
        return location;
    }

    private static int compile(int type, String name) {
        int shader = glCreateShader(type);
        glShaderSource(shader, source(name));
        glCompileShader(shader);
        if (glGetShaderi(shader, GL_COMPILE_STATUS) == GL_FALSE) {
            String log = glGetShaderInfoLog(shader);
            glDeleteShader(shader);
            throw new IllegalStateException("cannot compile shader " + name + ":\n" + log);
        }
        return shader;
    }

    static String source(String name) {
        try (InputStream in = ShaderProgram.class.getResourceAsStream("/shaders/" + name)) {
            if (in == null) {
                throw new IllegalStateException("shader /shaders/" + name + " is not on the class path");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read shader " + name, e);
        }
    }

    @Override
    public void close() {
        glDeleteProgram(id);
    }
}
