package tetrapod.spark;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.apache.parquet.hadoop.ParquetFileReader;
import org.apache.parquet.io.LocalInputFile;
import org.apache.parquet.schema.LogicalTypeAnnotation;
import org.apache.parquet.schema.PrimitiveType;
import org.apache.parquet.schema.Type;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.SparkSession;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.junit.jupiter.api.io.TempDir;
import tetrapod.batch.Figures;
import tetrapod.batch.FleetPlan;
import tetrapod.batch.FleetRun;
import tetrapod.batch.Manifest;
import tetrapod.batch.Outcome;
import tetrapod.batch.RunFolder;
import tetrapod.batch.Scenario;
import tetrapod.batch.SummaryRow;
import tetrapod.cli.Main;
import tetrapod.cli.TowerAnalysis;
import tetrapod.cli.Version;
import tetrapod.common.ProgressListener;
import tetrapod.testing.NativeRequirement;

/**
 * The Spark job in Spark's local mode against the plain batch on the same manifest: the same rows,
 * column for column at full precision, and the same summary.csv byte for byte. Skipped with a
 * message where this JVM cannot start Spark; failed there when TETRAPOD_REQUIRE_NATIVE is set.
 */
class FleetJobTest {

    private static SparkSession spark;

    @RegisterExtension
    static final NativeRequirement SPARK = NativeRequirement.probed("openjdk-17-jdk-headless", FleetJobTest::start);

    /** One Spark session for the class, two local cores, nothing listening beyond the loopback. */
    private static Optional<String> start() {
        try {
            spark = SparkSession.builder().master("local[2]").appName("tetrapod fleet test")
                    .config("spark.ui.enabled", "false").config("spark.driver.host", "127.0.0.1")
                    .config("spark.driver.bindAddress", "127.0.0.1").getOrCreate();
            return Optional.empty();
        } catch (Throwable t) {
            return Optional.of("Apache Spark cannot start in this JVM (" + t + ")");
        }
    }

    @AfterAll
    static void stop() {
        if (spark != null) {
            spark.stop();
        }
    }

    /** Invented 6 m tower, quick to analyse; %s is the basic wind speed. */
    private static final String SMALL = """
            { "name": "small spark tower",
              "base": { "widthX": 3.0, "widthY": 3.0 },
              "segments": [ { "height": 6.0, "topWidthX": 2.0, "topWidthY": 2.0, "panels": 2, "bracing": "x",
                  "sections": { "leg": "L100x10", "diagonal": "L60x6", "horizontal": "L60x6" } } ],
              "loads": { "wind": { "method": "en1991", "basicSpeed": %s, "terrain": "II" }, "sweepStep": 30 },
              "checks": { "method": "en1993" } }
            """;
    /** Invented 12 m tower of two segments. */
    private static final String TALLER = """
            { "name": "taller spark tower",
              "base": { "widthX": 3.0, "widthY": 3.0 },
              "segments": [ { "height": 6.0, "topWidthX": 2.0, "topWidthY": 2.0, "panels": 2, "bracing": "x",
                  "sections": { "leg": "L100x10", "diagonal": "L60x6", "horizontal": "L60x6" } },
                { "height": 6.0, "topWidthX": 1.5, "topWidthY": 1.5, "panels": 3, "bracing": "x",
                  "sections": { "leg": "L90x8", "diagonal": "L50x5", "horizontal": "L50x5" } } ],
              "loads": { "wind": { "method": "en1991", "basicSpeed": 26.0, "terrain": "II" }, "sweepStep": 30 },
              "checks": { "method": "en1993" } }
            """;

    /**
     * A CSV manifest of a small tower, a broken one (negative height), a taller one, a copy of the
     * first (analysed once), a file that is no JSON and a missing file; two rows with a wind speed
     * parameter; a scenario patch and a patch that is no JSON.
     */
    private static List<Path> fleet(Path dir) throws IOException {
        Path towers = Files.createDirectories(dir.resolve("towers"));
        Files.writeString(towers.resolve("a-small.json"), SMALL.formatted("24.0"));
        Files.writeString(towers.resolve("b-broken.json"), SMALL.formatted("24.0").replace("\"height\": 6.0",
                "\"height\": -6.0"));
        Files.writeString(towers.resolve("c-taller.json"), TALLER);
        Files.writeString(towers.resolve("d-copy.json"), SMALL.formatted("24.0"));
        Files.writeString(towers.resolve("e-garbled.json"), "{ \"name\": \"garbled\",\n  \"base\": \n");
        Path csv = dir.resolve("fleet.csv");
        Files.writeString(csv, """
                model,loads.wind.basicSpeed
                towers/a-small.json,28
                towers/b-broken.json,
                towers/c-taller.json,30
                towers/d-copy.json,
                towers/e-garbled.json,
                towers/f-missing.json,
                """);
        Path wind = dir.resolve("wind34.json");
        Files.writeString(wind, "{ \"loads\": { \"wind\": { \"basicSpeed\": 34.0 } } }\n");
        Path typo = dir.resolve("typo.json");
        Files.writeString(typo, "{\n  \"loads\": { \"wind\": \n}\n");
        return List.of(csv, wind, typo);
    }

    @Test
    void sparkJobWritesThePlainBatchsSummary(@TempDir Path dir) throws Exception {
        List<Path> files = fleet(dir);
        Path csv = files.get(0);
        List<Path> patches = files.subList(1, 3);

        // the plain batch, as a user runs it
        Path plainOut = dir.resolve("plain");
        StringWriter err = new StringWriter();
        int code = Main.commandLine(new StringWriter(), err).execute("batch", csv.toString(), "-o", plainOut.toString(),
                "--scenario", patches.get(0).toString(), "--scenario", patches.get(1).toString(), "--threads", "2",
                "--quiet");
        assertEquals(0, code, err.toString());
        // the plain batch in-process, for its rows at full precision
        Path inProcess = dir.resolve("in-process");
        String program = new Version().getVersion()[0];
        List<SummaryRow> expected;
        try (RunFolder folder = RunFolder.open(inProcess, false, csv, program)) {
            expected = FleetRun.run(Manifest.read(csv), Scenario.fromFiles(patches), folder, 2, false, program,
                    (model, report, link) -> TowerAnalysis.outcome(model, FleetPlan.shown(inProcess, model)),
                    ProgressListener.NONE);
        }

        Path sparkOut = dir.resolve("spark");
        List<SummaryRow> returned = FleetJob.run(spark, csv, patches, sparkOut);
        assertEquals(expected, returned);

        assertArrayEquals(Files.readAllBytes(plainOut.resolve("summary.csv")),
                Files.readAllBytes(sparkOut.resolve("summary.csv")), "summary.csv byte for byte");
        Path parquet = sparkOut.resolve("summary.parquet");
        assertTrue(Files.isRegularFile(parquet), "summary.parquet is one file");
        assertFalse(Files.exists(sparkOut.resolve("summary.parquet.spark")), "Spark's staging folder is gone");
        assertTrue(Files.readString(sparkOut.resolve("summary.html")).contains("qualified engineer"));

        // 6 towers × (base, wind34, typo) and 2 parameter rows, in manifest order
        List<Row> read = spark.read().parquet(parquet.toUri().toString()).collectAsList();
        assertEquals(20, expected.size());
        assertEquals(expected.size(), read.size());
        for (int k = 0; k < expected.size(); k++) {
            assertEquals(columns(expected.get(k)), cells(read.get(k)), "row " + k);
        }
        // the plain batch's own summary.parquet (our writer), read by Spark, holds the same rows
        List<Row> plain = spark.read().parquet(plainOut.resolve("summary.parquet").toUri().toString()).collectAsList();
        assertEquals(spark.read().parquet(parquet.toUri().toString()).schema(),
                spark.read().parquet(plainOut.resolve("summary.parquet").toUri().toString()).schema());
        assertEquals(read.size(), plain.size());
        for (int k = 0; k < read.size(); k++) {
            assertEquals(cells(read.get(k)), cells(plain.get(k)), "row " + k + " of the plain batch's summary.parquet");
        }
        // every kind of row is there: analysed, broken model, unreadable model, missing file, bad patch
        List<String> statuses = expected.stream().map(r -> r.model() + " " + r.scenario() + " " + r.outcome().status())
                .toList();
        assertTrue(statuses.contains("towers/a-small.json parameters passes")
                || statuses.contains("towers/a-small.json parameters fails"), statuses.toString());
        assertTrue(statuses.contains("towers/b-broken.json base bad input"), statuses.toString());
        assertTrue(statuses.contains("towers/e-garbled.json wind34 bad input"), statuses.toString());
        assertTrue(statuses.contains("towers/f-missing.json base bad input"), statuses.toString());
        assertTrue(statuses.contains("towers/c-taller.json typo bad input"), statuses.toString());
        assertEquals(expected.get(0).outcome(), expected.get(expected.size() - 9).outcome(),
                "the copy of a-small (d-copy base) has its figures");
    }

    /** The summary's values as the plain batch has them, in the order of the Parquet schema; forces in kN. */
    private static List<Object> columns(SummaryRow r) {
        Outcome o = r.outcome();
        Figures f = o.figures();
        List<Object> c = new ArrayList<>(List.of(r.model(), r.scenario(), o.status(), o.exitCode(), o.message()));
        if (f == null) {
            c.addAll(Arrays.asList(new Object[10]));
        } else {
            c.addAll(Arrays.asList(f.maxUtilisation(), f.member(), f.role(), f.azimuthDeg(), f.requirementBreaches(),
                    f.footingUtilisation(), f.legCompression() / 1000, f.legUplift() / 1000, f.steelMass(),
                    f.serviceability()));
        }
        c.add(r.changeFromBase());
        c.add(o.report() == null ? null : o.report() + "/report.html");
        return c;
    }

    private static List<Object> cells(Row row) {
        List<Object> c = new ArrayList<>();
        for (int k = 0; k < row.size(); k++) {
            c.add(row.get(k));
        }
        return c;
    }

    /**
     * The Parquet file's own schema, read with parquet-java's reader: the names, types and
     * required columns that issue 17 fixes for summary.parquet (the plain batch's schema).
     */
    @Test
    void parquetSchemaIsThePlainBatchs(@TempDir Path dir) throws Exception {
        List<Path> files = fleet(dir);
        Path out = dir.resolve("spark");
        FleetJob.run(spark, files.get(0), List.of(files.get(1)), out);
        List<String> want = List.of(
                "model string required", "scenario string required", "status string required",
                "exit_code int32 required", "message string required", "max_utilisation double optional",
                "member int32 optional", "role string optional", "governing_azimuth_deg double optional",
                "requirement_breaches int32 optional", "max_footing_utilisation double optional",
                "leg_compression_kN double optional", "leg_uplift_kN double optional", "steel_mass_kg double optional",
                "serviceability string optional", "max_utilisation_change_from_base double optional",
                "report string optional");
        List<String> got = new ArrayList<>();
        try (ParquetFileReader reader = ParquetFileReader.open(new LocalInputFile(out.resolve("summary.parquet")))) {
            for (Type t : reader.getFooter().getFileMetaData().getSchema().getFields()) {
                PrimitiveType p = t.asPrimitiveType();
                String type = p.getPrimitiveTypeName() == PrimitiveType.PrimitiveTypeName.BINARY
                        && LogicalTypeAnnotation.stringType().equals(p.getLogicalTypeAnnotation()) ? "string"
                        : p.getPrimitiveTypeName().name().toLowerCase(java.util.Locale.ROOT);
                got.add(t.getName() + " " + type + " " + t.getRepetition().name().toLowerCase(java.util.Locale.ROOT));
            }
        }
        assertEquals(want, got);
    }

    /** Bad input to the job is one line and exit code 2, before any Spark work. */
    @Test
    void badInputIsOneLineWithExitCodeTwo(@TempDir Path dir) throws IOException {
        StringWriter err = new StringWriter();
        int code = FleetJob.execute(new PrintWriter(new StringWriter()), new PrintWriter(err, true),
                dir.resolve("nowhere").toString(), "-o", dir.resolve("out").toString());
        assertEquals(2, code, err.toString());
        assertEquals(1, err.toString().lines().count(), err.toString());
        assertTrue(err.toString().startsWith("error: $: cannot read the manifest"), err.toString());

        List<Path> files = fleet(dir);
        Files.writeString(Files.createDirectories(dir.resolve("taken")).resolve("notes.txt"), "mine");
        StringWriter refused = new StringWriter();
        assertEquals(2, FleetJob.execute(new PrintWriter(new StringWriter()), new PrintWriter(refused, true),
                files.get(0).toString(), "-o", dir.resolve("taken").toString()));
        assertTrue(refused.toString().contains("holds files that no batch run wrote"), refused.toString());
    }
}
