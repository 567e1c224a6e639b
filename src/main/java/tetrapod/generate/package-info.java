/**
 * From a tower spec to the analysis model: {@link tetrapod.generate.TowerGenerator#generate} builds
 * a {@link tetrapod.generate.Tower} (its {@link tetrapod.model.Frame}, panel levels and panels) from
 * base and segments, or from an explicit frame ({@link tetrapod.generate.ExplicitFrameBuilder}).
 *
 * <h2>Geometry conventions</h2>
 * <ul>
 * <li><b>Axes.</b> z up; the base is centred on the z axis. Leg 0 stands at (−X/2, −Y/2), leg 1 at
 *     (+X/2, −Y/2), leg 2 at (+X/2, +Y/2), leg 3 at (−X/2, +Y/2): counter-clockwise seen from above.
 *     X and Y are the leg spacings at that height; they vary linearly within each segment from its
 *     bottom widths (the previous segment's top widths, or the base's) to its top widths.</li>
 * <li><b>Faces.</b> Face k runs from leg k to leg k+1 (mod 4) and is named by its outward normal:
 *     legs 0–1 {@code Y_MINUS}, 1–2 {@code X_PLUS}, 2–3 {@code Y_PLUS}, 3–0 {@code X_MINUS}. Every
 *     face pattern is laid out in its face's own direction, from leg k to leg k+1, so a square tower
 *     maps onto itself under a 90° rotation about z (leg k → leg k+1).</li>
 * <li><b>Panels.</b> A segment's panels have equal heights unless {@code panelHeights} are given
 *     (they must add up to the segment height within 1 mm; the top level is the segment top
 *     exactly). Segment and panel numbers in {@link tetrapod.model.Member} are 1-based (segment 1 is
 *     {@code segments[0]}, panel 1 the bottom panel of its segment); explicit frames use 0.</li>
 * <li><b>X bracing.</b> Both diagonals of every panel face. With {@code crossingConnected} they are
 *     joined where they truly cross in the face plane (in a tapered face, a trapezoid with half
 *     widths a at the bottom and b at the top, at the height fraction a/(a+b)) and each is split
 *     there; otherwise they pass each other without a node.</li>
 * <li><b>K bracing.</b> Two diagonals from the panel's bottom corners to the midpoint of its top
 *     level; that level's horizontal (if it has one) is split there. A K panel without that
 *     horizontal is a mechanism: it is generated anyway, for the solver to report.</li>
 * <li><b>Single bracing.</b> One diagonal per panel face: odd panels of a segment (1, 3, ...) from
 *     the bottom of leg k to the top of leg k+1, even panels from the bottom of leg k+1 to the top
 *     of leg k. The count restarts in each segment: panel 1 of every segment starts at the bottom
 *     of leg k.</li>
 * <li><b>Horizontals.</b> A panel level carries four horizontals (one per face) when the segment
 *     below or above asks for it: {@code all} asks for every panel level of the segment, its bottom
 *     and top included; {@code ends} for its bottom and top only; {@code none} for none. At a segment
 *     boundary the horizontal belongs to the lower segment (section, segment and panel numbers from
 *     there, counted in its top panel) unless only the upper segment asks for it (then counted in
 *     the upper segment's panel 1). Inside a segment a horizontal is counted in the panel below
 *     it. The level z = 0 is treated like any other: with {@code all} or {@code ends} in segment 1
 *     the legs are tied by horizontals at the base too (counted in panel 1).</li>
 * <li><b>Redundants.</b> With r = 1 or 2, each panel gets r intermediate levels at the height
 *     fractions k/(r+1). There every leg gets a node (halving or thirding its buckling length),
 *     every diagonal gets a node where it passes the level, and redundant members join, within each
 *     face, leg node → diagonal nodes in order along the face → the other leg node. Where two
 *     diagonals pass the same point (an X crossing exactly at that level, as in a prismatic panel
 *     with r = 1) the nodes merge, and the diagonals are then joined there even when
 *     {@code crossingConnected} is false.</li>
 * <li><b>Plan bracing.</b> At each level of {@code planBracingLevels} (each must be a panel level
 *     within 1 mm): diagonals from leg 0 to leg 2 and from leg 1 to leg 3, joined at a centre node
 *     on the z axis. Role PLAN, face NONE, section {@code plan} of the segment below the level
 *     (segment 1 at z = 0), counted in the panel below (panel 1 at z = 0).</li>
 * <li><b>Legs.</b> Role LEG, face NONE, split at every node on the leg line (panel levels and
 *     redundant levels).</li>
 * <li><b>Nodes and numbering.</b> Nodes closer than 1e-6 m are merged; members whose ends merged
 *     (zero length) and repeated members (same two nodes; the first generated is kept) are dropped.
 *     Nodes are numbered 1..n bottom-up so the stiffness matrix is banded: by z (heights within
 *     1e-6 m are one level, made exactly equal), then by angle about the z axis counter-clockwise
 *     from the direction of leg 0 at that height (−135° in a square tower; a node on the axis
 *     last), then by distance from the axis. Members are numbered 1..m by (lower node id, upper
 *     node id), with i the lower and j the upper id. Every node is connected.</li>
 * <li><b>Supports.</b> The four leg nodes at z = 0, pinned (translations held) or fixed (all six
 *     degrees of freedom held) as the spec says. A plan bracing centre node at z = 0 is not
 *     supported.</li>
 * <li><b>Idealisation.</b> Truss: every member axial only. Frame: legs are continuous
 *     beam-columns, all other members axial only. Explicit frames: in a frame, members marked
 *     {@code continuous} are beam-columns, the others axial only.</li>
 * <li><b>Member orientation</b> (local y, a unit vector perpendicular to the member axis). Legs:
 *     the level direction from the leg towards the tower axis, with its component along the leg
 *     removed (for an angle leg, its symmetry axis u–u). Other members: the unit vector of Z × x
 *     (level, perpendicular to the member), or global X for a vertical member. Explicit frames: the
 *     given vector with its component along the member removed (rejected when parallel to it), or
 *     the Z × x rule for every role (an explicit frame has no tower axis).</li>
 * <li><b>Panels for loads.</b> Each {@link tetrapod.generate.Panel} gives its z range, the leg nodes
 *     at its bottom and top, and the members counted in it per leg, per face and in plan; every
 *     member is counted in exactly one panel.</li>
 * </ul>
 */
package tetrapod.generate;
