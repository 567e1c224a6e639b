package tetrapod.io;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import tetrapod.model.Restraint;
import tetrapod.model.Role;
import tetrapod.model.Vec3;
import tetrapod.model.spec.ExplicitFrameSpec;
import tetrapod.model.spec.ExplicitFrameSpec.MemberSpec;
import tetrapod.model.spec.ExplicitFrameSpec.NodeSpec;
import tetrapod.model.spec.ExplicitFrameSpec.SupportSpec;
import tetrapod.model.spec.SupportType;

/** Reads {@code frame}: nodes, members and supports given one by one. */
final class FrameReader {

    static final List<String> FRAME_KEYS = List.of("nodes", "members", "supports");
    static final List<String> NODE_KEYS = List.of("id", "x", "y", "z");
    static final List<String> MEMBER_KEYS = List.of("id", "i", "j", "section", "role", "continuous", "orientation");
    static final List<String> SUPPORT_KEYS = List.of("node", "restraint", "type");
    /** An orientation within this sine of the member axis does not define a plane. */
    private static final double PARALLEL_SINE = 1e-6;

    private final Problems problems;
    private final SectionNames sectionNames;
    /** Node position by id, for the nodes read without problems. */
    private final Map<Integer, Vec3> nodes = new HashMap<>();
    private final List<Integer> unreadableNodes = new ArrayList<>();

    FrameReader(Problems problems, SectionNames sectionNames) {
        this.problems = problems;
        this.sectionNames = sectionNames;
    }

    /** The frame, or null when anything in it has a problem (reported). */
    ExplicitFrameSpec read(Fields frame) {
        int before = problems.count();
        frame.allowOnly(FRAME_KEYS);
        List<NodeSpec> nodeSpecs = list(frame, "nodes", "node", this::node);
        List<MemberSpec> members = list(frame, "members", "member", this::member);
        List<SupportSpec> supports = list(frame, "supports", "support", this::support);
        return problems.count() == before ? new ExplicitFrameSpec(nodeSpecs, members, supports) : null;
    }

    /**
     * Whether node {@code id} exists. True also when the file's node list could not be read
     * completely, so that one problem does not cause a cascade of "does not exist".
     */
    boolean nodeExists(int id) {
        return nodes.containsKey(id) || !unreadableNodes.isEmpty();
    }

    private interface ItemReader<T> {
        T read(Fields item, Map<Integer, String> idsSeen);
    }

    private <T> List<T> list(Fields frame, String key, String what, ItemReader<T> reader) {
        JsonNode array = frame.array(key, true);
        if (array == null) {
            if ("nodes".equals(key)) {
                unreadableNodes.add(-1);
            }
            return List.of();
        }
        if (array.isEmpty()) {
            problems.add(frame.path(key), "must list at least one " + what);
        }
        int most = "members".equals(key) ? PhysicalLimits.MAX_FRAME_MEMBERS : PhysicalLimits.MAX_FRAME_NODES;
        if (array.size() > most) {
            problems.add(frame.path(key), "lists " + array.size() + " items; at most " + most + " are allowed");
            if ("nodes".equals(key)) {
                unreadableNodes.add(-1);
            }
            return List.of();
        }
        List<T> items = new ArrayList<>();
        Map<Integer, String> idsSeen = new HashMap<>();
        for (int k = 0; k < array.size(); k++) {
            Fields item = Fields.of(array.get(k), JsonPaths.index(frame.path(key), k), problems);
            T value = item == null ? null : reader.read(item, idsSeen);
            if (value != null) {
                items.add(value);
            } else if ("nodes".equals(key)) {
                unreadableNodes.add(k);
            }
        }
        return items;
    }

    private Integer id(Fields f, Map<Integer, String> idsSeen, String what) {
        Integer id = f.requiredWhole("id", Integer.MIN_VALUE, Integer.MAX_VALUE);
        if (id != null) {
            String first = idsSeen.putIfAbsent(id, f.path());
            if (first != null) {
                problems.add(f.path("id"), what + " id " + id + " is already used by " + first);
                return null;
            }
        }
        return id;
    }

    private NodeSpec node(Fields f, Map<Integer, String> idsSeen) {
        int before = problems.count();
        f.allowOnly(NODE_KEYS);
        Integer id = id(f, idsSeen, "node");
        double x = f.requiredNumber("x", PhysicalLimits.COORDINATE, "m");
        double y = f.requiredNumber("y", PhysicalLimits.COORDINATE, "m");
        double z = f.requiredNumber("z", PhysicalLimits.COORDINATE, "m");
        if (problems.count() > before) {
            return null;
        }
        nodes.put(id, new Vec3(x, y, z));
        return new NodeSpec(id, x, y, z);
    }

    private Integer existingNode(Fields f, String key) {
        Integer node = f.requiredWhole(key, Integer.MIN_VALUE, Integer.MAX_VALUE);
        if (node != null && !nodeExists(node)) {
            problems.add(f.path(key), "node " + node + " does not exist");
            return null;
        }
        return node;
    }

    private MemberSpec member(Fields f, Map<Integer, String> idsSeen) {
        int before = problems.count();
        f.allowOnly(MEMBER_KEYS);
        Integer id = id(f, idsSeen, "member");
        Integer i = existingNode(f, "i");
        Integer j = existingNode(f, "j");
        String section = f.has("section")
                ? sectionNames.check(f.get("section"), f.path("section"), problems)
                : missingSection(f);
        Role role = Choices.ROLE.optional(f, "role", Role.GENERAL);
        Boolean continuous = f.optionalBool("continuous", false);
        List<Double> orientation = f.has("orientation")
                ? Values.numbers(f.get("orientation"), f.path("orientation"), PhysicalLimits.ORIENTATION, "", problems)
                : null;
        if (i != null && j != null) {
            checkGeometry(f, i, j, orientation);
        }
        if (problems.count() > before) {
            return null;
        }
        return new MemberSpec(id, i, j, section, role, continuous, orientation);
    }

    private String missingSection(Fields f) {
        f.missing("section", "a section name");
        return null;
    }

    private void checkGeometry(Fields f, int i, int j, List<Double> orientation) {
        if (i == j) {
            problems.add(f.path("j"), "a member must join two different nodes; i is also " + i);
            return;
        }
        Vec3 a = nodes.get(i);
        Vec3 b = nodes.get(j);
        if (a == null || b == null) {
            return;
        }
        Vec3 axis = b.minus(a);
        if (axis.norm() == 0) {
            problems.add(f.path(), "nodes " + i + " and " + j + " are at the same point: the member would have no length");
            return;
        }
        if (axis.norm() < PhysicalLimits.MIN_MEMBER_LENGTH) {
            problems.add(f.path(), "nodes " + i + " and " + j + " are " + Numbers.format(Math.round(axis.norm() * 1e6) / 1e3)
                    + " mm apart; a member must be at least " + Numbers.format(PhysicalLimits.MIN_MEMBER_LENGTH * 1000)
                    + " mm long");
            return;
        }
        if (orientation == null) {
            return;
        }
        String path = f.path("orientation");
        if (orientation.size() != 3) {
            problems.add(path, "must have 3 components [vx, vy, vz], had " + orientation.size());
            return;
        }
        Vec3 v = new Vec3(orientation.get(0), orientation.get(1), orientation.get(2));
        if (v.norm() == 0) {
            problems.add(path, "must not be the zero vector");
        } else if (axis.cross(v).norm() <= PARALLEL_SINE * axis.norm() * v.norm()) {
            problems.add(path, "is parallel to the member (node " + i + " to node " + j
                    + "); it must point across the member to fix its local y axis");
        }
    }

    private SupportSpec support(Fields f, Map<Integer, String> nodesSupported) {
        int before = problems.count();
        f.allowOnly(SUPPORT_KEYS);
        Integer node = existingNode(f, "node");
        if (node != null) {
            String first = nodesSupported.putIfAbsent(node, f.path());
            if (first != null) {
                problems.add(f.path("node"), "node " + node + " already has a support (" + first + ")");
            }
        }
        Restraint restraint = null;
        if (f.has("restraint") && f.has("type")) {
            problems.add(f.path("type"), "give either restraint or type, not both");
        } else if (f.has("restraint")) {
            restraint = restraint(f.get("restraint"), f.path("restraint"));
        } else if (f.has("type")) {
            SupportType type = Choices.SUPPORT_TYPE.required(f, "type");
            restraint = type == null ? null : type == SupportType.FIXED ? Restraint.FIXED : Restraint.PINNED;
        } else {
            f.missing("restraint", "[ux, uy, uz, rx, ry, rz] as 0/1, or give type: pinned or fixed");
        }
        return problems.count() == before ? new SupportSpec(node, restraint) : null;
    }

    private Restraint restraint(JsonNode node, String path) {
        if (Values.array(node, path, problems) == null) {
            return null;
        }
        if (node.size() != Restraint.DOF_NAMES.size()) {
            problems.add(path, "must have 6 flags [ux, uy, uz, rx, ry, rz], each 0 or 1; had " + node.size());
            return null;
        }
        int before = problems.count();
        List<Boolean> flags = new ArrayList<>();
        for (int k = 0; k < node.size(); k++) {
            Integer flag = Values.whole(node.get(k), JsonPaths.index(path, k), 0, 1, problems);
            flags.add(flag != null && flag == 1);
        }
        if (problems.count() > before) {
            return null;
        }
        if (!flags.contains(true)) {
            problems.add(path, "holds nothing; hold at least one direction or leave the support out");
            return null;
        }
        return Restraint.of(flags);
    }
}
