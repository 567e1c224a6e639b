package tetrapod.analysis;

/**
 * A member's largest tension and largest compression over every case (N, positive magnitudes);
 * either is null when the member never carries that sign of force.
 */
public record MemberAxialEnvelope(int member, Extreme tension, Extreme compression) { }
