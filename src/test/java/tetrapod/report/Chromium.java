package tetrapod.report;

import java.io.IOException;
import java.net.ServerSocket;
import java.net.Socket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.TimeUnit;

/**
 * Headless Chromium (Debian's package, installed by .ci/run) driven from its command line: a page's
 * DOM after loading with its console messages, a screenshot, and every request the page makes to
 * the network, which goes through a local proxy that records it and answers nothing.
 */
final class Chromium implements AutoCloseable {

    static final Path BINARY = Path.of("/usr/bin/chromium");
    private static final long TIMEOUT_S = 90;

    /**
     * Hosts Chromium itself calls in the background (clock, component updates, sign-in), whatever
     * the page: not the page's requests. Found by running it on an empty page through the proxy.
     */
    private static final List<String> OWN_HOSTS = List.of("clients2.google.com", "update.googleapis.com",
            "accounts.google.com", "clients1.google.com", "redirector.gvt1.com", "edgedl.me.gvt1.com",
            "optimizationguide-pa.googleapis.com", "safebrowsing.googleapis.com", "content-autofill.googleapis.com",
            "android.clients.google.com", "www.google.com");

    /** What one run printed: the page's DOM (or nothing) and Chromium's log. */
    record Run(String stdout, String stderr) {
        /** The page's console messages, as Chromium logs them ({@code ...:CONSOLE...] "text", source: ...}). */
        List<String> consoleMessages() {
            return stderr.lines().filter(l -> l.contains(":CONSOLE")).toList();
        }
    }

    private final ServerSocket proxy;
    private final List<String> requests = new CopyOnWriteArrayList<>();
    private final Path profiles;

    Chromium() throws IOException {
        proxy = new ServerSocket(0, 50, java.net.InetAddress.getLoopbackAddress());
        Thread t = new Thread(this::record, "proxy-recorder");
        t.setDaemon(true);
        t.start();
        profiles = Files.createTempDirectory(Files.createDirectories(Path.of("target")), "tetrapod-chromium");
    }

    private void record() {
        while (!proxy.isClosed()) {
            try (Socket s = proxy.accept()) {
                s.setSoTimeout(2000);
                byte[] head = new byte[512];
                int n = s.getInputStream().read(head);
                String line = n <= 0 ? "" : new String(head, 0, n, StandardCharsets.ISO_8859_1).lines().findFirst()
                        .orElse("");
                requests.add(line);
            } catch (IOException e) {
                // closed, or a client that sent nothing: nothing to record
            }
        }
    }

    /** The request lines the proxy saw that Chromium did not make on its own behalf. */
    List<String> pageRequests() {
        List<String> out = new ArrayList<>();
        for (String r : requests) {
            String target = r.split(" ").length > 1 ? r.split(" ")[1] : r;
            String host = target.replaceFirst("^[a-z]+://", "").replaceFirst("[:/].*$", "");
            if (!OWN_HOSTS.contains(host)) {
                out.add(r);
            }
        }
        return out;
    }

    /** The DOM after loading {@code page}, and the log with its console messages. */
    Run dumpDom(Path page) throws IOException, InterruptedException {
        return run(List.of("--enable-logging=stderr", "--v=0", "--dump-dom", page.toUri().toString()));
    }

    /** A screenshot of the first screen of {@code page}, {@code width} × {@code height} px, into {@code png}. */
    Run screenshot(Path page, Path png, int width, int height) throws IOException, InterruptedException {
        return run(List.of("--window-size=" + width + "," + height, "--hide-scrollbars",
                "--screenshot=" + png.toAbsolutePath(), page.toUri().toString()));
    }

    /** {@code page} printed to PDF as Chromium prints it (A4 by the page's own @page rule) into {@code pdf}. */
    Run printToPdf(Path page, Path pdf) throws IOException, InterruptedException {
        return run(List.of("--no-pdf-header-footer", "--print-to-pdf=" + pdf.toAbsolutePath(), page.toUri().toString()));
    }

    private Run run(List<String> args) throws IOException, InterruptedException {
        Path profile = Files.createTempDirectory(profiles, "profile");
        List<String> command = new ArrayList<>(List.of(BINARY.toString(), "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run",
                "--user-data-dir=" + profile, "--proxy-server=http://127.0.0.1:" + proxy.getLocalPort(),
                "--proxy-bypass-list=<-loopback>"));
        command.addAll(args);
        Path out = profiles.resolve("out-" + System.nanoTime());
        Path err = profiles.resolve("err-" + System.nanoTime());
        Process p = new ProcessBuilder(command).redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        if (!p.waitFor(TIMEOUT_S, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new IllegalStateException("chromium did not finish in " + TIMEOUT_S + " s: " + command);
        }
        return new Run(Files.readString(out), Files.readString(err));
    }

    @Override
    public void close() throws IOException {
        proxy.close();
        tetrapod.io.TestFiles.deleteTree(profiles);
    }
}
