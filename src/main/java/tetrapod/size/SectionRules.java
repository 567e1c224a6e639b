package tetrapod.size;

import tetrapod.check.Connection;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.SectionShape;
import tetrapod.model.spec.ConnectedLeg;

/**
 * The geometric rules between a section, its connection and its neighbours. Dimensions in m.
 *
 * <p><b>Holes on the flat.</b> A member's bolt line lies at the edge distance e2 from the toe of
 * the connected leg; the hole (diameter d0) must lie on the flat part of that leg, clear of the
 * root fillet: {@code e2 + d0/2 ≤ b − t − r1}, with b the connected leg's width, t the thickness
 * and r1 the root radius (common practice; with the connection's own e2 and d0, or the assumed
 * connection's). For legs, which are drilled through both flanges, b is the narrower leg. A
 * section that is not an angle has no such rule.
 *
 * <p><b>Bracing no wider than the leg.</b> The wider leg of a bracing angle must not exceed the
 * narrower leg of the leg angle of its segment, so that its end fits on the leg's flange.
 *
 * <p><b>Legs not lighter downwards.</b> A leg's mass per metre is at least that of the leg of the
 * segment above, so that splices step down going up.
 */
final class SectionRules {

    private SectionRules() { }

    /** Thickness that the minimum applies to, m (0 when the section gives none). */
    static double thickness(Section s) {
        if (s.shape() instanceof SectionShape.Angle a) {
            return a.t();
        }
        if (s.shape() instanceof SectionShape.Tube t) {
            return t.t();
        }
        return Double.POSITIVE_INFINITY; // a section given by properties: thickness unknown, not limited
    }

    /** The narrower leg of an angle; a tube's diameter; a given section's width, m. */
    static double narrowWidth(Section s) {
        return s.shape() instanceof SectionShape.Angle a ? Math.min(a.legA(), a.legB()) : s.shape().windWidth();
    }

    /** The wider leg of an angle; a tube's diameter; a given section's width, m. */
    static double wideWidth(Section s) {
        return s.shape() instanceof SectionShape.Angle a ? Math.max(a.legA(), a.legB()) : s.shape().windWidth();
    }

    /** Whether the connection's holes lie on the flat of the connected leg (true for sections that are not angles). */
    static boolean holesFit(Section s, Role role, Connection c) {
        if (!(s.shape() instanceof SectionShape.Angle a) || (c.bolts() == 0 && c.holesInSection() == 0)) {
            return true;
        }
        double b = role == Role.LEG || c.connectedLeg() == ConnectedLeg.SHORT ? a.legB() : a.legA();
        return c.edgeDistance() + c.holeDiameter() / 2 <= b - a.t() - a.r1() + 1e-12;
    }

    /** Whether {@code s} meets the minimum thickness and width of {@code role} and fits its connection's holes. */
    static boolean allowed(Section s, Role role, Connection c, SizingRules rules) {
        return thickness(s) >= rules.minThickness(role) - 1e-12 && narrowWidth(s) >= rules.minWidth(role) - 1e-12
                && holesFit(s, role, c);
    }
}
