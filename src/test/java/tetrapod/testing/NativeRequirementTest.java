package tetrapod.testing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import tetrapod.testing.NativeRequirement.Decision;
import tetrapod.testing.NativeRequirement.Verdict;

class NativeRequirementTest {

    /** No Debian package installs anything under this directory. */
    static final Path MADE_UP = Path.of("/nonexistent-tetrapod/bin/browser");

    @Test
    void aMissingExecutableSkipsWithoutTheVariableAndFailsWithIt() {
        NativeRequirement browser = NativeRequirement.executable(MADE_UP, "chromium");
        for (String unset : new String[] {null, "", " ", "0"}) {
            Decision skip = browser.decide(unset);
            assertEquals(Verdict.SKIP, skip.verdict(), "variable " + unset);
            assertTrue(skip.message().startsWith(MADE_UP + " is missing (Debian: sudo apt-get install chromium)"),
                    skip.message());
            assertTrue(skip.message().contains("set TETRAPOD_REQUIRE_NATIVE=1 to fail"), skip.message());
        }
        for (String set : new String[] {"1", "yes"}) {
            Decision fail = browser.decide(set);
            assertEquals(Verdict.FAIL, fail.verdict(), "variable " + set);
            assertEquals(MADE_UP + " is missing (Debian: sudo apt-get install chromium); TETRAPOD_REQUIRE_NATIVE is set,"
                    + " so this is a failure", fail.message());
        }
    }

    @Test
    void aPresentExecutableRunsWhateverTheVariable() {
        NativeRequirement shell = NativeRequirement.executable(Path.of("/bin/sh"), "dash");
        assertEquals(Verdict.RUN, shell.decide(null).verdict());
        assertEquals(Verdict.RUN, shell.decide("1").verdict());
    }

    @Test
    void theProbeRunsOnceAndItsAnswerIsQuoted() {
        AtomicInteger calls = new AtomicInteger();
        NativeRequirement gl = NativeRequirement.probed("libosmesa6 libegl1", () -> {
            calls.incrementAndGet();
            return Optional.of("no OpenGL context through OSMesa");
        });
        assertEquals(Verdict.SKIP, gl.decide(null).verdict());
        assertEquals(Verdict.FAIL, gl.decide("1").verdict());
        assertTrue(gl.decide(null).message().startsWith(
                "no OpenGL context through OSMesa (Debian: sudo apt-get install libosmesa6 libegl1)"), gl.decide(null)
                .message());
        assertEquals(1, calls.get(), "probes");
    }
}
