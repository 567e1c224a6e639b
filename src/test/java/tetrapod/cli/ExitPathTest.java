package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** Every way a run can end takes the one exit path: a documented code and readable lines. */
class ExitPathTest {

    private static final String MODEL = "models/benchmark-25-bar-space-truss.json";

    /** A command that throws what it is given, added to the real command line. */
    @Command(name = "throw")
    static final class Thrower implements Callable<Integer> {
        private final Throwable toThrow;

        Thrower(Throwable toThrow) {
            this.toThrow = toThrow;
        }

        @Override
        public Integer call() throws Exception {
            if (toThrow instanceof Error e) {
                throw e;
            }
            throw (Exception) toThrow;
        }
    }

    private static CliRun throwing(Throwable t, String... extra) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = Main.commandLine(out, err);
        cl.addSubcommand("throw", new Thrower(t));
        String[] args = new String[extra.length + 1];
        args[0] = "throw";
        System.arraycopy(extra, 0, args, 1, extra.length);
        int code = cl.execute(args);
        return new CliRun(code, out.toString(), err.toString());
    }

    private static void assertNoStackTrace(CliRun run) {
        assertFalse(run.err().contains("\tat ") || run.err().contains("    at "), run.err());
        assertFalse(run.out().contains("\tat "), run.out());
    }

    @Test
    void outOfMemoryHasItsOwnCodeAndNamesXmx() {
        CliRun run = throwing(new OutOfMemoryError("Java heap space"));
        assertEquals(ExitCode.OUT_OF_MEMORY, run.exitCode());
        assertEquals(1, run.err().lines().count(), run.err());
        assertTrue(run.err().contains("out of memory") && run.err().contains("-Xmx"), run.err());
        assertNoStackTrace(run);
    }

    @Test
    void stackOverflowHasTheSameCodeAndNamesXss() {
        CliRun run = throwing(new StackOverflowError());
        assertEquals(ExitCode.OUT_OF_MEMORY, run.exitCode());
        assertTrue(run.err().contains("-Xss"), run.err());
        assertNoStackTrace(run);
    }

    @Test
    void anyOtherThrowableIsAnInternalErrorWithTheTraceOnlyUnderDebug() {
        CliRun run = throwing(new IllegalStateException("boom\u001b[2J"));
        assertEquals(ExitCode.INTERNAL, run.exitCode());
        assertTrue(run.err().startsWith("internal error: java.lang.IllegalStateException: boom\\x1B[2J"), run.err());
        assertNoStackTrace(run);
        CliRun debug = throwing(new AssertionError("odd"), "--debug");
        assertEquals(ExitCode.INTERNAL, debug.exitCode());
        assertTrue(debug.err().contains("    at tetrapod.cli.ExitPathTest"), debug.err());
    }

    @Test
    void anErrorWrappedInAnExceptionKeepsItsMeaning() {
        CliRun run = throwing(new java.util.concurrent.ExecutionException(new OutOfMemoryError()));
        assertEquals(ExitCode.OUT_OF_MEMORY, run.exitCode(), run.err());
        CliRun io = throwing(new java.nio.file.AccessDeniedException("/srv/out/results.json"));
        assertEquals(ExitCode.OUTPUT_FAILED, io.exitCode(), io.err());
        assertEquals("error: I/O failure at /srv/out/results.json: permission denied", io.err().strip());
    }

    @Test
    void aRealOutOfMemoryInASmallHeapExitsSixWithOneLine() throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process p = new ProcessBuilder(java, "-Xmx24m", "-XX:-UsePerfData", "-cp", System.getProperty("java.class.path"),
                "tetrapod.cli.Main", "analyze", "models/hilltop-relay-k.json", "-o",
                Files.createTempDirectory("oom").resolve("out").toString(), "--quiet").start();
        boolean finished = p.waitFor(120, TimeUnit.SECONDS);
        if (!finished) {
            p.destroyForcibly();   // a JVM out of memory may not even run its SIGTERM handler
        }
        assertTrue(finished, "finished");
        String err = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertEquals(ExitCode.OUT_OF_MEMORY, p.exitValue(), err);
        assertTrue(err.contains("-Xmx"), err);
        assertFalse(err.contains("\tat ") || err.contains("Exception in thread"), err);
    }

    @Test
    void devicesAndPipesAreRefusedAtOnce(@TempDir Path dir) throws Exception {
        assertTimeoutPreemptively(Duration.ofSeconds(10), () -> {
            CliRun zero = CliRun.of("validate", "/dev/zero");
            assertEquals(ExitCode.BAD_INPUT, zero.exitCode(), zero.err());
            assertTrue(zero.err().contains("/dev/zero: it is not a regular file"), zero.err());
        });
        Path fifo = dir.resolve("pipe.json");
        Process mk = new ProcessBuilder("mkfifo", fifo.toString()).start();
        assertEquals(0, mk.waitFor());
        assertTimeoutPreemptively(Duration.ofSeconds(10), () -> {
            CliRun pipe = CliRun.of("validate", fifo.toString());
            assertEquals(ExitCode.BAD_INPUT, pipe.exitCode(), pipe.err());
            assertTrue(pipe.err().contains("not a regular file"), pipe.err());
        });
        CliRun folder = CliRun.of("validate", dir.toString());
        assertEquals(ExitCode.BAD_INPUT, folder.exitCode(), folder.err());
        assertTrue(folder.err().contains("it is a folder"), folder.err());
    }

    @Test
    void aModelOverTheLimitIsRefusedBeforeReadingWithItsSizeAndTheLimit(@TempDir Path dir) throws Exception {
        Path big = dir.resolve("huge.json");
        try (RandomAccessFile f = new RandomAccessFile(big.toFile(), "rw")) {
            f.setLength(20_000_001); // sparse: nothing is written, so only a reader that reads it all is slow
        }
        assertTimeoutPreemptively(Duration.ofSeconds(5), () -> {
            CliRun run = CliRun.of("validate", big.toString());
            assertEquals(ExitCode.BAD_INPUT, run.exitCode(), run.err());
            assertEquals("error: $: cannot read " + big + ": 20.0 MB (20000001 bytes) is larger than the "
                    + "20.0 MB (20000000 bytes) limit of a model file", run.err().strip());
        });
    }

    @Test
    void aByteOrderMarkIsAccepted(@TempDir Path dir) throws IOException {
        Path bom = dir.resolve("bom.json");
        Files.write(bom, concat(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF}, Files.readAllBytes(Path.of(MODEL))));
        CliRun run = CliRun.of("validate", bom.toString());
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
    }

    @Test
    void controlCharactersFromTheInputAreEscapedInEveryMessage(@TempDir Path dir) throws IOException {
        String model = Files.readString(Path.of(MODEL));
        Path file = dir.resolve("evil\u001b[2J\u0007.json");
        int brace = model.indexOf('{');
        Files.writeString(file, "{ \"\\u001b[31mcolour\\r\\nerror: forged\\u202e\": 1," + model.substring(brace + 1));
        CliRun run = CliRun.of("validate", file.toString());
        assertEquals(ExitCode.BAD_INPUT, run.exitCode(), run.err());
        List<String> lines = run.err().lines().toList();
        assertEquals(1, lines.size(), run.err());
        assertTrue(lines.get(0).contains("\\x1B[31mcolour\\r\\nerror: forged\\u202E"), lines.get(0));
        for (char c : new char[] {'\u001b', '\u0007', '\r', '\u202e'}) {
            assertFalse(run.err().indexOf(c) >= 0, "raw U+" + Integer.toHexString(c) + " in " + run.err());
        }
        CliRun missing = CliRun.of("validate", file.resolveSibling("gone\u0007.json").toString());
        assertTrue(missing.err().contains("gone\\x07.json"), missing.err());
    }

    @Test
    void theHelpStillHasItsLinesAndListsEveryExitCode() {
        CliRun help = CliRun.of("--help");
        assertEquals(ExitCode.DONE, help.exitCode());
        assertTrue(help.out().lines().count() > 10, help.out());
        assertFalse(help.out().contains("\\n"), help.out());
        for (String code : List.of("0 done", "1 overstressed", "2 bad input", "3 unstable", "4 internal", "5 an output",
                "6 bad environment", "7 out of memory")) {
            assertTrue(help.out().replaceAll("\\s+", " ").contains(code), code + " missing from " + help.out());
        }
        CliRun sub = CliRun.of("help", "analyze");
        assertTrue(sub.out().lines().count() > 5 && sub.out().contains("Usage: tetrapod analyze"), sub.out());
    }

    private static byte[] concat(byte[] a, byte[] b) {
        byte[] out = new byte[a.length + b.length];
        System.arraycopy(a, 0, out, 0, a.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }
}
