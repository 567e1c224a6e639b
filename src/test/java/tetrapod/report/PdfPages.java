package tetrapod.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The number of pages of a PDF, read from its page objects ({@code /Type /Page}, not the
 * {@code /Pages} tree nodes): Chromium writes each page's dictionary uncompressed.
 */
final class PdfPages {

    private static final Pattern PAGE = Pattern.compile("/Type\\s*/Page(?![a-zA-Z])");

    private PdfPages() { }

    static int count(Path pdf) throws IOException {
        String text = new String(Files.readAllBytes(pdf), StandardCharsets.ISO_8859_1);
        Matcher m = PAGE.matcher(text);
        int n = 0;
        while (m.find()) {
            n++;
        }
        return n;
    }
}
