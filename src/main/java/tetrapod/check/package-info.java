/**
 * Member, connection and foundation checks, and the hand method for leg base forces.
 *
 * <p>Entry points: {@link tetrapod.check.MemberChecker} (one frame, one method, one load case at a
 * time; forces as {@link tetrapod.check.MemberForces}, N and N·m, tension positive),
 * {@link tetrapod.check.FoundationCheck} (one leg's footing; forces as
 * {@link tetrapod.check.LegBaseForces} from the support reaction) and
 * {@link tetrapod.check.HandMethod}. Each published method is one class of a sealed family:
 * {@link tetrapod.check.MemberCheck} (EN 1993, ASCE 10), {@link tetrapod.check.BoltCheck},
 * {@link tetrapod.check.AnchorRodCheck}. Every check returns a
 * {@link tetrapod.check.CheckResult}: utilisation (demand / resistance), mode, clause and a note.
 * Envelopes over load cases and azimuths are accumulated by the caller, case by case, in
 * {@link tetrapod.check.MemberEnvelope} and {@link tetrapod.check.FoundationEnvelope} (each keeps
 * the largest value with its case and azimuth; ties keep the earlier case).
 * SI units throughout. Formulas and sources: docs/methods.md (Checks).
 */
package tetrapod.check;
