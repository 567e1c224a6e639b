package tetrapod.model.spec;

/**
 * Either a catalogue grade by name ({@code "S355"}; the other fields NaN) or a material given
 * in full: E, G, fy, fu in MPa and density in kg/m³.
 */
public record MaterialSpec(String name, double e, double g, double fy, double fu, double density) {

    public static MaterialSpec grade(String name) {
        return new MaterialSpec(name, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
    }

    public boolean isGrade() {
        return Double.isNaN(e);
    }
}
