package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Issue 11, "Done when", on every bundled example: an independent re-solve from results.json alone
 * agrees with the cases reported in it; the applied loads balance the support reactions alone;
 * no automatic restraint carries load. The re-solve ({@link ResultsStructure}) reads only the
 * document's plain JSON and builds its own dense stiffness.
 */
class IndependentResolveTest {

    /** Issue 11: the re-solve agrees to 1e-6 (max-norm, relative; see {@link Agreement}). */
    private static final double AGREEMENT = 1e-6;
    /** Issue 11: |Σ loads + Σ reactions| ≤ 1e-9 · Σ|F|. */
    private static final double BALANCE = 1e-9;
    /** Issue 11: no automatic restraint carries more than 1e-6 of a case's total load. */
    private static final double LOST = 1e-6;

    private static final Map<Path, Resolved> SOLVED = new ConcurrentHashMap<>();

    /**
     * A document with its re-solve: per reported case, the loads, displacements and K·u − F (the
     * forces of supports and restraints), 6 per node index.
     */
    private record Resolved(JsonNode doc, List<JsonNode> cases, ResultsStructure structure, double[][] loads, double[][] u,
                            double[][] residual) {

        /** Σ|F| + Σ|M|/L over the load components of case c, N (L the structure size). */
        double totalLoad(int c) {
            double size = structure.size();
            double total = 0;
            for (int q = 0; q < loads[c].length; q++) {
                total += Math.abs(loads[c][q]) / (q % 6 < 3 ? 1 : size);
            }
            return total;
        }
    }

    static Stream<Path> models() throws IOException {
        return ExampleRuns.models();
    }

    private static Resolved resolved(Path model) {
        return SOLVED.computeIfAbsent(model, m -> {
            JsonNode doc = ExampleRuns.results(m);
            ResultsStructure structure = new ResultsStructure(doc.get("model"));
            // the cases written with their vectors (docs/methods.md, "The cases written in full")
            List<JsonNode> cases = new ArrayList<>();
            doc.get("cases").forEach(c -> {
                if (c.has("loads")) {
                    cases.add(c);
                }
            });
            double[][] loads = new double[cases.size()][];
            for (int c = 0; c < cases.size(); c++) {
                loads[c] = structure.loads(cases.get(c));
            }
            double[][] u = structure.solve(loads);
            double[][] residual = new double[u.length][];
            for (int c = 0; c < u.length; c++) {
                residual[c] = structure.residual(u[c], loads[c]);
            }
            return new Resolved(doc, cases, structure, loads, u, residual);
        });
    }

    @ParameterizedTest
    @MethodSource("models")
    void independentResolveAgreesWithEveryReportedCase(Path model) {
        Resolved r = resolved(model);
        ResultsStructure s = r.structure();
        List<JsonNode> cases = r.cases();
        assertTrue(cases.size() > 0, "no case written with its vectors");
        for (int c = 0; c < cases.size(); c++) {
            JsonNode reported = cases.get(c);
            String id = model.getFileName() + " case " + reported.get("id").asText();
            double[] u = r.u()[c];
            double[] residual = r.residual()[c];
            Agreement displacements = new Agreement();
            assertEquals(s.nodes(), reported.get("displacements").size(), id + ": displacements of every node");
            for (JsonNode d : reported.get("displacements")) {
                int n = s.index(d.get("node"));
                for (int q = 0; q < 6; q++) {
                    displacements.add(q / 3, u[6 * n + q], d.get("u").get(q).asDouble());
                }
            }
            // source of every expected value here: the independent dense re-solve from results.json
            displacements.assertWithin(AGREEMENT, id + " displacements (translations m, rotations rad)");
            Agreement reactions = new Agreement();
            assertEquals(r.doc().get("model").get("supports").size(), reported.get("reactions").size(),
                    id + ": a reaction per support");
            for (JsonNode f : reported.get("reactions")) {
                int n = s.index(f.get("node"));
                for (int q = 0; q < 6; q++) {
                    double value = f.get("F").get(q).asDouble();
                    if (s.supportHolds(n, q)) {
                        reactions.add(q / 3, residual[6 * n + q], value);
                    } else {
                        assertEquals(0, value, 0, id + ": reaction component " + q + " that the support at node index "
                                + n + " does not hold");
                    }
                }
            }
            reactions.assertWithin(AGREEMENT, id + " reactions (forces N, moments N·m)");
            Agreement members = new Agreement();
            for (JsonNode f : reported.get("memberForces")) {
                int member = f.get("member").asInt();
                double[][] expected = s.endForces(member, u);
                double n = f.get("N").asDouble();
                assertEquals(!f.has("endI"), s.axialOnly(member), id + ": member " + member
                        + " writes its end forces exactly when it is not axial-only");
                for (int q = 0; q < 6; q++) {
                    // an axial-only member's end forces are -N and N along its axis
                    members.add(q / 3, expected[0][q], f.has("endI") ? f.get("endI").get(q).asDouble() : q == 0 ? -n : 0);
                    members.add(q / 3, expected[1][q], f.has("endJ") ? f.get("endJ").get(q).asDouble() : q == 0 ? n : 0);
                }
                members.add(0, expected[1][0], n); // N = end action at j along x, tension positive
            }
            members.assertWithin(AGREEMENT, id + " member end forces (N, N·m)");
        }
    }

    /** Statics on the reported numbers alone: loads and support reactions, forces and moments about the origin. */
    @ParameterizedTest
    @MethodSource("models")
    void loadsBalanceTheSupportReactionsAlone(Path model) {
        Resolved r = resolved(model);
        ResultsStructure s = r.structure();
        double size = s.size();
        List<JsonNode> cases = r.cases();
        for (int c = 0; c < cases.size(); c++) {
            JsonNode reported = cases.get(c);
            double[] sum = new double[6];
            for (int n = 0; n < s.nodes(); n++) {
                accumulate(sum, s.position(n), Arrays.copyOfRange(r.loads()[c], 6 * n, 6 * n + 6));
            }
            double scale = r.totalLoad(c);
            for (JsonNode reaction : reported.get("reactions")) {
                accumulate(sum, s.position(s.index(reaction.get("node"))), six(reaction.get("F")));
            }
            double force = Math.sqrt(sum[0] * sum[0] + sum[1] * sum[1] + sum[2] * sum[2]);
            double moment = Math.sqrt(sum[3] * sum[3] + sum[4] * sum[4] + sum[5] * sum[5]);
            String id = model.getFileName() + " case " + reported.get("id").asText();
            assertTrue(scale > 0, id + ": no load");
            // statics: loads plus support reactions sum to zero, forces and moments about the origin
            assertTrue(force <= BALANCE * scale, id + ": |ΣF + ΣR| = " + force + " N, Σ|F| = " + scale + " N");
            assertTrue(moment / size <= BALANCE * scale, id + ": |ΣM₀| = " + moment + " N·m over L = " + size + " m");
        }
    }

    /**
     * Every listed largest force is at most 1e-6 of the smallest reported case's total load
     * (Σ|F| + Σ|M|/L; a moment restraint against that × L), and the re-solve's own restraint
     * forces (K·u − F along each restraint) stay below 1e-6 of each case's total.
     */
    @ParameterizedTest
    @MethodSource("models")
    void noAutomaticRestraintCarriesLoad(Path model) {
        Resolved r = resolved(model);
        double[] totals = new double[r.loads().length];
        double smallest = Double.POSITIVE_INFINITY;
        for (int c = 0; c < totals.length; c++) {
            totals[c] = r.totalLoad(c);
            smallest = Math.min(smallest, totals[c]);
        }
        // issue 11's rule; the re-solve's restraint forces come from the independent dense re-solve
        for (ResultsStructure.Restraint a : r.structure().restraints()) {
            double lever = a.rotation() ? r.structure().size() : 1;
            assertTrue(Math.abs(a.largestForce()) <= LOST * smallest * lever, model.getFileName() + ": restraint at node index "
                    + a.node() + " lists " + a.largestForce() + ", limit " + LOST * smallest * lever);
            for (int c = 0; c < totals.length; c++) {
                double force = 0;
                for (int q = 0; q < 6; q++) {
                    force += a.direction()[q] * r.residual()[c][6 * a.node() + q];
                }
                assertTrue(Math.abs(force) <= LOST * totals[c] * lever, model.getFileName() + ": re-solve restraint force "
                        + force + " at node index " + a.node() + " in case " + c);
            }
        }
    }

    private static double[] six(JsonNode v) {
        double[] out = new double[6];
        for (int q = 0; q < 6; q++) {
            out[q] = v.get(q).asDouble();
        }
        return out;
    }

    private static void accumulate(double[] sum, double[] at, double[] f) {
        sum[0] += f[0];
        sum[1] += f[1];
        sum[2] += f[2];
        sum[3] += at[1] * f[2] - at[2] * f[1] + f[3];
        sum[4] += at[2] * f[0] - at[0] * f[2] + f[4];
        sum[5] += at[0] * f[1] - at[1] * f[0] + f[5];
    }
}
