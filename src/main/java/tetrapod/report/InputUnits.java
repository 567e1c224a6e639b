package tetrapod.report;

import java.util.Map;

/** The unit of each key of the model file, as docs/tower-spec.schema.json gives it; "" for none. */
final class InputUnits {

    private static final Map<String, String> UNITS = Map.ofEntries(
            Map.entry("widthX", "m"), Map.entry("widthY", "m"), Map.entry("height", "m"), Map.entry("depth", "m"),
            Map.entry("topWidthX", "m"), Map.entry("topWidthY", "m"), Map.entry("panelHeights", "m"),
            Map.entry("planBracingLevels", "m"), Map.entry("from", "m"), Map.entry("to", "m"),
            Map.entry("width", "m"), Map.entry("area", "m²"), Map.entry("x", "m"), Map.entry("y", "m"),
            Map.entry("z", "m"), Map.entry("E", "MPa"), Map.entry("G", "MPa"), Map.entry("fy", "MPa"),
            Map.entry("fu", "MPa"), Map.entry("density", "kg/m³"), Map.entry("airDensity", "kg/m³"),
            Map.entry("basicSpeed", "m/s"), Map.entry("speed", "m/s"), Map.entry("windSpeed", "m/s"),
            Map.entry("pressure", "kPa"), Map.entry("windPressure", "kPa"), Map.entry("allowableBearing", "kPa"),
            Map.entry("allowableTension", "MPa"), Map.entry("allowableShear", "MPa"),
            Map.entry("concreteUnitWeight", "kN/m³"), Map.entry("soilUnitWeight", "kN/m³"),
            Map.entry("frustumHalfAngle", "degrees"), Map.entry("sweepStep", "degrees"),
            Map.entry("F", "kN, kN·m"));

    private InputUnits() { }

    static String of(String key) {
        if (key.endsWith("_mm")) {
            return "mm";
        }
        if (key.endsWith("_cm2")) {
            return "cm²";
        }
        if (key.endsWith("_cm4")) {
            return "cm⁴";
        }
        if (key.equals("mass_kg_per_m")) {
            return "kg/m";
        }
        return UNITS.getOrDefault(key, "");
    }
}
