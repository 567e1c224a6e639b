package tetrapod.check;

import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/** The one-line verdict on the requirements (rules that do not depend on the load), for people. */
public final class RequirementVerdict {

    /** Members named per rule before "and n more". */
    static final int NAMED = 10;

    private RequirementVerdict() { }

    /**
     * @param brokenByRule rule label → ids of the members that break it, in the order to print (input)
     * @return e.g. "3 members break a requirement: slenderness limit (members 12, 31, 40)", or
     *         "every requirement is met"
     */
    public static String line(Map<String, List<Integer>> brokenByRule) {
        Set<Integer> members = new TreeSet<>();
        brokenByRule.values().forEach(members::addAll);
        if (members.isEmpty()) {
            return "every requirement is met (slenderness limits, bolt end/edge distances and spacing, "
                    + "width-to-thickness limits)";
        }
        StringBuilder out = new StringBuilder();
        out.append(members.size()).append(members.size() == 1 ? " member breaks" : " members break")
                .append(" a requirement: ");
        String separator = "";
        for (Map.Entry<String, List<Integer>> e : brokenByRule.entrySet()) {
            List<Integer> ids = e.getValue();
            if (ids.isEmpty()) {
                continue;
            }
            out.append(separator).append(e.getKey()).append(ids.size() == 1 ? " (member " : " (members ");
            for (int k = 0; k < Math.min(NAMED, ids.size()); k++) {
                out.append(k == 0 ? "" : ", ").append(ids.get(k));
            }
            if (ids.size() > NAMED) {
                out.append(" and ").append(ids.size() - NAMED).append(" more");
            }
            out.append(')');
            separator = "; ";
        }
        return out.toString();
    }
}
