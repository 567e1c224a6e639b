package tetrapod.view;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import tetrapod.model.Member;

/** The text shown for a picked member: what it is, and its results in the case shown. */
public final class MemberDescription {

    private MemberDescription() { }

    /** Lines for member index {@code member} of {@code data} in case {@code caseIndex}. */
    public static String of(ViewData data, int caseIndex, int member) {
        Member m = data.frame().members().get(member);
        ViewCase vc = data.cases().get(caseIndex);
        double length = data.frame().memberLengths()[member];
        List<String> lines = new ArrayList<>();
        lines.add(String.format(Locale.ROOT, "member %d · %s · %s", m.id(), m.role().jsonName(), m.section().name()));
        lines.add(String.format(Locale.ROOT, "length %.3f m · nodes %d to %d", length, m.i(), m.j()));
        MemberScalars axial = vc.scalars().get(Colouring.AXIAL);
        if (axial != null) {
            lines.add(axial.has(member) ? axialText(axial.get(member)) : "axial force: no value");
        }
        MemberScalars utilisation = vc.scalars().get(Colouring.UTILISATION);
        if (utilisation != null) {
            lines.add(utilisation.has(member)
                    ? String.format(Locale.ROOT, "utilisation %.2f%s", utilisation.get(member),
                            utilisation.get(member) > 1 ? " (over the limit)" : "")
                    : "utilisation: not checked");
        }
        MemberScalars azimuth = vc.scalars().get(Colouring.AZIMUTH);
        if (azimuth != null && azimuth.has(member)) {
            lines.add(String.format(Locale.ROOT, "governing azimuth %.0f°", Angles.normaliseDeg(azimuth.get(member))));
        }
        String note = vc.noteFor(member);
        if (!note.isBlank()) {
            lines.add(note);
        }
        lines.add("case: " + vc.name());
        return String.join("\n", lines);
    }

    private static String axialText(double n) {
        String kind = n > 0 ? " (tension)" : n < 0 ? " (compression)" : "";
        return String.format(Locale.ROOT, "N = %.1f kN%s", n / 1000, kind);
    }
}
