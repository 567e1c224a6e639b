package tetrapod.view;

import java.util.Locale;
import java.util.Optional;

/**
 * The status line's text: why a key does nothing in the current state (one line, starting with
 * the key), and what a state change leaves unshown. Pure Java.
 */
public final class StatusMessages {

    private StatusMessages() { }

    /**
     * Why {@code action} would change nothing in the state ({@code data}, {@code options}), or
     * empty when it does something. Picks are judged by the session, which knows what is under
     * the cursor ({@link #nothingPicked()}).
     */
    public static Optional<String> whyNothing(ViewerAction action, ViewData data, SceneOptions options) {
        ViewCase vc = data.cases().get(options.caseIndex());
        if (action instanceof ViewerAction.StepCase && data.cases().size() == 1) {
            return Optional.of(data.azimuths().isEmpty()
                    ? "[ ]: nothing to step through: the model has no wind, so there are no azimuths, only '"
                            + vc.name() + "'"
                    : "[ ]: nothing to step through: the results hold one case only");
        }
        if (action instanceof ViewerAction.NextColouring && data.colourings(options.caseIndex()).size() == 1) {
            return Optional.of("C: '" + vc.name() + "' has no member results, so role is its only colouring");
        }
        if (action instanceof ViewerAction.UseColouring u) {
            String key = (u.colouring().ordinal() + 1) + " (" + u.colouring().optionName() + ")";
            if (u.colouring() == options.colouring()) {
                return Optional.of(key + ": the members are already coloured by " + u.colouring().optionName());
            }
            if (!vc.offers(u.colouring())) {
                return Optional.of(key + ": " + missing(u.colouring(), vc, data));
            }
        }
        if (action instanceof ViewerAction.ToggleDeformed && !options.deformed()) {
            return noDeformedShape(vc).map(why -> "D: " + why);
        }
        return Optional.empty();
    }

    /** Why {@code vc} has no deformed shape to show, or empty when it has one. */
    public static Optional<String> noDeformedShape(ViewCase vc) {
        if (vc.displacements().isEmpty()) {
            if (vc.offers(Colouring.AZIMUTH)) {
                return Optional.of("'" + vc.name() + "' has no single displacement field (each member's worst "
                        + "comes from its own case); step to a load case with [ ]");
            }
            if (vc.scalars().isEmpty()) {
                return Optional.of("'" + vc.name() + "' has no displacements: the model has not been analysed");
            }
            return Optional.of("'" + vc.name() + "' has no displacements");
        }
        if (vc.displacements().stream().allMatch(d -> d.vector().norm() == 0)) {
            return Optional.of("every displacement in '" + vc.name() + "' is zero");
        }
        return Optional.empty();
    }

    /** Stepping into {@code vc} with the deformed shape on, when it has none. */
    public static Optional<String> deformedNotShown(ViewCase vc) {
        return noDeformedShape(vc).map(why -> "deformed shape not shown: " + why);
    }

    /** Stepping into {@code vc}, which lacks the chosen colouring: roles are shown until a case has it. */
    public static String colouringNotShown(ViewCase vc, Colouring chosen) {
        return "coloured by role: '" + vc.name() + "' has no " + chosen.optionName() + " values; "
                + chosen.optionName() + " comes back in a case that has them";
    }

    /** A click that found no member while none was picked. */
    public static String nothingPicked() {
        return String.format(Locale.ROOT, "click: no member within %.0f px of the cursor", Picking.TOLERANCE_PX);
    }

    private static String missing(Colouring c, ViewCase vc, ViewData data) {
        boolean elsewhere = data.cases().stream().anyMatch(o -> o.offers(c));
        String where = "'" + vc.name() + "'";
        return switch (c) {
            case AZIMUTH -> "no governing azimuths in " + where + (elsewhere
                    ? ": only the envelope over the azimuths has them (step with [ ])"
                    : ": the results hold no envelope over wind azimuths");
            case AXIAL -> "no axial forces in " + where + (elsewhere ? " (other cases have them: step with [ ])"
                    : ": the model has not been analysed");
            case UTILISATION -> "no utilisations in " + where + (elsewhere
                    ? " (other cases have them: step with [ ])" : ": the members have not been checked");
            case ROLE -> "role colours are always offered";  // not reached: every case offers role
        };
    }
}
