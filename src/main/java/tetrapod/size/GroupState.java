package tetrapod.size;

import java.util.Objects;
import tetrapod.check.CheckResult;
import tetrapod.check.Extreme;

/**
 * A group in one analysed design: its section and its most utilised member over every case.
 *
 * @param section     the section's name
 * @param utilisation the largest utilisation of the group's members
 * @param member      the member that reaches it
 * @param governing   that member's governing check (mode, clause, note)
 * @param where       its case and azimuth
 */
public record GroupState(String section, double utilisation, int member, CheckResult governing, Extreme where) {
    public GroupState {
        Objects.requireNonNull(section, "section");
        Objects.requireNonNull(governing, "governing");
        Objects.requireNonNull(where, "where");
    }
}
