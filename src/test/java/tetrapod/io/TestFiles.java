package tetrapod.io;

import java.io.IOException;
import java.nio.file.Path;

/** File helpers for tests in other packages. */
public final class TestFiles {

    private TestFiles() { }

    public static void deleteTree(Path dir) throws IOException {
        Leftovers.deleteTree(dir);
    }
}
