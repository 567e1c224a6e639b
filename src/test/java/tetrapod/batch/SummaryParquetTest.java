package tetrapod.batch;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.apache.parquet.schema.MessageTypeParser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tetrapod.io.ParquetRows;

/** summary.parquet as issue 17 defines it, read back with Apache parquet-java. */
class SummaryParquetTest {

    /** The schema of issue 17, written out here by hand in parquet-java's schema language. */
    static final String SCHEMA = """
            message schema {
              required binary model (STRING);
              required binary scenario (STRING);
              required binary status (STRING);
              required int32 exit_code;
              required binary message (STRING);
              optional double max_utilisation;
              optional int32 member;
              optional binary role (STRING);
              optional double governing_azimuth_deg;
              optional int32 requirement_breaches;
              optional double max_footing_utilisation;
              optional double leg_compression_kN;
              optional double leg_uplift_kN;
              optional double steel_mass_kg;
              optional binary serviceability (STRING);
              optional double max_utilisation_change_from_base;
              optional binary report (STRING);
            }""";

    @Test
    void everyRowAndFigureAtFullPrecisionWithNullsWhereThereAreNoFigures(@TempDir Path dir) throws IOException {
        Figures full = new Figures(0.9123456789, 17, "leg", 45.0, 1, 0.51234, 123456.789, 2345.6, 1234.56789, "met");
        Figures sparse = new Figures(null, null, null, null, 0, null, 0.0, 0.0, 98.7654321, null);
        List<SummaryRow> rows = List.of(
                new SummaryRow("a", "towers/a.json", "base", Outcome.done(full, "reports/a/base"), 0.0),
                new SummaryRow("a", "towers/a.json", "ice", Outcome.done(sparse, null), null),
                new SummaryRow("b", "towers/b.json", "base",
                        Outcome.failed(2, "towers/b.json: segments[0].height: must be > 0, was -6 (line 3)"), null),
                new SummaryRow("c", "towers/ç ≥ 30 m.json", "base", Outcome.failed(3, "unstable: mechanism"), null));
        Path file = dir.resolve(SummaryParquet.FILE);
        SummaryParquet.write(file, rows, "tetrapod test");

        ParquetRows.assertSameFields(MessageTypeParser.parseMessageType(SCHEMA),
                ParquetRows.footer(file).getFileMetaData().getSchema());
        List<List<Object>> back = ParquetRows.read(file);
        assertEquals(List.of(
                Arrays.asList("towers/a.json", "base", "fails", 0, "", 0.9123456789, 17, "leg", 45.0, 1, 0.51234,
                        123.456789, 2.3456, 1234.56789, "met", 0.0, "reports/a/base/report.html"),
                Arrays.asList("towers/a.json", "ice", "passes", 0, "", null, null, null, null, 0, null, 0.0, 0.0,
                        98.7654321, null, null, null),
                Arrays.asList("towers/b.json", "base", "bad input", 2,
                        "towers/b.json: segments[0].height: must be > 0, was -6 (line 3)",
                        null, null, null, null, null, null, null, null, null, null, null, null),
                Arrays.asList("towers/ç ≥ 30 m.json", "base", "unstable", 3, "unstable: mechanism",
                        null, null, null, null, null, null, null, null, null, null, null, null)), back);
        try (var entries = Files.list(dir)) {
            assertEquals(List.of(file), entries.toList(), "no temporary file left beside it");
        }
    }

    @Test
    void theCsvHeaderIsTheParquetColumnNames() {
        assertEquals(MessageTypeParser.parseMessageType(SCHEMA).getFields().stream().map(f -> f.getName()).toList(),
                SummaryTable.HEADER);
    }
}
