package tetrapod.solve;

/**
 * Equation numbers of the nodes' degrees of freedom. Nodes are taken in the chosen order
 * (frame order or reverse Cuthill–McKee, whichever gives the smaller profile); within a node its
 * DOFs come in the order ux, uy, uz[, rx, ry, rz] of its basis (see {@link NodeConstraints}).
 * Free DOFs get equations 0 .. free−1; eliminated DOFs (supports and auto-restraints) get their
 * own numbers 0 .. restrained−1 in the same sweep, for the reaction rows.
 */
final class DofNumbering {

    private final int dofsPerNode;
    private final int[] code; // ≥ 0: free equation; < 0: −1 − restrained index
    private final int free;
    private final int[] restrainedNode;
    private final int[] restrainedDof;
    private final int[] freeNode;
    private final int[] freeDof;

    /**
     * @param order       input: node indices in equation order
     * @param dofsPerNode 3 (truss) or 6 (frame)
     */
    DofNumbering(int[] order, int dofsPerNode, NodeConstraints constraints) {
        this.dofsPerNode = dofsPerNode;
        int nodes = order.length;
        code = new int[nodes * dofsPerNode];
        int restrained = 0;
        int f = 0;
        for (int n : order) {
            for (int k = 0; k < dofsPerNode; k++) {
                if (constraints.kind(n, k) == NodeConstraints.FREE) {
                    f++;
                } else {
                    restrained++;
                }
            }
        }
        free = f;
        restrainedNode = new int[restrained];
        restrainedDof = new int[restrained];
        freeNode = new int[free];
        freeDof = new int[free];
        int nextFree = 0;
        int nextRestrained = 0;
        for (int n : order) {
            for (int k = 0; k < dofsPerNode; k++) {
                if (constraints.kind(n, k) == NodeConstraints.FREE) {
                    freeNode[nextFree] = n;
                    freeDof[nextFree] = k;
                    code[n * dofsPerNode + k] = nextFree++;
                } else {
                    restrainedNode[nextRestrained] = n;
                    restrainedDof[nextRestrained] = k;
                    code[n * dofsPerNode + k] = -1 - nextRestrained++;
                }
            }
        }
    }

    int dofsPerNode() {
        return dofsPerNode;
    }

    /** ≥ 0: the free equation of DOF k of node index n; < 0: −1 − its restrained number. */
    int code(int n, int k) {
        return code[n * dofsPerNode + k];
    }

    int freeCount() {
        return free;
    }

    int restrainedCount() {
        return restrainedNode.length;
    }

    int restrainedNode(int r) {
        return restrainedNode[r];
    }

    int restrainedDof(int r) {
        return restrainedDof[r];
    }

    int freeNode(int equation) {
        return freeNode[equation];
    }

    int freeDof(int equation) {
        return freeDof[equation];
    }
}
