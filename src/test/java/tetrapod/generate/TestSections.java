package tetrapod.generate;

import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import tetrapod.model.Material;
import tetrapod.model.Section;
import tetrapod.model.SectionLookup;
import tetrapod.model.SectionProperties;
import tetrapod.model.SectionShape;

/**
 * A small made-up section table for the generator's tests. The properties are round illustrative
 * numbers, not catalogue data: the generator only passes sections through and the mass test uses
 * the mass per metre given here.
 */
final class TestSections implements SectionLookup {

    static final TestSections INSTANCE = new TestSections();

    /**
     * Test steel: E = 210 GPa, G = 81 GPa, 7850 kg/m³, fy 355 MPa, fu 470 MPa (usual values for S355,
     * recalled from memory; the generator only passes the material through).
     */
    static final Material STEEL = new Material("S355", 210e9, 81e9, 7850,
            List.of(new Material.StrengthBand(0.040, 355e6, 470e6)), "test fixture");

    private final Map<String, Section> sections = new LinkedHashMap<>();

    private TestSections() {
        add("L150x15", 0.150, 0.015, 40.0);
        add("L120x12", 0.120, 0.012, 25.0);
        add("L100x10", 0.100, 0.010, 15.0);
        add("L90x8", 0.090, 0.008, 10.0);
        add("L80x8", 0.080, 0.008, 8.0);
        add("L70x7", 0.070, 0.007, 6.0);
        add("L60x6", 0.060, 0.006, 5.0);
        add("L50x5", 0.050, 0.005, 4.0);
    }

    private void add(String name, double leg, double t, double massPerMetre) {
        double area = massPerMetre / 7850;
        double i = area * leg * leg / 20;
        SectionProperties p = new SectionProperties(area, i, i, 1.6 * i, 0.4 * i, area * t * t / 3,
                0.3 * leg, 0.3 * leg, 1.0, massPerMetre);
        sections.put(name, new Section(name, new SectionShape.Angle(leg, leg, t, t, t / 2), p));
    }

    Section get(String name) {
        return sections.get(name);
    }

    @Override
    public Optional<Section> find(String name) {
        return Optional.ofNullable(sections.get(name));
    }

    @Override
    public List<String> nearest(String name, int count) {
        return sections.keySet().stream()
                .sorted(Comparator.comparingInt((String s) -> editDistance(s, name)).thenComparing(s -> s))
                .limit(count).toList();
    }

    private static int editDistance(String a, String b) {
        int[] row = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            row[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            int diagonal = row[0];
            row[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int above = row[j];
                int substitute = diagonal + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                row[j] = Math.min(substitute, Math.min(row[j - 1], row[j]) + 1);
                diagonal = above;
            }
        }
        return row[b.length()];
    }
}
