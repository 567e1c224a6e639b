package tetrapod.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * A generated fleet for the batch benchmarks: the bundled towers of models/ (square, K-braced,
 * rectangular) in turn, each copy at its own wind speed (0.85 to 1.15 times the bundled one, in
 * steps of 0.01 m/s or more), so that no two share a hash. Run as a program to write a fleet for
 * {@code tetrapod batch}: {@code GeneratedFleet MODELS_DIR OUT_DIR TOWERS}.
 */
final class GeneratedFleet {

    static final List<String> KINDS = List.of("ridge-lookout-square.json", "hilltop-relay-k.json",
            "harbour-beacon-rectangular.json");

    private GeneratedFleet() { }

    public static void main(String[] args) throws IOException {
        List<Path> written = write(Path.of(args[0]), Path.of(args[1]), Integer.parseInt(args[2]));
        System.out.println(written.size() + " towers written to " + args[1]);
    }

    /** Writes {@code towers} model files into {@code into}; returns them in name order. */
    @SuppressWarnings("unchecked")
    static List<Path> write(Path models, Path into, int towers) throws IOException {
        ObjectMapper json = new ObjectMapper();
        Files.createDirectories(into);
        List<Path> files = new ArrayList<>();
        for (int k = 0; k < towers; k++) {
            String kind = KINDS.get(k % KINDS.size());
            Map<String, Object> model = json.readValue(models.resolve(kind).toFile(), LinkedHashMap.class);
            Map<String, Object> wind = (Map<String, Object>) ((Map<String, Object>) model.get("loads")).get("wind");
            String key = wind.containsKey("basicSpeed") ? "basicSpeed" : "speed"; // EN 1991-1-4 v_b,0; ASCE 7 V
            double bundled = ((Number) wind.get(key)).doubleValue();
            double speed = Math.round(bundled * (0.85 + 0.30 * k / towers) * 100) / 100.0;
            wind.put(key, speed);
            model.put("name", model.get("name") + String.format(Locale.ROOT, " #%d at %.2f m/s", k, speed));
            Path file = into.resolve(String.format(Locale.ROOT, "t%05d-%s", k, kind));
            json.writerWithDefaultPrettyPrinter().writeValue(file.toFile(), model);
            files.add(file);
        }
        return files;
    }
}
