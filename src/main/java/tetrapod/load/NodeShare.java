package tetrapod.load;

/** The fraction of a load that goes to one node. */
public record NodeShare(int node, double fraction) { }
