package tetrapod.section;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.common.Units;
import tetrapod.model.Section;
import tetrapod.model.SectionProperties;
import tetrapod.model.SectionShape;
import tetrapod.model.spec.UserSectionSpec;

/**
 * Turns the model file's user sections (mm, cm², cm⁴) into sections (SI), checking every value.
 * Problems are located at {@code userSections.<NAME>.<key>}, the keys being the spec records'
 * component names (legA, legB, t, r1, r2; d, t; area, iy, iz, iv, torsion, width, massPerMetre).
 */
final class UserSections {

    private static final String ROOT = "userSections";

    private UserSections() { }

    /** The sections, in name order, or every problem found. */
    static List<Section> build(Map<String, ? extends UserSectionSpec> specs) throws BadInputException {
        List<Problem> problems = new ArrayList<>();
        List<Section> sections = new ArrayList<>();
        Map<String, String> firstNameByKey = new HashMap<>();
        List<String> keys = new ArrayList<>(specs.keySet());
        keys.sort(Comparator.nullsFirst(Comparator.naturalOrder()));
        for (String key : keys) {
            UserSectionSpec spec = specs.get(key);
            String name = key == null ? "" : key.trim();
            String path = ROOT + "." + name;
            if (name.isEmpty()) {
                problems.add(Problem.at(ROOT, "a user section needs a non-blank name"));
                continue;
            }
            String earlier = firstNameByKey.putIfAbsent(SectionNames.key(name), name);
            if (earlier != null) {
                problems.add(Problem.at(path, "names the same section as '" + earlier
                        + "' (names ignore case and spaces, and L90x90x8 is L90x8)"));
                continue;
            }
            if (spec == null) {
                problems.add(Problem.at(path, "has no definition"));
                continue;
            }
            List<Problem> own = new ArrayList<>();
            Section section = section(name, path, spec, own);
            problems.addAll(own);
            if (own.isEmpty()) {
                sections.add(section);
            }
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        return List.copyOf(sections);
    }

    private static Section section(String name, String path, UserSectionSpec spec, List<Problem> problems) {
        if (spec instanceof UserSectionSpec.Angle a) {
            return angle(name, path, a, problems);
        }
        if (spec instanceof UserSectionSpec.Tube t) {
            return tube(name, path, t, problems);
        }
        return given(name, path, (UserSectionSpec.Properties) spec, problems);
    }

    private static Section angle(String name, String path, UserSectionSpec.Angle a, List<Problem> problems) {
        var shape = new SectionShape.Angle(a.legA() * Units.MM, a.legB() * Units.MM, a.t() * Units.MM,
                a.r1() * Units.MM, a.r2() * Units.MM);
        problems.addAll(AngleProperties.problems(shape, path));
        return problems.isEmpty() ? new Section(name, shape, AngleProperties.of(shape).toSectionProperties()) : null;
    }

    private static Section tube(String name, String path, UserSectionSpec.Tube t, List<Problem> problems) {
        positive(problems, path + ".d", t.d(), "mm");
        positive(problems, path + ".t", t.t(), "mm");
        if (problems.isEmpty() && !(t.d() > 2 * t.t())) {
            problems.add(Problem.at(path + ".t", "wall thickness must be less than half the diameter "
                    + Formats.number(t.d()) + " mm, was " + Formats.number(t.t()) + " mm"));
        }
        if (!problems.isEmpty()) {
            return null;
        }
        var shape = new SectionShape.Tube(t.d() * Units.MM, t.t() * Units.MM);
        return new Section(name, shape, TubeProperties.of(shape));
    }

    /**
     * A section given by its properties. Iu follows from the invariance of the trace,
     * Iu + Iv = Iy + Iz; the centroid offsets and tan α are not known and are set to 0.
     */
    private static Section given(String name, String path, UserSectionSpec.Properties p, List<Problem> problems) {
        positive(problems, path + ".area", p.area(), "cm²");
        positive(problems, path + ".iy", p.iy(), "cm⁴");
        positive(problems, path + ".iz", p.iz(), "cm⁴");
        positive(problems, path + ".iv", p.iv(), "cm⁴");
        positive(problems, path + ".torsion", p.torsion(), "cm⁴");
        positive(problems, path + ".width", p.width(), "mm");
        if (!Double.isNaN(p.massPerMetre())) {
            positive(problems, path + ".massPerMetre", p.massPerMetre(), "kg/m");
        }
        if (problems.isEmpty() && p.iv() > Math.min(p.iy(), p.iz())) {
            problems.add(Problem.at(path + ".iv", "the minor principal second moment cannot exceed Iy or Iz ("
                    + Formats.number(Math.min(p.iy(), p.iz())) + " cm⁴), was " + Formats.number(p.iv()) + " cm⁴"));
        }
        if (!problems.isEmpty()) {
            return null;
        }
        double area = p.area() * Units.CM2;
        double iy = p.iy() * Units.CM4;
        double iz = p.iz() * Units.CM4;
        double iv = p.iv() * Units.CM4;
        double mass = Double.isNaN(p.massPerMetre()) ? area * SteelGrades.DENSITY : p.massPerMetre();
        var properties = new SectionProperties(area, iy, iz, iy + iz - iv, iv, p.torsion() * Units.CM4,
                0, 0, 0, mass);
        return new Section(name, new SectionShape.Given(p.width() * Units.MM, p.flatSided()), properties);
    }

    private static void positive(List<Problem> out, String path, double v, String unit) {
        if (!(v > 0) || Double.isInfinite(v)) {
            out.add(Problem.at(path, "must be a finite number > 0 " + unit + ", was " + Formats.number(v)));
        }
    }
}
