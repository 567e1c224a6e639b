package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Text cells that a spreadsheet would run as formulas get OWASP's leading apostrophe; numbers stay numbers. */
class CsvTextTest {

    @Test
    void formulaStartsGetAnApostrophe() {
        for (String formula : List.of("=1+1", "+41 22", "-2+3", "@SUM(A1)", "\t=1", "\r=1", "  =HYPERLINK(\"x\")",
                "\u2212 5", "\uFF1D1")) {
            assertEquals("'" + formula, CsvText.cell(formula), formula);
        }
    }

    @Test
    void otherTextIsUnchanged() {
        for (String text : List.of("L90x8", "ULS wind", "EN 1993-1-1 6.3.1", "a=b", "1-2", "")) {
            assertEquals(text, CsvText.cell(text), text);
        }
        assertEquals("", CsvText.cell(null));
    }

    @Test
    void sectionNamesThatLookLikeFormulasAreTextButForcesStayNumbers(@TempDir Path dir) throws IOException {
        String model = Files.readString(Path.of("models/benchmark-25-bar-space-truss.json"))
                .replace("\"A1\"", "\"=SUM(1+1)\"").replace("\"A2\"", "\"-2+3\"").replace("\"A3\"", "\"@cmd\"")
                .replace("\"A4\"", "\"+x\"");
        Path file = dir.resolve("formulas.json");
        Files.writeString(file, model);
        ExampleRuns.Run run = ExampleRuns.analyze(file, dir.resolve("out"));
        assertEquals(0, run.exitCode(), run.err());
        int negatives = 0;
        try (Reader in = Files.newBufferedReader(dir.resolve("out").resolve(CsvTables.MEMBERS));
             CSVParser parser = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get().parse(in)) {
            for (CSVRecord r : parser.getRecords()) {
                String section = r.get("section");
                int member = Integer.parseInt(r.get("member"));
                String expected = switch (member) {
                    case 1 -> "'=SUM(1+1)";
                    case 2, 3, 4, 5 -> "'-2+3";
                    case 6, 7, 8, 9 -> "'@cmd";
                    case 10, 11 -> "'+x";
                    case 12, 13 -> "A5";
                    case 14, 15, 16, 17 -> "A6";
                    case 18, 19, 20, 21 -> "A7";
                    default -> "A8";
                };
                assertEquals(expected, section, "member " + member);
                String nMin = r.get("N_min_kN");
                assertFalse(nMin.startsWith("'"), nMin);
                if (Double.parseDouble(nMin) < 0) {
                    negatives++;
                }
            }
        }
        assertTrue(negatives > 0, "some member is in compression, so a negative number was written as a number");
    }
}
