package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.api.Test;

class StageTimesTest {

    @Test
    void everyLineHasItsSecondsInTheSameColumnHoweverLongTheStageName() {
        StageTimes watch = new StageTimes();
        watch.end("read");
        watch.progress("a stage whose name is longer than most", 1, 1);
        watch.end("report");
        StringWriter text = new StringWriter();
        watch.print(new PrintWriter(text, true));
        List<String> lines = text.toString().lines().toList();
        assertEquals(4, lines.size(), text.toString());
        assertTrue(lines.get(1).startsWith("  a stage whose name is longer than most "), lines.get(1));
        for (String line : lines) {
            assertTrue(line.endsWith(" s"), line);
            assertEquals(lines.get(0).length(), line.length(), text.toString());
        }
        assertTrue(lines.get(3).startsWith("  total "), lines.get(3));
    }
}
