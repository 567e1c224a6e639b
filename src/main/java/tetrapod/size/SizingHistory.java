package tetrapod.size;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A sizing run as plain values for a JSON file ({@code size-history.json}): the outcome, each
 * iteration's steel mass and largest utilisation (for a plot of the convergence), and each
 * group's section before and after. SI units (kg). No times, so that the same input gives the
 * same file.
 */
public final class SizingHistory {

    public static final String FORMAT = "tetrapod-size-history/1";

    private SizingHistory() { }

    /** The document for {@code result} of the model named {@code modelName}. */
    public static Map<String, Object> document(String modelName, SizingResult result) {
        Map<String, Object> doc = new LinkedHashMap<>();
        doc.put("format", FORMAT);
        doc.put("model", modelName);
        doc.put("target", result.target());
        doc.put("outcome", result.outcome().jsonName());
        doc.put("explanation", result.outcome().explanation());
        doc.put("massBefore", result.massBefore());
        doc.put("massAfter", result.massAfter());
        doc.put("connectionAllowance", result.connectionAllowance());
        List<Object> iterations = new ArrayList<>();
        for (Iteration i : result.history()) {
            Map<String, Object> row = new LinkedHashMap<>();
            row.put("iteration", i.number());
            row.put("steelMass", i.steelMass());
            row.put("maxUtilisation", i.maxUtilisation());
            row.put("changedGroups", i.changedGroups());
            iterations.add(row);
        }
        doc.put("iterations", iterations);
        List<Object> groups = new ArrayList<>();
        for (GroupResult g : result.groups()) {
            Map<String, Object> row = new LinkedHashMap<>();
            row.put("segment", g.group().segment());
            row.put("role", g.group().role().jsonName());
            row.put("before", state(g.before()));
            row.put("after", g.after() == null ? null : state(g.after()));
            groups.add(row);
        }
        doc.put("groups", groups);
        return doc;
    }

    private static Map<String, Object> state(GroupState s) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("section", s.section());
        m.put("utilisation", s.utilisation());
        m.put("member", s.member());
        m.put("mode", s.governing().mode().jsonName());
        m.put("clause", s.governing().clause());
        m.put("case", s.where().caseId());
        m.put("azimuthDeg", s.where().azimuthDeg());
        return m;
    }
}
