package tetrapod.view;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.Role;
import tetrapod.model.Support;
import tetrapod.model.Vec3;

/** Builds the {@link Scene} of one case of a {@link ViewData}: pure Java, no OpenGL. */
public final class SceneBuilder {

    static final Rgb GHOST = Rgb.hex(0xC9CCD0);
    /** Overstressed members are drawn this much wider, so that a single one is seen at once. */
    static final double OVERSTRESS_WIDTH_FACTOR = 1.4;
    /** The largest reaction is drawn this fraction of the tower's size long. */
    static final double REACTION_LENGTH = 0.18;
    /** The automatic deformation scale draws the largest displacement this fraction of the size. */
    static final double DEFORMATION_SIZE = 0.05;
    /** The cross drawn on a member that breaks a requirement: no colour of any scale, near black. */
    static final Rgb REQUIREMENT_MARK = Rgb.hex(0x161616);
    /** Arm length of that cross, as a fraction of the tower's size. */
    static final double REQUIREMENT_MARK_SIZE = 0.012;

    private SceneBuilder() { }

    /** Member width in reference px by role: legs widest, secondary members narrowest. */
    static double width(Role role) {
        return switch (role) {
            case LEG -> 4.2;
            case DIAGONAL, HORIZONTAL, GENERAL -> 2.6;
            case PLAN -> 2.2;
            case REDUNDANT -> 1.8;
        };
    }

    public static Scene build(ViewData data, SceneOptions options) {
        if (options.caseIndex() >= data.cases().size()) {
            throw new IllegalArgumentException("case " + options.caseIndex() + " of " + data.cases().size());
        }
        ViewCase vc = data.cases().get(options.caseIndex());
        if (!vc.offers(options.colouring())) {
            throw new IllegalArgumentException("case '" + vc.name() + "' has no " + options.colouring().optionName()
                    + " values");
        }
        Frame frame = data.frame();
        Map<Integer, Vec3> undeformed = new HashMap<>();
        for (Node n : frame.nodes()) {
            undeformed.put(n.id(), n.position());
        }
        Bounds frameBounds = Bounds.of(undeformed.values());
        double size = size(frameBounds);
        double scale = options.deformed() ? deformationScale(vc, options, size) : 0;
        Map<Integer, Vec3> drawn = new HashMap<>(undeformed);
        if (scale > 0) {
            for (NodeVector d : vc.displacements()) {
                drawn.put(d.node(), undeformed.get(d.node()).plus(d.vector().times(scale)));
            }
        }

        List<Vec3> framed = new ArrayList<>(drawn.values());
        framed.addAll(undeformed.values());
        List<SceneLabel> labels = new ArrayList<>();
        SegmentInstances members = members(data, vc, options.colouring(), drawn);
        SegmentInstances.Builder ground = SegmentInstances.builder(256);
        SegmentInstances.Builder deco = SegmentInstances.builder(256);
        Vec3 baseCentre = new Vec3(frameBounds.centre().x(), frameBounds.centre().y(), 0);
        double baseRadius = 0.5 * Math.hypot(frameBounds.max().x() - frameBounds.min().x(),
                frameBounds.max().y() - frameBounds.min().y());
        double dialRadius = Math.max(baseRadius * 1.3, 0.06 * size);
        double gridHalf = Math.max(2.2 * baseRadius, 0.2 * size);
        if (options.grid()) {
            GroundDecorations.grid(ground, baseCentre, gridHalf);
            // the items the tower carries go with the ground grid: the setting, not the structure
            AncillaryGlyphs.add(deco, labels, frame, data.ancillaries(), 0.02 * size);
        }
        if (options.axes()) {
            Vec3 corner = baseCentre.minus(new Vec3(gridHalf, gridHalf, 0));  // on the left of the default view
            GroundDecorations.axes(deco, labels, corner, 0.1 * size);
            framed.add(corner);
        }
        if (scale > 0) {
            for (Member m : frame.members()) {
                deco.add(undeformed.get(m.i()), undeformed.get(m.j()), GHOST, 1.2, 1.2, true);
            }
        }
        for (Support s : frame.supports()) {
            GroundDecorations.support(deco, drawn.get(s.node()), s.restraint(), 0.025 * size);
        }
        List<Arrow> arrows = List.of();
        double largest = ArrowGlyphs.largestReaction(data);
        if (options.reactions() && largest > 0) {
            arrows = ArrowGlyphs.reactions(vc, drawn, REACTION_LENGTH * size / largest, largest);
            for (Arrow a : arrows) {
                ArrowGlyphs.add(deco, a.tail(), a.tip(), ArrowGlyphs.REACTION_COLOUR, 0.03 * size);
                labels.add(new SceneLabel(ArrowGlyphs.label(a), LabelStyle.REACTION, labelAt(a, baseCentre)));
                framed.add(a.tail());
            }
        }
        if (options.wind() && vc.windAzimuthDeg().isPresent()) {
            GroundDecorations.wind(ground, deco, labels, baseCentre, dialRadius, vc.windAzimuthDeg().getAsDouble());
            double r = 2.05 * dialRadius;
            framed.add(baseCentre.plus(new Vec3(r, r, 0)));
            framed.add(baseCentre.minus(new Vec3(r, r, 0)));
        }
        for (int k : vc.requirementBreaks()) {
            Member m = frame.members().get(k);
            RequirementMarks.cross(deco, drawn.get(m.i()), drawn.get(m.j()), REQUIREMENT_MARK_SIZE * size,
                    REQUIREMENT_MARK);
        }
        Optional<Legend> legend = Optional.empty();
        if (options.legend()) {
            Legend l = ColourScale.of(data, options.colouring()).legend();
            if (!vc.requirementBreaks().isEmpty()) {
                List<Legend.Swatch> swatches = new ArrayList<>(l.swatches());
                swatches.add(new Legend.Swatch(REQUIREMENT_MARK, "x: breaks a requirement"));
                l = new Legend(l.title(), l.bar(), l.ticks(), swatches);
            }
            legend = Optional.of(l);
        }
        if (options.caption()) {
            labels.add(new SceneLabel(caption(data, vc, options.colouring(), scale), LabelStyle.CAPTION,
                    new LabelAnchor.AtCorner(LabelAnchor.Corner.TOP_LEFT, 16)));
        }
        return new Scene(members, ground.build(), deco.build(), arrows, labels, legend, Bounds.of(framed), false);
    }

    /** The larger of the frame's height and its plan diagonal, m. */
    static double size(Bounds b) {
        return Math.max(b.max().z() - b.min().z(),
                Math.hypot(b.max().x() - b.min().x(), b.max().y() - b.min().y()));
    }

    private static SegmentInstances members(ViewData data, ViewCase vc, Colouring colouring,
                                            Map<Integer, Vec3> at) {
        List<Member> list = data.frame().members();
        SegmentInstances.Builder out = SegmentInstances.builder(list.size());
        ColourScale scale = ColourScale.of(data, colouring);
        MemberScalars values = vc.scalars().get(colouring);
        for (int k = 0; k < list.size(); k++) {
            Member m = list.get(k);
            double width = width(m.role());
            Rgb colour;
            if (colouring == Colouring.ROLE) {
                colour = ((RoleScale) scale).colour(m.role());
            } else {
                double v = values.get(k);
                colour = scale.colour(v);
                if (colouring == Colouring.UTILISATION && v > 1) {
                    width *= OVERSTRESS_WIDTH_FACTOR;
                }
            }
            out.line(at.get(m.i()), at.get(m.j()), colour, width);
        }
        return out.build();
    }

    private static double deformationScale(ViewCase vc, SceneOptions options, double size) {
        if (options.deformationScale() > 0) {
            return options.deformationScale();
        }
        double max = 0;
        for (NodeVector d : vc.displacements()) {
            max = Math.max(max, d.vector().norm());
        }
        if (!(max > 0)) {
            return 0;
        }
        return roundDown(DEFORMATION_SIZE * size / max);
    }

    /** 1, 2 or 5 × 10^k, the nearest at or below {@code x} (> 0). */
    static double roundDown(double x) {
        double p = Math.pow(10, Math.floor(Math.log10(x)));
        for (double m : new double[] {5, 2, 1}) {
            if (m * p <= x * (1 + 1e-9)) {
                return m * p;
            }
        }
        return p;
    }

    /** Beside the tail of a reaction arrow, on the side away from the tower's centre line. */
    private static LabelAnchor labelAt(Arrow a, Vec3 baseCentre) {
        if (a.component().equals("Fz")) {
            Vec3 lower = a.tail().z() < a.tip().z() ? a.tail() : a.tip();
            return new LabelAnchor.AtPoint(lower, 0, 14, LabelAnchor.Align.CENTRE);
        }
        boolean right = a.tail().x() + a.tail().y() >= baseCentre.x() + baseCentre.y();
        return new LabelAnchor.AtPoint(a.tail(), right ? 6 : -6, 0,
                right ? LabelAnchor.Align.LEFT : LabelAnchor.Align.RIGHT);
    }

    private static String caption(ViewData data, ViewCase vc, Colouring colouring, double deformation) {
        String second = vc.name() + " · colour: " + colouring.optionName();
        if (deformation > 0) {
            second += String.format(Locale.ROOT, " · deformed shape ×%s", trim(deformation));
            if (!vc.shapeOnly()) {
                OptionalDouble top = TopDisplacement.of(data.frame(), vc.displacements());
                if (top.isPresent()) {
                    second += String.format(Locale.ROOT, "\ntop displacement %.1f mm (largest horizontal, top level)",
                            top.getAsDouble() * 1000);
                }
            }
        }
        return data.frame().name() + "\n" + second;
    }

    private static String trim(double v) {
        return v >= 1 && v == Math.rint(v) ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%.3g", v);
    }
}
