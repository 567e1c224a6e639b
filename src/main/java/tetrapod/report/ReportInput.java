package tetrapod.report;

import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * What a report is built from: the results, the 3D picture of the tower (PNG bytes) when there
 * is one, and the history of tetrapod size (size-history.json as plain values) when the design
 * came from it.
 */
record ReportInput(Results results, Optional<byte[]> towerPng, Optional<Map<String, Object>> sizingHistory) {
    ReportInput {
        Objects.requireNonNull(results, "results");
        Objects.requireNonNull(towerPng, "towerPng");
        Objects.requireNonNull(sizingHistory, "sizingHistory");
    }
}
