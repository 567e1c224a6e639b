package tetrapod.section;

import tetrapod.common.Suggestions;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.common.Units;
import tetrapod.model.Material;
import tetrapod.model.Material.StrengthBand;
import tetrapod.model.spec.MaterialSpec;

/**
 * Structural steel grades by name, and materials given in full.
 *
 * <p>EN 10025-2 grades S235, S275, S355 and S460, with any quality suffix (JR, J0, J2, K2) and
 * delivery condition (+N, +AR): yield strength fy by the bands of nominal thickness of EN 10025-2
 * Table 7 (≤16, ≤40, ≤63, ≤80, ≤100, ≤150, ≤200, ≤250 mm) and the minimum of the tensile range fu
 * (&lt;3, 3 to 100, 100 to 150, 150 to 250 mm). A thickness of exactly 3 mm takes the 3–100 mm fu.
 * E = 210 000 MPa and G = 81 000 MPa (EN 1993-1-1 3.2.6). ASTM A36 and A572 Grade 50 (shapes):
 * E = 200 000 MPa and G = 77 200 MPa (AISC 360: 29 000 ksi and 11 200 ksi). Density 7850 kg/m³.
 */
public final class SteelGrades {

    /** Steel density, kg/m³ (common practice; EN 1991-1-1 Table A.4 gives 77 to 78.5 kN/m³). */
    public static final double DENSITY = 7850.0;
    /** Poisson's ratio in the elastic range, EN 1993-1-1 3.2.6. */
    public static final double POISSON = 0.3;

    private static final double E_EN = 210_000 * Units.MPA;   // EN 1993-1-1 3.2.6
    private static final double G_EN = 81_000 * Units.MPA;    // EN 1993-1-1 3.2.6
    private static final double E_AISC = 200_000 * Units.MPA; // AISC 360-16 (29 000 ksi), rounded
    private static final double G_AISC = 77_200 * Units.MPA;  // AISC 360-16 (11 200 ksi), rounded
    /** Upper limit of the "less than 3 mm" tensile band, kept just below 3 mm (see class note). */
    private static final double BELOW_3_MM = 2.999 * Units.MM;

    private static final String EN_SOURCE = "EN 10025-2 Table 7 (fy, fu by nominal thickness); "
            + "E, G: EN 1993-1-1 3.2.6; density 7850 kg/m³";
    private static final String S460_SOURCE = "EN 10025-2:2019 Table 7 (S460 values recalled from memory); "
            + "E, G: EN 1993-1-1 3.2.6; density 7850 kg/m³";
    private static final String ASTM_SOURCE = "%s (shapes); E = 29 000 ksi, G = 11 200 ksi (AISC 360-16), "
            + "taken as 200 000 and 77 200 MPa; density 7850 kg/m³";

    /** Thickness band limits of EN 10025-2 Table 7, mm. */
    private static final double[] YIELD_LIMITS = {16, 40, 63, 80, 100, 150, 200, 250};

    private static final Pattern EN_NAME = Pattern.compile("(S\\d{3})(JR|J0|J2|K2)?(\\+(N|AR|M))?");
    private static final Map<String, Material> GRADES = grades();

    private SteelGrades() { }

    /** The grade names known (without quality suffixes). */
    public static List<String> names() {
        return List.copyOf(GRADES.keySet());
    }

    /**
     * The grade called {@code name}: S235, S355J2, S355J2+N, A36, A572 Gr 50, "ASTM A572 Grade 50" ...
     * (case and spaces ignored).
     */
    public static Optional<Material> find(String name) {
        if (name == null) {
            return Optional.empty();
        }
        String key = name.toUpperCase(Locale.ROOT).replaceAll("[\\s_]+", "");
        Matcher en = EN_NAME.matcher(key);
        if (en.matches()) {
            Material base = GRADES.get(en.group(1));
            return base == null ? Optional.empty() : Optional.of(renamed(base, en.group(1)
                    + (en.group(2) == null ? "" : en.group(2))));
        }
        String astm = key.replaceFirst("^ASTM", "").replace("-", "").replace("GRADE", "GR");
        if (astm.equals("A572GR50") || astm.equals("A57250")) {
            return Optional.of(GRADES.get("A572 Gr 50"));
        }
        return Optional.ofNullable(GRADES.get(astm));
    }

    /** The grade called {@code name}, or a bad-input error at {@code material} with the nearest names. */
    public static Material grade(String name) throws BadInputException {
        return grade(name, "material");
    }

    /** The grade called {@code name}, or a bad-input error at {@code path} with the nearest names. */
    public static Material grade(String name, String path) throws BadInputException {
        Optional<Material> found = find(name);
        if (found.isPresent()) {
            return found.get();
        }
        List<String> near = Suggestions.closest(name, names(), 3);
        throw BadInputException.at(path, "unknown steel grade '" + name + "'"
                + (near.isEmpty() ? "" : "; did you mean " + String.join(", ", near) + "?")
                + " (or give E, G, fy, fu in MPa)");
    }

    /** The material a model file asks for, located at {@code material}. */
    public static Material fromSpec(MaterialSpec spec) throws BadInputException {
        return fromSpec(spec, "material");
    }

    /**
     * A catalogue grade when the spec names one; otherwise a material given in full: E, G, fy, fu in
     * MPa and density in kg/m³, with one strength band for every thickness. When G is NaN it is
     * E / (2(1 + ν)) with ν = 0.3 (EN 1993-1-1 3.2.6); when the density is NaN it is 7850 kg/m³.
     *
     * @param path where the material stands in the model file; problems are at path.e, path.fy ...
     */
    public static Material fromSpec(MaterialSpec spec, String path) throws BadInputException {
        if (spec == null) {
            throw BadInputException.at(path, "a material is needed: a grade such as S355, or E, G, fy, fu in MPa");
        }
        if (spec.isGrade()) {
            return grade(spec.name(), path);
        }
        List<Problem> problems = new ArrayList<>();
        positive(problems, path + ".e", spec.e(), "MPa");
        if (!Double.isNaN(spec.g())) {
            positive(problems, path + ".g", spec.g(), "MPa");
        }
        positive(problems, path + ".fy", spec.fy(), "MPa");
        positive(problems, path + ".fu", spec.fu(), "MPa");
        if (!Double.isNaN(spec.density())) {
            positive(problems, path + ".density", spec.density(), "kg/m³");
        }
        if (problems.isEmpty() && spec.fu() < spec.fy()) {
            problems.add(Problem.at(path + ".fu", "must not be less than fy " + Formats.number(spec.fy())
                    + " MPa, was " + Formats.number(spec.fu()) + " MPa"));
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        double e = spec.e() * Units.MPA;
        double g = Double.isNaN(spec.g()) ? e / (2 * (1 + POISSON)) : spec.g() * Units.MPA;
        double density = Double.isNaN(spec.density()) ? DENSITY : spec.density();
        String name = spec.name() == null || spec.name().isBlank() ? "user material" : spec.name().trim();
        return new Material(name, e, g, density,
                List.of(new StrengthBand(Double.POSITIVE_INFINITY, spec.fy() * Units.MPA, spec.fu() * Units.MPA)),
                "given in the model file" + (Double.isNaN(spec.g()) ? "; G = E/(2(1 + 0.3)), EN 1993-1-1 3.2.6" : ""));
    }

    private static Map<String, Material> grades() {
        Map<String, Material> m = new LinkedHashMap<>();
        // EN 10025-2 Table 7: fy for ≤16, ≤40, ≤63, ≤80, ≤100, ≤150, ≤200, ≤250 mm;
        // fu (minimum of range) for <3, 3..100, 100..150, 150..250 mm
        m.put("S235", en("S235", new int[] {235, 225, 215, 215, 215, 195, 185, 175}, new int[] {360, 360, 350, 340},
                EN_SOURCE));
        m.put("S275", en("S275", new int[] {275, 265, 255, 245, 235, 225, 215, 205}, new int[] {430, 410, 400, 380},
                EN_SOURCE));
        m.put("S355", en("S355", new int[] {355, 345, 335, 325, 315, 295, 285, 275}, new int[] {510, 470, 450, 450},
                EN_SOURCE));
        // EN 10025-2:2019 Table 7, S460 (recalled from memory): given up to 100 mm only
        m.put("S460", en("S460", new int[] {460, 440, 420, 400, 390}, new int[] {540, 540}, S460_SOURCE));
        m.put("A36", new Material("A36", E_AISC, G_AISC, DENSITY,
                List.of(new StrengthBand(Double.POSITIVE_INFINITY, 250 * Units.MPA, 400 * Units.MPA)),
                String.format(ASTM_SOURCE, "ASTM A36/A36M: Fy 250 MPa (36 ksi), Fu 400 MPa (58 ksi)")));
        m.put("A572 Gr 50", new Material("A572 Gr 50", E_AISC, G_AISC, DENSITY,
                List.of(new StrengthBand(Double.POSITIVE_INFINITY, 345 * Units.MPA, 450 * Units.MPA)),
                String.format(ASTM_SOURCE, "ASTM A572/A572M Grade 50: Fy 345 MPa (50 ksi), Fu 450 MPa (65 ksi)")));
        return Collections.unmodifiableMap(m);
    }

    /**
     * Merges the yield bands and the tensile bands into one list of bands by upper thickness.
     * {@code fu[0]} is for t &lt; 3 mm, {@code fu[1]} for 3..100, {@code fu[2]} for 100..150,
     * {@code fu[3]} for 150..250 mm.
     */
    private static Material en(String name, int[] fy, int[] fu, String source) {
        List<StrengthBand> bands = new ArrayList<>();
        bands.add(new StrengthBand(BELOW_3_MM, fy[0] * Units.MPA, fu[0] * Units.MPA));
        for (int i = 0; i < fy.length; i++) {
            double limit = YIELD_LIMITS[i];
            int tensile = limit <= 100 ? fu[1] : limit <= 150 ? fu[2] : fu[3];
            bands.add(new StrengthBand(limit * Units.MM, fy[i] * Units.MPA, tensile * Units.MPA));
        }
        return new Material(name, E_EN, G_EN, DENSITY, bands, source);
    }

    private static Material renamed(Material m, String name) {
        return name.equals(m.name()) ? m : new Material(name, m.e(), m.g(), m.density(), m.bands(), m.source());
    }

    private static void positive(List<Problem> out, String path, double v, String unit) {
        if (!(v > 0) || Double.isInfinite(v)) {
            out.add(Problem.at(path, "must be a finite number > 0 " + unit + ", was " + Formats.number(v)));
        }
    }
}
