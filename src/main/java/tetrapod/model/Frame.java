package tetrapod.model;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * The analysis model: nodes, members and supports, in one material. Immutable.
 * Node order is the order of degrees of freedom the generator chose (bottom-up for towers).
 */
public record Frame(String name, Idealisation idealisation, Material material,
                    List<Node> nodes, List<Member> members, List<Support> supports) {

    public Frame {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(idealisation, "idealisation");
        Objects.requireNonNull(material, "material");
        nodes = List.copyOf(nodes);
        members = List.copyOf(members);
        supports = List.copyOf(supports);
    }

    /** Map from node id to its position in {@link #nodes()}. */
    public Map<Integer, Integer> nodeIndex() {
        Map<Integer, Integer> index = new HashMap<>(nodes.size() * 2);
        for (int k = 0; k < nodes.size(); k++) {
            index.put(nodes.get(k).id(), k);
        }
        return index;
    }

    /** Lengths of all members in the order of {@link #members()}, m. */
    public double[] memberLengths() {
        Map<Integer, Integer> index = nodeIndex();
        double[] lengths = new double[members.size()];
        for (int k = 0; k < lengths.length; k++) {
            Member m = members.get(k);
            lengths[k] = nodes.get(index.get(m.i())).position().distanceTo(nodes.get(index.get(m.j())).position());
        }
        return lengths;
    }
}
