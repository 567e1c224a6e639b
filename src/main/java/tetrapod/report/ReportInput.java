package tetrapod.report;

import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * What a report is built from: the results, the 3D picture of the tower (its PNG as base64 text,
 * or {@link PictureFill#PLACE} for a picture put in later) when there is one, and the history of
 * tetrapod size (size-history.json as plain values) when the design came from it.
 */
record ReportInput(Results results, Optional<String> towerPngBase64, Optional<Map<String, Object>> sizingHistory) {
    ReportInput {
        Objects.requireNonNull(results, "results");
        Objects.requireNonNull(towerPngBase64, "towerPngBase64");
        Objects.requireNonNull(sizingHistory, "sizingHistory");
    }
}
