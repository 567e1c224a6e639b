package tetrapod.generate;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.model.Face;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Material;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.SectionLookup;
import tetrapod.model.Support;
import tetrapod.model.Vec3;
import tetrapod.model.spec.ExplicitFrameSpec;
import tetrapod.model.spec.ExplicitFrameSpec.MemberSpec;
import tetrapod.model.spec.ExplicitFrameSpec.NodeSpec;
import tetrapod.model.spec.ExplicitFrameSpec.SupportSpec;
import tetrapod.model.spec.TowerSpec;

/**
 * Builds a {@link Frame} from a frame given node by node. Ids, and the order of nodes, members and
 * supports, are kept as given. Members are numbered segment 0, panel 0, face NONE; role GENERAL
 * when none is given. A frame without enough supports is still built: stability is the solver's
 * job.
 */
public final class ExplicitFrameBuilder {

    private static final String ROOT = "frame";

    private ExplicitFrameBuilder() { }

    /** The explicit frame of {@code spec} (which must have one). */
    public static Frame build(TowerSpec spec, SectionLookup sections, Material material) throws BadInputException {
        if (spec.frame() == null) {
            throw BadInputException.at(ROOT, "is required when base and segments are not given");
        }
        return build(spec.name(), spec.idealisation(), spec.frame(), sections, material);
    }

    /**
     * @throws BadInputException listing every problem, with paths under {@code frame}
     */
    public static Frame build(String name, Idealisation idealisation, ExplicitFrameSpec frame, SectionLookup sections,
                              Material material) throws BadInputException {
        List<Problem> problems = new ArrayList<>();
        Frame built = build(name, idealisation, frame, sections, material, problems);
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        return built;
    }

    /** The frame, or null with {@code problems} (output) filled when it cannot be built. */
    static Frame build(String name, Idealisation idealisation, ExplicitFrameSpec frame, SectionLookup sections,
                       Material material, List<Problem> problems) {
        Objects.requireNonNull(frame, "frame");
        int before = problems.size();
        if (idealisation == null) {
            problems.add(Problem.at("idealisation", "is required: \"continuous-legs\", \"truss\" or \"frame\""));
        }
        Map<Integer, Node> nodes = nodes(frame.nodes(), problems);
        List<Member> members = new ArrayList<>();
        Map<Integer, Integer> memberIds = new HashMap<>();
        for (int k = 0; k < frame.members().size(); k++) {
            MemberSpec spec = frame.members().get(k);
            String path = ROOT + ".members[" + k + "]";
            Integer first = memberIds.putIfAbsent(spec.id(), k);
            if (first != null) {
                problems.add(Problem.at(path + ".id", "member id " + spec.id() + " is already used by "
                        + ROOT + ".members[" + first + "]"));
            }
            member(spec, path, nodes, sections, idealisation, problems).ifPresent(members::add);
        }
        List<Support> supports = supports(frame.supports(), nodes, problems);
        if (problems.size() > before) {
            return null;
        }
        return new Frame(name, idealisation, material, List.copyOf(nodes.values()), members, supports);
    }

    private static Map<Integer, Node> nodes(List<NodeSpec> specs, List<Problem> problems) {
        Map<Integer, Node> nodes = new LinkedHashMap<>();
        Map<Integer, Integer> firstIndex = new HashMap<>();
        if (specs.isEmpty()) {
            problems.add(Problem.at(ROOT + ".nodes", "an explicit frame needs nodes"));
        }
        for (int k = 0; k < specs.size(); k++) {
            NodeSpec n = specs.get(k);
            String path = ROOT + ".nodes[" + k + "]";
            Integer first = firstIndex.putIfAbsent(n.id(), k);
            if (first != null) {
                problems.add(Problem.at(path + ".id", "node id " + n.id() + " is already used by "
                        + ROOT + ".nodes[" + first + "]"));
            } else if (!Double.isFinite(n.x()) || !Double.isFinite(n.y()) || !Double.isFinite(n.z())) {
                problems.add(Problem.at(path, "coordinates must be finite numbers in m"));
            } else {
                nodes.put(n.id(), new Node(n.id(), n.x(), n.y(), n.z()));
            }
        }
        return nodes;
    }

    private static Optional<Member> member(MemberSpec spec, String path, Map<Integer, Node> nodes,
                                           SectionLookup sections, Idealisation idealisation, List<Problem> problems) {
        Node i = endNode(spec.i(), path + ".i", nodes, problems);
        Node j = endNode(spec.j(), path + ".j", nodes, problems);
        Optional<Section> section = SectionResolver.find(sections, spec.section(), path + ".section", problems);
        if (i == null || j == null) {
            return Optional.empty();
        }
        if (spec.i() == spec.j()) {
            problems.add(Problem.at(path, "joins node " + spec.i() + " to itself"));
            return Optional.empty();
        }
        if (i.position().distanceTo(j.position()) <= NodeRegistry.TOLERANCE) {
            problems.add(Problem.at(path, "has zero length: nodes " + spec.i() + " and " + spec.j() + " coincide"));
            return Optional.empty();
        }
        Optional<Vec3> orientation = orientation(spec, path, i.position(), j.position(), problems);
        if (section.isEmpty() || orientation.isEmpty()) {
            return Optional.empty();
        }
        Role role = spec.role() == null ? Role.GENERAL : spec.role();
        boolean axialOnly = switch (idealisation) {
            case TRUSS -> true;
            case CONTINUOUS_LEGS -> role != Role.LEG && !spec.continuous();
            case FRAME -> !spec.continuous();
        };
        return Optional.of(new Member(spec.id(), spec.i(), spec.j(), role, 0, 0, Face.NONE, section.get(), axialOnly,
                orientation.get()));
    }

    private static Node endNode(int id, String path, Map<Integer, Node> nodes, List<Problem> problems) {
        Node node = nodes.get(id);
        if (node == null) {
            problems.add(Problem.at(path, "node " + id + " does not exist"));
        }
        return node;
    }

    /** The given local y axis with its axial part removed, or the default rule when none is given. */
    private static Optional<Vec3> orientation(MemberSpec spec, String path, Vec3 from, Vec3 to, List<Problem> problems) {
        List<Double> given = spec.orientation();
        if (given == null) {
            return Optional.of(Orientations.standard(from, to));
        }
        String where = path + ".orientation";
        if (given.size() != 3 || given.stream().anyMatch(v -> v == null || !Double.isFinite(v))) {
            problems.add(Problem.at(where, "must be three finite numbers [vx, vy, vz]"));
            return Optional.empty();
        }
        Vec3 wanted = new Vec3(given.get(0), given.get(1), given.get(2));
        Optional<Vec3> y = Orientations.perpendicularPart(wanted, to.minus(from).unit());
        if (y.isEmpty()) {
            problems.add(Problem.at(where, "is zero or parallel to the member axis; it must point across the member"));
        }
        return y;
    }

    private static List<Support> supports(List<SupportSpec> specs, Map<Integer, Node> nodes, List<Problem> problems) {
        List<Support> supports = new ArrayList<>();
        Map<Integer, Integer> firstIndex = new HashMap<>();
        for (int k = 0; k < specs.size(); k++) {
            SupportSpec s = specs.get(k);
            String path = ROOT + ".supports[" + k + "]";
            Integer first = firstIndex.putIfAbsent(s.node(), k);
            if (!nodes.containsKey(s.node())) {
                problems.add(Problem.at(path + ".node", "node " + s.node() + " does not exist"));
            } else if (first != null) {
                problems.add(Problem.at(path + ".node", "node " + s.node() + " is already supported by "
                        + ROOT + ".supports[" + first + "]"));
            } else if (s.restraint() == null) {
                problems.add(Problem.at(path + ".restraint", "is required"));
            } else {
                supports.add(new Support(s.node(), s.restraint()));
            }
        }
        return supports;
    }
}
