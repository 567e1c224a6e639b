package tetrapod.view;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * One state of the tower to show: a load case at one wind azimuth, a case without wind, or an
 * envelope over all azimuths. Everything but the name may be empty.
 *
 * @param name           shown in the caption, e.g. "ULS wind 45°" or "envelope over 8 azimuths"
 * @param windAzimuthDeg the wind direction drawn as an arrow (0 = towards +x, 90 = towards +y);
 *                       empty for no wind or for an envelope
 * @param scalars        per-member values for the colourings other than {@link Colouring#ROLE}:
 *                       AXIAL in N (tension positive), UTILISATION (1 at the limit), AZIMUTH in deg
 *                       (the governing azimuth)
 * @param displacements  node displacements, m (for the deformed shape); may be empty
 * @param reactions      forces the supports exert on the structure, N, one per support node; may be empty
 * @param memberNotes    one line of text per member shown when it is picked (e.g. governing mode,
 *                       clause and azimuth); empty, or one entry per member ("" for none)
 * @param requirementBreaks indexes (frame member order) of the members that break a requirement
 *                       that does not depend on the load (slenderness, bolt spacing, width-to-
 *                       thickness); drawn with a mark of their own, never as a utilisation colour
 * @param shapeOnly      the displacements are a shape without a size of their own (a natural mode):
 *                       drawn, but no displacement in mm is shown for them
 */
public record ViewCase(String name, OptionalDouble windAzimuthDeg, Map<Colouring, MemberScalars> scalars,
                       List<NodeVector> displacements, List<NodeVector> reactions, List<String> memberNotes,
                       List<Integer> requirementBreaks, boolean shapeOnly) {

    public ViewCase {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(windAzimuthDeg, "windAzimuthDeg");
        if (windAzimuthDeg.isPresent() && !Double.isFinite(windAzimuthDeg.getAsDouble())) {
            throw new IllegalArgumentException("case '" + name + "': wind azimuth is not finite");
        }
        if (scalars.containsKey(Colouring.ROLE)) {
            throw new IllegalArgumentException("case '" + name + "': role colours come from the frame, not from scalars");
        }
        scalars = scalars.isEmpty() ? Map.of() : Map.copyOf(new EnumMap<>(scalars));
        displacements = List.copyOf(displacements);
        reactions = List.copyOf(reactions);
        memberNotes = List.copyOf(memberNotes);
        requirementBreaks = List.copyOf(requirementBreaks);
    }

    /** A case whose displacements are real ones, m. */
    public ViewCase(String name, OptionalDouble windAzimuthDeg, Map<Colouring, MemberScalars> scalars,
                    List<NodeVector> displacements, List<NodeVector> reactions, List<String> memberNotes,
                    List<Integer> requirementBreaks) {
        this(name, windAzimuthDeg, scalars, displacements, reactions, memberNotes, requirementBreaks, false);
    }

    /** A shape to draw deformed that has no size of its own, e.g. a natural mode. */
    public static ViewCase shape(String name, List<NodeVector> shape) {
        return new ViewCase(name, OptionalDouble.empty(), Map.of(), shape, List.of(), List.of(), List.of(), true);
    }

    /** A case in which no member breaks a requirement (or none is known). */
    public ViewCase(String name, OptionalDouble windAzimuthDeg, Map<Colouring, MemberScalars> scalars,
                    List<NodeVector> displacements, List<NodeVector> reactions, List<String> memberNotes) {
        this(name, windAzimuthDeg, scalars, displacements, reactions, memberNotes, List.of(), false);
    }

    /** A case with nothing but a name and, optionally, a wind direction. */
    public static ViewCase geometry(String name, OptionalDouble windAzimuthDeg) {
        return new ViewCase(name, windAzimuthDeg, Map.of(), List.of(), List.of(), List.of());
    }

    /** Whether this case can be coloured by {@code colouring}. */
    public boolean offers(Colouring colouring) {
        return colouring == Colouring.ROLE || scalars.containsKey(colouring);
    }

    /** The note for member index {@code member}, or "". */
    public String noteFor(int member) {
        return memberNotes.isEmpty() ? "" : memberNotes.get(member);
    }
}
