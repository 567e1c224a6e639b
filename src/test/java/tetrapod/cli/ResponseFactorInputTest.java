package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.io.TempDir;

/**
 * Bad values of the wind's response-factor keys (issue 14, bad input): a user's c_s·c_d or G outside
 * (0, 2], a structural damping δ_s outside (0, 0.3], a damping ratio β outside (0, 0.05]: exit 2, one
 * line naming the key with its line in the file, for validate and for analyze alike.
 */
class ResponseFactorInputTest {

    @ParameterizedTest
    @CsvSource(delimiter = ';', value = {
        "models/ridge-lookout-square.json; structuralFactor; 0",
        "models/ridge-lookout-square.json; structuralFactor; 2.5",
        "models/ridge-lookout-square.json; structuralFactor; -1",
        "models/ridge-lookout-square.json; structuralDamping; 0",
        "models/ridge-lookout-square.json; structuralDamping; 0.5",
        "models/harbour-beacon-rectangular.json; gustFactor; 0",
        "models/harbour-beacon-rectangular.json; gustFactor; 2.01",
        "models/harbour-beacon-rectangular.json; dampingRatio; 0.2",
        "models/harbour-beacon-rectangular.json; dampingRatio; -0.01"})
    void aFactorOrDampingOutOfRangeIsExit2WithItsKeyAndLine(String model, String key, String value, @TempDir Path dir)
            throws Exception {
        String text = Files.readString(Path.of(model)).replaceFirst("\"wind\": \\{ ",
                "\"wind\": {\n      \"" + key + "\": " + value + ",\n      ");
        Path file = dir.resolve("model.json");
        Files.writeString(file, text);
        int line = 1 + (int) text.substring(0, text.indexOf("\"" + key + "\"")).chars().filter(c -> c == '\n').count();
        for (String command : new String[] {"validate", "analyze"}) {
            CliRun run = command.equals("validate") ? CliRun.of(command, file.toString())
                    : CliRun.of(command, file.toString(), "-o", dir.resolve("out").toString(), "--quiet");
            assertEquals(ExitCode.BAD_INPUT, run.exitCode(), command + ": " + run.out() + run.err());
            String err = run.err().strip();
            assertEquals(1, err.lines().count(), err);
            assertTrue(err.contains("loads.wind." + key + ": ") && err.contains("(line " + line + ")"), err);
        }
    }
}
