package tetrapod.view;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.Set;
import tetrapod.model.Frame;
import tetrapod.model.Node;
import tetrapod.model.Support;

/**
 * Everything the view shows: the frame, the states it can step through (cases at each wind
 * azimuth, an envelope, ...) and the colouring to start with. This is the whole contract between
 * the analysis and the view; the view computes nothing structural.
 *
 * @param cases     at least one; the window steps through them in this order. Cases may offer
 *                  different colourings (e.g. only an envelope carries governing azimuths)
 * @param colouring the colouring to start with; the first case must offer it
 * @param ancillaries the items the tower carries, drawn at their heights; may be empty
 */
public record ViewData(Frame frame, List<ViewCase> cases, Colouring colouring, List<ViewAncillary> ancillaries) {

    /** Two azimuths closer than this (deg) are the same. */
    private static final double SAME_AZIMUTH_DEG = 1e-6;

    public ViewData {
        Objects.requireNonNull(frame, "frame");
        Objects.requireNonNull(colouring, "colouring");
        cases = List.copyOf(cases);
        ancillaries = List.copyOf(ancillaries);
        if (cases.isEmpty()) {
            throw new IllegalArgumentException("a view needs at least one case");
        }
        Set<Integer> nodes = new HashSet<>();
        for (Node n : frame.nodes()) {
            nodes.add(n.id());
        }
        Set<Integer> supportNodes = new HashSet<>();
        for (Support s : frame.supports()) {
            supportNodes.add(s.node());
        }
        int members = frame.members().size();
        for (ViewCase c : cases) {
            c.scalars().forEach((kind, values) -> {
                if (values.size() != members) {
                    throw new IllegalArgumentException("case '" + c.name() + "': " + values.size() + " "
                            + kind.optionName() + " values for " + members + " members");
                }
            });
            if (!c.memberNotes().isEmpty() && c.memberNotes().size() != members) {
                throw new IllegalArgumentException("case '" + c.name() + "': " + c.memberNotes().size()
                        + " member notes for " + members + " members");
            }
            for (NodeVector d : c.displacements()) {
                if (!nodes.contains(d.node())) {
                    throw new IllegalArgumentException("case '" + c.name() + "': displacement of unknown node " + d.node());
                }
            }
            for (NodeVector r : c.reactions()) {
                if (!supportNodes.contains(r.node())) {
                    throw new IllegalArgumentException("case '" + c.name() + "': reaction at node " + r.node()
                            + ", which is not a support");
                }
            }
        }
        if (!cases.get(0).offers(colouring)) {
            throw new IllegalArgumentException("case '" + cases.get(0).name() + "' has no " + colouring.optionName()
                    + " values");
        }
    }

    /** A view without ancillaries. */
    public ViewData(Frame frame, List<ViewCase> cases, Colouring colouring) {
        this(frame, cases, colouring, List.of());
    }

    /** The same data with {@code items} drawn at their heights. */
    public ViewData withAncillaries(List<ViewAncillary> items) {
        return new ViewData(frame, cases, colouring, items);
    }

    /** The frame alone, coloured by role, with an optional wind direction: what exists before analysis. */
    public static ViewData geometryOnly(Frame frame, OptionalDouble windAzimuthDeg) {
        String name = windAzimuthDeg.isPresent() ? "geometry, wind direction shown" : "geometry";
        return new ViewData(frame, List.of(ViewCase.geometry(name, windAzimuthDeg)), Colouring.ROLE);
    }

    /** The same data starting with another colouring (the first case must offer it). */
    public ViewData withColouring(Colouring c) {
        return new ViewData(frame, cases, c, ancillaries);
    }

    /** Index of the first case whose wind blows from {@code azimuthDeg} (modulo 360), or empty. */
    public OptionalInt caseAt(double azimuthDeg) {
        for (int k = 0; k < cases.size(); k++) {
            OptionalDouble a = cases.get(k).windAzimuthDeg();
            if (a.isPresent() && Math.abs(Angles.differenceDeg(a.getAsDouble(), azimuthDeg)) < SAME_AZIMUTH_DEG) {
                return OptionalInt.of(k);
            }
        }
        return OptionalInt.empty();
    }

    /** The wind azimuths of the cases that have one, in case order, deg. */
    public List<Double> azimuths() {
        List<Double> list = new ArrayList<>();
        for (ViewCase c : cases) {
            c.windAzimuthDeg().ifPresent(list::add);
        }
        return list;
    }

    /** The colourings case {@code caseIndex} offers, in enum order ({@link Colouring#ROLE} always). */
    public List<Colouring> colourings(int caseIndex) {
        List<Colouring> list = new ArrayList<>();
        for (Colouring c : Colouring.values()) {
            if (cases.get(caseIndex).offers(c)) {
                list.add(c);
            }
        }
        return list;
    }
}
