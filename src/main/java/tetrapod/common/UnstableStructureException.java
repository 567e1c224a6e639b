package tetrapod.common;

import java.util.List;

/**
 * The structure is a mechanism: some node can move without resistance in some direction.
 * The message names the free node(s) and direction(s) and the likely cause.
 */
public final class UnstableStructureException extends Exception {

    /** A degree of freedom found free: node id and direction name (ux, uy, uz, rx, ry, rz). */
    public record FreeDof(int node, String dof) { }

    private final List<FreeDof> freeDofs;

    public UnstableStructureException(String message, List<FreeDof> freeDofs) {
        super(message);
        this.freeDofs = List.copyOf(freeDofs);
    }

    public List<FreeDof> freeDofs() {
        return freeDofs;
    }
}
