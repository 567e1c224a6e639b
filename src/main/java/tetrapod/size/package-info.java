/**
 * Automatic member sizing: the lightest allowed section per group (role × segment) that keeps
 * every member at or below a target utilisation over every load case.
 *
 * <p>Entry point: {@link tetrapod.size.Sizer#size} with a {@link tetrapod.size.SizingModel} (the
 * spec and what it builds) and {@link tetrapod.size.SizingOptions}; it returns a
 * {@link tetrapod.size.SizingResult} (the sized spec, each group before and after, the iteration
 * history; {@link tetrapod.size.SizingHistory} turns it into plain values for a JSON file).
 * {@link tetrapod.size.FastEnvelope} is the analysis it repeats: the same member envelopes as
 * {@code Analysis.run}, with member checks only at the cases that can govern. The practical rules
 * (minimum sizes, holes on the flat, bracing no wider than the leg, legs not lighter downwards)
 * are in {@link tetrapod.size.SizingRules} and {@link tetrapod.size.SectionRules}. SI units.
 */
package tetrapod.size;
