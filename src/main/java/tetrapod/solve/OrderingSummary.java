package tetrapod.solve;

/**
 * The node ordering used and its band measures on the node graph (in nodes, not equations), with
 * those of the frame's own order for comparison.
 *
 * @param used           the ordering chosen
 * @param bandwidth      max |position(i) − position(j)| over members
 * @param profile        Σ over nodes of (position − lowest position among it and its neighbours)
 * @param givenBandwidth bandwidth of the frame's order
 * @param givenProfile   profile of the frame's order
 */
public record OrderingSummary(NodeOrdering used, int bandwidth, long profile, int givenBandwidth, long givenProfile) { }
