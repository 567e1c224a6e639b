package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tetrapod.batch.RunFolder;
import tetrapod.io.ParquetRows;
import tetrapod.io.PlainJson;

class BatchCommandTest {

    /** An invented small tower, quick to analyse. */
    static final String SMALL = """
            { "name": "small batch tower",
              "base": { "widthX": 3.0, "widthY": 3.0 },
              "segments": [ { "height": 6.0, "topWidthX": 2.0, "topWidthY": 2.0, "panels": 2, "bracing": "x",
                  "sections": { "leg": "L100x10", "diagonal": "L60x6", "horizontal": "L60x6" } } ],
              "loads": { "wind": { "method": "en1991", "basicSpeed": 24.0, "terrain": "II" }, "sweepStep": 30 },
              "checks": { "method": "en1993" } }
            """;
    static final String STRONGER_WIND = "{ \"loads\": { \"wind\": { \"basicSpeed\": 34.0 } } }\n";

    private static List<CSVRecord> summary(Path dir) throws IOException {
        return CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(Files.readString(dir.resolve("summary.csv")))).getRecords();
    }

    private static Path fleet(Path dir) throws IOException {
        Path towers = Files.createDirectories(dir.resolve("towers"));
        Files.writeString(towers.resolve("a-small.json"), SMALL);
        Files.writeString(towers.resolve("b-broken.json"), SMALL.replace("\"height\": 6.0", "\"height\": -6.0"));
        Files.writeString(dir.resolve("wind34.json"), STRONGER_WIND);
        Files.writeString(dir.resolve("typo.json"), "{\n  \"loads\": { \"wind\": \n}\n");
        return towers;
    }

    /** Every tower × scenario is a row; a bad model and a bad patch are rows with exit class 2 and their location. */
    @Test
    void badModelsAndPatchesAreRowsAndTheRunGoesOn(@TempDir Path dir) throws IOException {
        Path towers = fleet(dir);
        Path out = dir.resolve("run");
        CliRun run = CliRun.of("batch", towers.toString(), "-o", out.toString(), "--scenario",
                dir.resolve("wind34.json").toString(), "--scenario", dir.resolve("typo.json").toString(), "--threads", "2");
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        assertTrue(run.out().contains("qualified engineer"), run.out());
        List<CSVRecord> rows = summary(out);
        assertEquals(6, rows.size(), "2 towers × (base, wind34, typo)");
        assertEquals(List.of("base", "wind34", "typo", "base", "wind34", "typo"),
                rows.stream().map(r -> r.get("scenario")).toList());
        CSVRecord base = rows.get(0);
        assertEquals("0", base.get("exit_code"), base.get("message"));
        assertEquals("0.000", base.get("max_utilisation_change_from_base"));
        // a stronger wind makes the largest utilisation larger
        assertTrue(Double.parseDouble(rows.get(1).get("max_utilisation_change_from_base")) > 0, rows.get(1).toString());
        CSVRecord typo = rows.get(2);
        assertEquals("2", typo.get("exit_code"));
        assertEquals("bad input", typo.get("status"));
        assertTrue(typo.get("message").contains("typo.json") && typo.get("message").contains("(line 3)"), typo.get("message"));
        CSVRecord broken = rows.get(3);
        assertEquals("2", broken.get("exit_code"));
        assertTrue(broken.get("message").contains("b-broken.json: segments[0].height")
                && broken.get("message").contains("(line 3)"), broken.get("message"));
        // the patched broken model: its own file, the same path and line
        assertTrue(rows.get(4).get("message").contains("wind34") && rows.get(4).get("message").contains("segments[0].height"),
                rows.get(4).get("message"));
        String html = Files.readString(out.resolve("summary.html"));
        assertTrue(html.contains("<svg") && html.contains("qualified engineer") && html.contains("Not analysed"));
        assertFalse(html.contains("NaN") || Files.readString(out.resolve("summary.csv")).contains("NaN"));
        assertParquetHoldsTheCsvRows(out);
    }

    /**
     * summary.parquet, read with Apache parquet-java, has the rows of summary.csv in the same order:
     * equal text and integers, nulls where the CSV cell is empty, doubles that round to the CSV's digits.
     */
    private static void assertParquetHoldsTheCsvRows(Path out) throws IOException {
        List<CSVRecord> csv = summary(out);
        List<List<Object>> parquet = ParquetRows.read(out.resolve("summary.parquet"));
        assertEquals(csv.size(), parquet.size());
        for (int r = 0; r < csv.size(); r++) {
            List<String> cells = csv.get(r).toList();
            List<Object> values = parquet.get(r);
            assertEquals(cells.size(), values.size());
            for (int c = 0; c < cells.size(); c++) {
                String cell = cells.get(c);
                Object value = values.get(c);
                String where = "row " + r + " column " + c + ": " + cell + " / " + value;
                if (value instanceof Double d) {
                    int decimals = cell.length() - cell.indexOf('.') - 1;
                    assertEquals(Double.parseDouble(cell), d, 0.5 * Math.pow(10, -decimals) + 1e-12, where);
                } else {
                    assertEquals(cell, value == null ? "" : value.toString(), where);
                }
            }
        }
    }

    /** Two runs on one folder: the second is refused with one line naming the owner, as analyze refuses it. */
    @Test
    void aSecondRunOnAFolderInUseIsRefused(@TempDir Path dir) throws Exception {
        Path towers = fleet(dir);
        Path out = dir.resolve("run");
        try (RunFolder first = RunFolder.open(out, false, towers, "tetrapod test")) {
            CliRun second = CliRun.of("batch", towers.toString(), "-o", out.toString(), "--resume");
            assertEquals(ExitCode.OUTPUT_FAILED, second.exitCode(), second.err());
            assertEquals(1, second.err().lines().count(), second.err());
            assertTrue(second.err().contains("in use by another tetrapod run (process " + ProcessHandle.current().pid()),
                    second.err());
            assertFalse(Files.exists(out.resolve("summary.csv")));
        }
        CliRun after = CliRun.of("batch", towers.toString(), "-o", out.toString(), "--resume");
        assertEquals(ExitCode.DONE, after.exitCode(), after.err());
        assertTrue(after.out().contains("summary.parquet"), after.out());
    }

    /**
     * The summary's numbers are those of analyze's own results.json, read independently here; the
     * patched model's results.json is byte for byte what analyze writes for the patched file.
     */
    @Test
    void patchedAnalysisIsAnalyzesByteForByte(@TempDir Path dir) throws IOException, Exception {
        fleet(dir);
        Path towers = Files.createDirectories(dir.resolve("one"));
        Files.copy(dir.resolve("towers/a-small.json"), towers.resolve("a-small.json"));
        Path out = dir.resolve("run");
        CliRun run = CliRun.of("batch", towers.toString(), "-o", out.toString(), "--reports", "--scenario",
                dir.resolve("wind34.json").toString());
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        Path patched = out.resolve("scenarios/wind34/a-small.json");
        Path alone = dir.resolve("alone");
        assertEquals(ExitCode.DONE, CliRun.of("analyze", patched.toString(), "-o", alone.toString()).exitCode());
        assertArrayEquals(Files.readAllBytes(alone.resolve("results.json")),
                Files.readAllBytes(out.resolve("reports/a-small/wind34/results.json")));
        assertTrue(Files.exists(out.resolve("reports/a-small/base/report.html")));

        @SuppressWarnings("unchecked")
        Map<String, Object> results = (Map<String, Object>) PlainJson.read(alone.resolve("results.json"));
        double u = 0;
        for (Object c : (List<?>) results.get("checks")) {
            u = Math.max(u, ((Number) ((Map<?, ?>) c).get("utilisation")).doubleValue());
        }
        double compression = 0;
        for (Object l : (List<?>) results.get("legBases")) {
            Map<?, ?> peak = (Map<?, ?>) ((Map<?, ?>) l).get("maxCompression");
            compression = Math.max(compression, ((Number) peak.get("value")).doubleValue());
        }
        CSVRecord row = summary(out).get(1);
        assertEquals("wind34", row.get("scenario"));
        assertEquals(u, Double.parseDouble(row.get("max_utilisation")), 0.0005);
        assertEquals(compression / 1000, Double.parseDouble(row.get("leg_compression_kN")), 0.05);
        assertEquals("reports/a-small/wind34/report.html", row.get("report"));
        assertTrue(Files.readString(out.resolve("summary.html")).contains("href=\"reports/a-small/wind34/report.html\""));
    }

    /**
     * A folder of another run is refused without --resume; with it, recorded work is not redone (a
     * record altered by hand shows through), and the summary does not depend on the thread count.
     */
    @Test
    void resumeSkipsFinishedWorkAndThreadsDoNotChangeTheSummary(@TempDir Path dir) throws IOException {
        Path towers = fleet(dir);
        Path out = dir.resolve("run");
        String wind = dir.resolve("wind34.json").toString();
        assertEquals(ExitCode.DONE, CliRun.of("batch", towers.toString(), "-o", out.toString(), "--scenario", wind,
                "--threads", "1").exitCode());
        byte[] oneThread = Files.readAllBytes(out.resolve("summary.csv"));

        CliRun refused = CliRun.of("batch", towers.toString(), "-o", out.toString(), "--scenario", wind);
        assertEquals(ExitCode.BAD_INPUT, refused.exitCode());
        assertTrue(refused.err().contains("holds the results of an earlier batch run: choose a new folder with -o, or finish that run"
                + " with 'tetrapod batch ... --resume'"), refused.err());
        assertEquals(1, refused.err().lines().count(), refused.err());

        Path other = dir.resolve("other");
        assertEquals(ExitCode.DONE, CliRun.of("batch", towers.toString(), "-o", other.toString(), "--scenario", wind,
                "--threads", "2").exitCode());
        assertArrayEquals(oneThread, Files.readAllBytes(other.resolve("summary.csv")));

        List<Path> records;
        try (Stream<Path> s = Files.list(out.resolve("work"))) {
            records = s.toList();
        }
        assertEquals(4, records.size(), "2 analyses and 2 bad inputs recorded (the unreadable base is not hashed)");
        for (Path r : records) {
            Files.writeString(r, Files.readString(r).replaceAll("\"maxUtilisation\": [0-9.Ee-]+", "\"maxUtilisation\": 9.5"));
        }
        CliRun resumed = CliRun.of("batch", towers.toString(), "-o", out.toString(), "--scenario", wind, "--resume");
        assertEquals(ExitCode.DONE, resumed.exitCode(), resumed.err());
        assertEquals("9.500", summary(out).get(0).get("max_utilisation"), "taken from the record, not analysed again");
    }

    /**
     * A CSV manifest: paths relative to it, a parameter column as one more scenario, a missing file a
     * bad-input row, an unstable tower an exit-3 row.
     */
    @Test
    void csvManifestWithParametersAndAMissingModel(@TempDir Path dir) throws IOException {
        fleet(dir);
        Path csv = dir.resolve("fleet.csv");
        Path unstable = Path.of("src/test/resources/load-path/one-face-braced-truss.json").toAbsolutePath();
        Files.writeString(csv, "model,loads.wind.basicSpeed\ntowers/a-small.json,30\ntowers/missing.json,\n"
                + unstable + ",\n");
        Path out = dir.resolve("run");
        CliRun run = CliRun.of("batch", csv.toString(), "-o", out.toString());
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        List<CSVRecord> rows = summary(out);
        assertEquals(List.of("base", "parameters", "base", "base"), rows.stream().map(r -> r.get("scenario")).toList());
        assertEquals("towers/a-small.json", rows.get(0).get("model"));
        assertTrue(Files.readString(out.resolve("scenarios/parameters/a-small.json")).contains("\"basicSpeed\": 30"));
        assertEquals("2", rows.get(2).get("exit_code"));
        assertTrue(rows.get(2).get("message").contains("missing.json") && rows.get(2).get("message").contains("no such file"),
                rows.get(2).get("message"));
        // LostLoadCommandTest's tower: analyze ends it with exit 3, so the batch row has exit class 3 and the free node
        assertEquals("3", rows.get(3).get("exit_code"), rows.get(3).get("message"));
        assertEquals("unstable", rows.get(3).get("status"));
        assertTrue(rows.get(3).get("message").contains("one-face-braced-truss.json: ") && rows.get(3).get("message")
                .contains("node"), rows.get(3).get("message"));
    }

    @Test
    void aFolderWithOtherFilesIsRefused(@TempDir Path dir) throws IOException {
        Path towers = fleet(dir);
        Path out = Files.createDirectories(dir.resolve("busy"));
        Files.writeString(out.resolve("notes.txt"), "mine");
        CliRun run = CliRun.of("batch", towers.toString(), "-o", out.toString(), "--resume");
        assertEquals(ExitCode.BAD_INPUT, run.exitCode());
        assertTrue(run.err().contains("holds files that no batch run wrote"), run.err());
    }
}
