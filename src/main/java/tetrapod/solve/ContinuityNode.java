package tetrapod.solve;

/**
 * A node inside a straight diagonal that only redundants join, held across the member by
 * the member's bending stiffness (pin-ended bracing, every idealisation): see {@link ContinuityElement}.
 *
 * @param node      node id
 * @param lineStart id of the neighbouring node on one side along the member line
 * @param lineEnd   id of the neighbouring node on the other side
 * @param stiffness transverse stiffness k = 3EIL/(a²b²), N/m
 */
public record ContinuityNode(int node, int lineStart, int lineEnd, double stiffness) { }
