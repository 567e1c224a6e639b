package tetrapod.io;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import tetrapod.model.SectionLookup;
import tetrapod.model.spec.UserSectionSpec;

/** Reads {@code userSections}: sections defined in the file by angle or tube dimensions or by properties. */
final class UserSectionReader {

    static final List<String> KINDS = List.of("angle", "tube", "properties");
    private static final List<String> ANGLE_KEYS = List.of("legA_mm", "legB_mm", "t_mm", "r1_mm", "r2_mm");
    private static final List<String> TUBE_KEYS = List.of("d_mm", "t_mm");
    private static final List<String> PROPERTY_KEYS = List.of("A_cm2", "Iy_cm4", "Iz_cm4", "Iv_cm4", "J_cm4",
            "width_mm", "flatSided", "mass_kg_per_m");
    /** Iv may exceed min(Iy, Iz) by this fraction before it is refused: tables round their values (common practice). */
    private static final double ROUNDING = 1e-3;

    private final Problems problems;
    private final SectionLookup catalogue;

    UserSectionReader(Problems problems, SectionLookup catalogue) {
        this.problems = problems;
        this.catalogue = catalogue;
    }

    /** The sections by name, sorted; the ones with problems left out (reported). */
    Map<String, UserSectionSpec> read(Fields userSections) {
        Map<String, UserSectionSpec> sections = new TreeMap<>();
        for (String name : userSections.keys()) {
            String path = userSections.path(name);
            if (name.isBlank()) {
                problems.add(path, "a section name must not be empty");
                continue;
            }
            if (catalogue.find(name).isPresent()) {
                problems.add(path, "the catalogue already has a section named '" + name
                        + "'; give this one another name so that every name means one section");
                continue;
            }
            Fields section = Fields.of(userSections.get(name), path, problems);
            if (section == null) {
                continue;
            }
            UserSectionSpec spec = section(section);
            if (spec != null) {
                sections.put(name, spec);
            }
        }
        return sections;
    }

    private UserSectionSpec section(Fields section) {
        section.allowOnly(KINDS);
        List<String> given = KINDS.stream().filter(section::has).toList();
        if (given.isEmpty() && !section.keys().isEmpty()) {
            return null; // its keys are all unknown, and reported as such
        }
        if (given.size() != 1) {
            problems.add(section.path(), given.isEmpty()
                    ? "give the section as one of " + String.join(", ", KINDS)
                    : "give the section one way only, not as " + String.join(" and ", given));
            return null;
        }
        Fields body = section.object(given.get(0), true);
        if (body == null) {
            return null;
        }
        return switch (given.get(0)) {
            case "angle" -> angle(body);
            case "tube" -> tube(body);
            default -> properties(body);
        };
    }

    private UserSectionSpec angle(Fields f) {
        int before = problems.count();
        f.allowOnly(ANGLE_KEYS);
        double legA = f.requiredNumber("legA_mm", PhysicalLimits.SECTION_MM, "mm");
        double legB = f.requiredNumber("legB_mm", PhysicalLimits.SECTION_MM, "mm");
        double t = f.requiredNumber("t_mm", PhysicalLimits.SECTION_MM, "mm");
        double r1 = f.requiredNumber("r1_mm", PhysicalLimits.RADIUS_MM, "mm");
        double r2 = f.requiredNumber("r2_mm", PhysicalLimits.RADIUS_MM, "mm");
        if (legB > legA) {
            problems.add(f.path("legB_mm"), "must not exceed legA_mm (" + Numbers.format(legA)
                    + " mm): give the longer leg as legA_mm");
        }
        if (t >= Math.min(legA, legB)) {
            problems.add(f.path("t_mm"), "must be less than the shorter leg (" + Numbers.format(Math.min(legA, legB))
                    + " mm), was " + Numbers.format(t));
        }
        return problems.count() == before ? new UserSectionSpec.Angle(legA, legB, t, r1, r2) : null;
    }

    private UserSectionSpec tube(Fields f) {
        int before = problems.count();
        f.allowOnly(TUBE_KEYS);
        double d = f.requiredNumber("d_mm", PhysicalLimits.SECTION_MM, "mm");
        double t = f.requiredNumber("t_mm", PhysicalLimits.SECTION_MM, "mm");
        if (t > d / 2) {
            problems.add(f.path("t_mm"), "must not exceed half the diameter (" + Numbers.format(d / 2)
                    + " mm), was " + Numbers.format(t));
        }
        return problems.count() == before ? new UserSectionSpec.Tube(d, t) : null;
    }

    private UserSectionSpec properties(Fields f) {
        int before = problems.count();
        f.allowOnly(PROPERTY_KEYS);
        double area = f.requiredNumber("A_cm2", PhysicalLimits.AREA_CM2, "cm²");
        double iy = f.requiredNumber("Iy_cm4", PhysicalLimits.SECOND_MOMENT_CM4, "cm⁴");
        double iz = f.requiredNumber("Iz_cm4", PhysicalLimits.SECOND_MOMENT_CM4, "cm⁴");
        double iv = f.requiredNumber("Iv_cm4", PhysicalLimits.SECOND_MOMENT_CM4, "cm⁴");
        double torsion = f.requiredNumber("J_cm4", PhysicalLimits.SECOND_MOMENT_CM4, "cm⁴");
        double width = f.requiredNumber("width_mm", PhysicalLimits.SECTION_MM, "mm");
        Boolean flatSided = f.requiredBool("flatSided");
        double mass = f.optionalNumber("mass_kg_per_m", PhysicalLimits.MASS_PER_LENGTH, "kg/m", Double.NaN);
        // The minor principal second moment is the least about any centroidal axis (Mohr's circle).
        if (iv > Math.min(iy, iz) * (1 + ROUNDING)) {
            problems.add(f.path("Iv_cm4"), "the minor principal value cannot exceed Iy_cm4 or Iz_cm4 ("
                    + Numbers.format(Math.min(iy, iz)) + " cm⁴), was " + Numbers.format(iv));
        }
        return problems.count() == before
                ? new UserSectionSpec.Properties(area, iy, iz, iv, torsion, width, flatSided, mass)
                : null;
    }
}
