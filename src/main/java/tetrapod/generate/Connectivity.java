package tetrapod.generate;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import tetrapod.model.Member;
import tetrapod.model.Node;

/** Whether a set of nodes and members forms one connected graph (union–find). */
final class Connectivity {

    private Connectivity() { }

    static boolean isConnected(List<Node> nodes, List<Member> members) {
        if (nodes.isEmpty()) {
            return true;
        }
        Map<Integer, Integer> index = new HashMap<>();
        for (int k = 0; k < nodes.size(); k++) {
            index.put(nodes.get(k).id(), k);
        }
        int[] parent = new int[nodes.size()];
        for (int k = 0; k < parent.length; k++) {
            parent[k] = k;
        }
        int components = nodes.size();
        for (Member m : members) {
            int a = root(parent, index.get(m.i()));
            int b = root(parent, index.get(m.j()));
            if (a != b) {
                parent[a] = b;
                components--;
            }
        }
        return components == 1;
    }

    private static int root(int[] parent, int k) {
        while (parent[k] != k) {
            parent[k] = parent[parent[k]];
            k = parent[k];
        }
        return k;
    }
}
