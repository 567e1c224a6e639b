package tetrapod.section;

import java.util.ArrayList;
import java.util.List;
import tetrapod.common.Units;
import tetrapod.model.Section;
import tetrapod.model.SectionShape;

/**
 * The standard range of hot-rolled angles: dimensions a, b, t, root radius r1 and toe radius r2 in
 * mm, as in EN 10056-1 (Table 1 equal legs, Table 2 unequal legs; r2 = r1/2 throughout). The radii
 * of 60x40 and 65x50 were read from a reproduction of the EN 10056-1 unequal-angle table
 * (eng-calculations.com); the others are recalled from memory of EN 10056-1:1998 and agree with
 * the masses it lists. Properties are always computed from these dimensions.
 */
final class AngleSizes {

    /** One size, mm. */
    record Size(double a, double b, double t, double r1, double r2) {
        SectionShape.Angle shape() {
            return new SectionShape.Angle(a * Units.MM, b * Units.MM, t * Units.MM, r1 * Units.MM,
                    r2 * Units.MM);
        }

        String name() {
            return SectionNames.angle(a, b, t);
        }
    }

    private AngleSizes() { }

    static List<Size> all() {
        List<Size> sizes = new ArrayList<>();
        // equal legs: leg, r1, r2, thicknesses
        equal(sizes, 40, 6, 3, 4, 5);
        equal(sizes, 45, 7, 3.5, 4.5);
        equal(sizes, 50, 7, 3.5, 4, 5, 6);
        equal(sizes, 60, 8, 4, 5, 6, 8);
        equal(sizes, 65, 9, 4.5, 7);
        equal(sizes, 70, 9, 4.5, 6, 7);
        equal(sizes, 75, 9, 4.5, 6, 8);
        equal(sizes, 80, 10, 5, 8, 10);
        equal(sizes, 90, 11, 5.5, 7, 8, 9, 10);
        equal(sizes, 100, 12, 6, 8, 10, 12);
        equal(sizes, 120, 13, 6.5, 10, 12, 15);
        equal(sizes, 130, 14, 7, 12);
        equal(sizes, 150, 16, 8, 10, 12, 15, 18);
        equal(sizes, 160, 17, 8.5, 15);
        equal(sizes, 180, 18, 9, 16, 18);
        equal(sizes, 200, 18, 9, 16, 18, 20, 24);
        equal(sizes, 250, 18, 9, 25, 28, 35);
        // unequal legs: long leg, short leg, r1, r2, thicknesses
        unequal(sizes, 60, 40, 6, 3, 5, 6);
        unequal(sizes, 65, 50, 6, 3, 5);
        unequal(sizes, 70, 50, 7, 3.5, 6);
        unequal(sizes, 75, 50, 7, 3.5, 6, 8);
        unequal(sizes, 80, 40, 7, 3.5, 6, 8);
        unequal(sizes, 80, 60, 8, 4, 7);
        unequal(sizes, 100, 50, 8, 4, 6, 8);
        unequal(sizes, 100, 65, 10, 5, 7, 8, 10);
        unequal(sizes, 100, 75, 10, 5, 8, 10, 12);
        unequal(sizes, 120, 80, 11, 5.5, 8, 10, 12);
        unequal(sizes, 125, 75, 11, 5.5, 8, 10, 12);
        unequal(sizes, 135, 65, 11, 5.5, 8, 10);
        unequal(sizes, 150, 75, 11, 5.5, 9, 10, 12, 15);
        unequal(sizes, 150, 90, 12, 6, 10, 12, 15);
        unequal(sizes, 150, 100, 12, 6, 10, 12);
        unequal(sizes, 200, 100, 15, 7.5, 10, 12, 15);
        unequal(sizes, 200, 150, 15, 7.5, 12, 15);
        return List.copyOf(sizes);
    }

    /** Every size as a section with its computed properties. */
    static List<Section> sections() {
        return all().stream()
                .map(s -> new Section(s.name(), s.shape(), AngleProperties.of(s.shape()).toSectionProperties()))
                .toList();
    }

    private static void equal(List<Size> out, double leg, double r1, double r2, double... thicknesses) {
        for (double t : thicknesses) {
            out.add(new Size(leg, leg, t, r1, r2));
        }
    }

    private static void unequal(List<Size> out, double a, double b, double r1, double r2, double... thicknesses) {
        for (double t : thicknesses) {
            out.add(new Size(a, b, t, r1, r2));
        }
    }
}
