package tetrapod.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import tetrapod.check.RequirementVerdict;
import tetrapod.report.Rows.RequirementRow;

/** The requirements' verdict line from results.json rows. */
final class RequirementsVerdict {

    private RequirementsVerdict() { }

    /** @param broken the requirements not met, in the order to name them (input) */
    static String text(List<RequirementRow> broken) {
        Map<String, List<Integer>> byRule = new LinkedHashMap<>();
        for (RequirementRow q : broken) {
            byRule.computeIfAbsent(q.ruleLabel(), k -> new ArrayList<>()).add(q.member());
        }
        String line = RequirementVerdict.line(byRule);
        return Character.toUpperCase(line.charAt(0)) + line.substring(1) + ".";
    }
}
