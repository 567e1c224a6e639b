package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * members.csv, reactions.csv, wind.csv and serviceability.csv read back with Commons CSV (RFC 4180) hold the figures of
 * results.json (read with Jackson), to the decimals the tables write.
 */
class CsvTablesTest {

    /** Half a unit of the last decimal the tables write: kN to 3 decimals, so 0.5 N. */
    private static final double HALF_NEWTON = 0.5 + 1e-9;
    private static final double HALF_UTILISATION_STEP = 0.5e-4 + 1e-12;

    static Stream<Path> models() throws IOException {
        return ExampleRuns.models();
    }

    private static List<CSVRecord> read(Path file, List<String> header) throws IOException {
        String text = Files.readString(file, StandardCharsets.UTF_8);
        assertTrue(text.endsWith("\r\n"), file + ": RFC 4180 lines end with CRLF");
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8);
             CSVParser parser = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get().parse(in)) {
            assertEquals(header, parser.getHeaderNames(), file + ": header row");
            List<CSVRecord> records = parser.getRecords();
            for (CSVRecord r : records) {
                assertTrue(r.isConsistent(), file + ": record " + r.getRecordNumber() + " has the wrong number of fields");
            }
            return records;
        }
    }

    private static double kN(CSVRecord r, String column) {
        return Double.parseDouble(r.get(column)) * 1e3;
    }

    /** The azimuth as the tables write it: a number, or empty for a case without wind. */
    private static void assertAzimuth(JsonNode azimuthDeg, String cell, String what) {
        if (azimuthDeg.isNull()) {
            assertEquals("", cell, what);
        } else {
            assertEquals(azimuthDeg.asDouble(), Double.parseDouble(cell), 1e-9, what);
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void membersCsvHoldsEveryMembersFiguresFromResultsJson(Path model) throws IOException {
        JsonNode results = ExampleRuns.results(model);
        List<CSVRecord> rows = read(ExampleRuns.folder(model).resolve("members.csv"), CsvTables.MEMBER_HEADER);
        JsonNode checks = results.get("checks");
        assertEquals(checks.size(), rows.size(), "one row per member");
        Map<String, String> combinationOf = new HashMap<>();
        results.get("cases").forEach(c -> combinationOf.put(c.get("id").asText(), c.get("combination").asText()));
        Map<Integer, JsonNode> members = new HashMap<>();
        results.get("model").get("members").forEach(m -> members.put(m.get("id").asInt(), m));
        for (int k = 0; k < rows.size(); k++) {
            CSVRecord row = rows.get(k);
            JsonNode check = checks.get(k);
            String at = model + " member " + check.get("member").asInt();
            assertEquals(check.get("member").asInt(), Integer.parseInt(row.get("member")), at);
            JsonNode member = members.get(check.get("member").asInt());
            assertEquals(member.get("role").asText(), row.get("role"), at);
            assertEquals(member.get("section").asText(), row.get("section"), at);
            assertEquals(member.get("segment").asInt(), Integer.parseInt(row.get("segment")), at);
            assertEquals(check.get("maxTension").get("value").asDouble(), kN(row, "N_max_kN"), HALF_NEWTON, at);
            assertEquals(-check.get("maxCompression").get("value").asDouble(), kN(row, "N_min_kN"), HALF_NEWTON, at);
            assertEquals(check.get("utilisation").asDouble(), Double.parseDouble(row.get("utilisation")),
                    HALF_UTILISATION_STEP, at);
            assertEquals(check.get("mode").asText(), row.get("mode"), at);
            assertEquals(check.get("clause").asText(), row.get("clause"), at + ": clause (often with commas) round-trips");
            assertEquals(check.get("note").asText(), row.get("note"), at);
            assertEquals(check.get("case").asText(), row.get("governing_case"), at);
            // a member's governing case need not be solved in full; its id is combination@azimuth
            String governing = check.get("case").asText();
            String byId = governing.contains("@") ? governing.substring(0, governing.lastIndexOf('@')) : governing;
            assertEquals(combinationOf.getOrDefault(governing, byId),
                    row.get("governing_combination"), at);
            assertAzimuth(check.get("azimuthDeg"), row.get("governing_azimuth_deg"), at);
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void reactionsCsvHoldsEveryLegBasesExtremes(Path model) throws IOException {
        JsonNode results = ExampleRuns.results(model);
        List<CSVRecord> rows = read(ExampleRuns.folder(model).resolve("reactions.csv"), CsvTables.REACTION_HEADER);
        JsonNode legs = results.get("legBases");
        assertEquals(legs.size(), rows.size(), "one row per leg base");
        Map<String, String> combinationOf = new HashMap<>();
        results.get("cases").forEach(c -> combinationOf.put(c.get("id").asText(), c.get("combination").asText()));
        for (int k = 0; k < rows.size(); k++) {
            CSVRecord row = rows.get(k);
            JsonNode leg = legs.get(k);
            String at = model + " node " + leg.get("node").asInt();
            assertEquals(leg.get("node").asInt(), Integer.parseInt(row.get("node")), at);
            String[] json = {"maxCompression", "maxUplift", "maxShear"};
            String[] csv = {"compression", "uplift", "shear"};
            for (int q = 0; q < 3; q++) {
                JsonNode peak = leg.get(json[q]);
                if (peak.get("case").isNull()) {
                    assertEquals("", row.get(csv[q] + "_max_kN"), at + " " + csv[q] + " never occurs");
                    continue;
                }
                assertEquals(peak.get("value").asDouble(), kN(row, csv[q] + "_max_kN"), HALF_NEWTON, at + " " + csv[q]);
                assertEquals(combinationOf.get(peak.get("case").asText()), row.get(csv[q] + "_combination"), at);
                assertAzimuth(peak.get("azimuthDeg"), row.get(csv[q] + "_azimuth_deg"), at);
            }
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void windCsvHoldsEveryPanelAtEveryReportedAzimuth(Path model) throws IOException {
        JsonNode results = ExampleRuns.results(model);
        List<CSVRecord> rows = read(ExampleRuns.folder(model).resolve("wind.csv"), CsvTables.WIND_HEADER);
        int k = 0;
        for (JsonNode azimuth : results.get("wind")) {
            for (JsonNode panel : azimuth.get("panels")) {
                CSVRecord row = rows.get(k++);
                String at = model + " panel " + panel.get("panel").asInt() + " at " + azimuth.get("azimuthDeg");
                assertEquals(azimuth.get("azimuthDeg").asDouble(), Double.parseDouble(row.get("azimuth_deg")), 1e-9, at);
                assertEquals(panel.get("panel").asInt(), Integer.parseInt(row.get("panel")), at);
                assertEquals(panel.get("zRef").asDouble(), Double.parseDouble(row.get("z_ref_m")), 0.5e-4, at);
                assertEquals(panel.get("q").asDouble(), Double.parseDouble(row.get("q_kPa")) * 1e3, 0.5e-2 + 1e-9, at);
                assertEquals(panel.get("cf").asDouble(), Double.parseDouble(row.get("cf")), 0.5e-5 + 1e-12, at);
                assertEquals(panel.get("force").get(0).asDouble(), kN(row, "Fx_kN"), HALF_NEWTON, at);
                assertEquals(panel.get("force").get(1).asDouble(), kN(row, "Fy_kN"), HALF_NEWTON, at);
            }
        }
        assertEquals(k, rows.size(), "one row per panel and reported azimuth");
    }

    /** serviceability.csv: one row per panel level, then per ancillary, sway in mm and rotations in degrees. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void serviceabilityCsvHoldsEveryLevelAndAncillary(Path model) throws IOException {
        JsonNode results = ExampleRuns.results(model);
        List<CSVRecord> rows = read(ExampleRuns.folder(model).resolve("serviceability.csv"), CsvTables.SERVICEABILITY_HEADER);
        JsonNode s = results.get("serviceability");
        if (s.isNull()) {
            assertEquals(0, rows.size(), model + ": an explicit frame has no levels");
            return;
        }
        List<JsonNode> expected = new java.util.ArrayList<>();
        s.get("levels").forEach(expected::add);
        s.get("ancillaries").forEach(expected::add);
        assertEquals(expected.size(), rows.size(), "one row per level and ancillary");
        for (int k = 0; k < rows.size(); k++) {
            CSVRecord row = rows.get(k);
            JsonNode item = expected.get(k);
            boolean level = item.has("level");
            String at = model + " row " + k;
            assertEquals(level ? "level" : item.get("kind").asText(), row.get("kind"), at);
            if (!level) {
                assertEquals(item.get("name").asText(), row.get("name"), at);
            }
            for (String q : List.of("sway", "tilt", "twist")) {
                boolean sway = q.equals("sway");
                double scale = sway ? 1e3 : 180 / Math.PI;
                double half = sway ? 0.5e-3 + 1e-12 : 0.5e-5 + 1e-12;
                String column = sway ? "sway_mm" : q + "_deg";
                assertEquals(item.get(q).get("value").asDouble() * scale, Double.parseDouble(row.get(column)), half, at + " " + q);
                assertAzimuth(item.get(q).get("azimuthDeg"), row.get(q + "_azimuth_deg"), at + " " + q);
                JsonNode limit = item.get("limits").get(q);
                String limitColumn = sway ? "sway_limit_mm" : q + "_limit_deg";
                if (limit.isNull()) {
                    assertEquals("", row.get(limitColumn), at + " " + q + ": no limit");
                    assertEquals("", row.get(q + "_met"), at + " " + q + ": no verdict without a limit");
                } else {
                    assertEquals(limit.asDouble() * scale, Double.parseDouble(row.get(limitColumn)), half, at + " " + q);
                    assertEquals(item.get("met").get(q).asBoolean() ? "yes" : "no", row.get(q + "_met"), at + " " + q);
                }
            }
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void everyNumericColumnNamesItsUnit(Path model) throws IOException {
        List<String> dimensionless = List.of("member", "segment", "panel", "node", "utilisation", "solidity", "cf", "level");
        for (List<String> header : List.of(CsvTables.MEMBER_HEADER, CsvTables.REACTION_HEADER, CsvTables.WIND_HEADER,
                CsvTables.SERVICEABILITY_HEADER)) {
            for (String column : header) {
                boolean numeric = column.matches(".*_(kN|m|m2|kPa|deg|mm)$");
                boolean text = column.endsWith("_case") || column.endsWith("_combination") || column.endsWith("_met")
                        || List.of("role", "face", "section", "mode", "clause", "note", "kind", "name").contains(column);
                assertTrue(numeric || text || dimensionless.contains(column), column + " names no unit");
            }
        }
    }
}
