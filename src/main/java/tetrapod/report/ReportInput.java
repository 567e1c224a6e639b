package tetrapod.report;

import java.util.Objects;
import java.util.Optional;

/**
 * What a report is built from: the results, and the 3D picture of the tower (PNG bytes) when
 * there is one.
 */
record ReportInput(Results results, Optional<byte[]> towerPng) {
    ReportInput {
        Objects.requireNonNull(results, "results");
        Objects.requireNonNull(towerPng, "towerPng");
    }
}
