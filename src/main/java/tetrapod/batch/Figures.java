package tetrapod.batch;

import java.io.Serializable;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * What the summary shows of one analysis, from its results document. Forces in N, mass in kg; a
 * figure the results do not have is null (never NaN).
 *
 * @param maxUtilisation      largest strength utilisation of any member (null without member checks)
 * @param member              that member's id
 * @param role                its role (leg, diagonal, ...)
 * @param azimuthDeg          the governing wind azimuth, degrees (null when a case without wind governs)
 * @param requirementBreaches requirements not met (rules that do not depend on the load)
 * @param footingUtilisation  largest footing check utilisation (null without footing checks)
 * @param legCompression      largest leg base compression, N (≥ 0)
 * @param legUplift           largest leg base uplift, N (≥ 0; 0 when there is none)
 * @param steelMass           steel mass with the connection allowance, kg
 * @param serviceability      "met", "not met", or null when the model sets no movement limit
 */
public record Figures(Double maxUtilisation, Integer member, String role, Double azimuthDeg, int requirementBreaches,
                      Double footingUtilisation, double legCompression, double legUplift, double steelMass,
                      String serviceability) implements Serializable {

    /** Whether something is overstressed or some requirement is not met. */
    public boolean fails() {
        return (maxUtilisation != null && maxUtilisation > 1.0) || (footingUtilisation != null && footingUtilisation > 1.0)
                || requirementBreaches > 0;
    }

    Map<String, Object> toMap() {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("maxUtilisation", maxUtilisation);
        m.put("member", member);
        m.put("role", role);
        m.put("azimuthDeg", azimuthDeg);
        m.put("requirementBreaches", requirementBreaches);
        m.put("footingUtilisation", footingUtilisation);
        m.put("legCompression", legCompression);
        m.put("legUplift", legUplift);
        m.put("steelMass", steelMass);
        m.put("serviceability", serviceability);
        return m;
    }

    static Figures fromMap(Map<?, ?> m) {
        return new Figures(num(m.get("maxUtilisation")), m.get("member") == null ? null : ((Number) m.get("member")).intValue(),
                (String) m.get("role"), num(m.get("azimuthDeg")), ((Number) m.get("requirementBreaches")).intValue(),
                num(m.get("footingUtilisation")), num(m.get("legCompression")), num(m.get("legUplift")),
                num(m.get("steelMass")), (String) m.get("serviceability"));
    }

    private static Double num(Object o) {
        return o == null ? null : ((Number) o).doubleValue();
    }
}
