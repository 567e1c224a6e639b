package tetrapod.report;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;

/**
 * The picture's place in a page written before the picture was drawn, and the copy that puts the
 * picture there: byte by byte, so that a long report is never one string.
 */
final class PictureFill {

    /**
     * Stands for the picture's base64 text. {@code <} opens no tag here and is escaped in every text,
     * so a page holds this only where the picture goes.
     */
    static final String PLACE = "<@tetrapod-picture@>";

    private static final byte[] MARK = PLACE.getBytes(StandardCharsets.US_ASCII);

    private PictureFill() { }

    /**
     * Copies {@code page} to {@code out} with every {@link #PLACE} replaced by {@code base64}. The
     * page is UTF-8, whose multi-byte characters hold no ASCII byte, and the mark's first byte occurs
     * in it only once: a byte that breaks a partial match can only start a new one.
     */
    static void copy(InputStream page, OutputStream out, String base64) throws IOException {
        byte[] picture = base64.getBytes(StandardCharsets.US_ASCII);
        byte[] chunk = new byte[1 << 16];
        int matched = 0;
        for (int read = page.read(chunk); read >= 0; read = page.read(chunk)) {
            int plain = 0;                                        // chunk[plain, k) is still to write
            for (int k = 0; k < read; k++) {
                byte b = chunk[k];
                if (b == MARK[matched]) {
                    if (matched++ == 0) {
                        out.write(chunk, plain, k - plain);
                    }
                    if (matched == MARK.length) {
                        out.write(picture);
                        matched = 0;
                    }
                    plain = k + 1;
                    continue;
                }
                if (matched > 0) {
                    out.write(MARK, 0, matched);
                    matched = b == MARK[0] ? 1 : 0;
                    plain = matched == 1 ? k + 1 : k;
                }
            }
            if (matched == 0) {
                out.write(chunk, plain, read - plain);
            }
        }
        out.write(MARK, 0, matched);
    }
}
