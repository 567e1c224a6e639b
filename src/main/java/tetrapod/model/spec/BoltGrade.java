package tetrapod.model.spec;

import java.util.List;

/** Property class of a bolt or anchor rod (ISO 898-1), by the name the model file uses. */
public enum BoltGrade {
    G4_6("4.6"), G5_6("5.6"), G8_8("8.8"), G10_9("10.9");

    private final String jsonName;

    BoltGrade(String jsonName) {
        this.jsonName = jsonName;
    }

    public String jsonName() {
        return jsonName;
    }

    public static List<String> names() {
        return List.of(values()).stream().map(BoltGrade::jsonName).toList();
    }
}
