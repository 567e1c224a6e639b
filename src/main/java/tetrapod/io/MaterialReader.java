package tetrapod.io;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import tetrapod.model.spec.MaterialSpec;

/** Reads {@code material}: a grade name, or a material given in full (MPa, kg/m³). */
final class MaterialReader {

    static final String DEFAULT_GRADE = "S355";
    static final List<String> KEYS = List.of("name", "E", "G", "fy", "fu", "density");

    private MaterialReader() { }

    /** The material, or null (reported). */
    static MaterialSpec read(JsonNode node, String path, Problems problems) {
        if (node.isTextual()) {
            String grade = Values.text(node, path, problems);
            return grade == null ? null : MaterialSpec.grade(grade);
        }
        if (!node.isObject()) {
            problems.add(path, "must be a grade name such as \"" + DEFAULT_GRADE
                    + "\" or an object { name, E, G, fy, fu, density }, was " + Numbers.shown(node));
            return null;
        }
        Fields f = Fields.of(node, path, problems);
        int before = problems.count();
        f.allowOnly(KEYS);
        String name = f.requiredText("name");
        double e = f.requiredNumber("E", PhysicalLimits.YOUNGS_MODULUS, "MPa");
        double g = f.requiredNumber("G", PhysicalLimits.SHEAR_MODULUS, "MPa");
        double fy = f.requiredNumber("fy", PhysicalLimits.STRENGTH, "MPa");
        double fu = f.requiredNumber("fu", PhysicalLimits.STRENGTH, "MPa");
        double density = f.requiredNumber("density", PhysicalLimits.DENSITY, "kg/m³");
        double poisson = e / (2 * g) - 1;
        if (poisson < PhysicalLimits.MIN_POISSON || poisson > PhysicalLimits.MAX_POISSON) {
            // isotropic elasticity: G = E / 2(1 + ν), and 0 ≤ ν ≤ 0.5 for a metal
            problems.add(f.path("G"), "gives Poisson's ratio E/2G − 1 = " + Numbers.format(Math.round(poisson * 1000) / 1000.0)
                    + " with E = " + Numbers.format(e) + " MPa; G must lie from E/3 to E/2 ("
                    + Numbers.format(Math.round(e / 3)) + " to " + Numbers.format(Math.round(e / 2)) + " MPa)");
        }
        if (fu < fy) {
            problems.add(f.path("fu"), "must not be less than fy (" + Numbers.format(fy) + " MPa), was " + Numbers.format(fu));
        }
        return problems.count() == before ? new MaterialSpec(name, e, g, fy, fu, density) : null;
    }
}
