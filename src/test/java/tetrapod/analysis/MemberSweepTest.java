package tetrapod.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import tetrapod.check.MemberCheckResult;
import tetrapod.check.MemberChecker;
import tetrapod.check.MemberEnvelope;
import tetrapod.check.MemberForces;
import tetrapod.common.ProgressListener;
import tetrapod.generate.Tower;
import tetrapod.generate.TowerGenerator;
import tetrapod.io.JsonOutput;
import tetrapod.io.SpecReader;
import tetrapod.load.CaseKey;
import tetrapod.load.Combination;
import tetrapod.load.LoadComponent;
import tetrapod.load.TowerLoads;
import tetrapod.model.Member;
import tetrapod.model.spec.LoadAction;
import tetrapod.model.spec.TowerSpec;
import tetrapod.report.ResultsDocument;
import tetrapod.section.SectionCatalogue;
import tetrapod.section.SteelGrades;
import tetrapod.solve.BasisResponses;
import tetrapod.solve.FactoredSystem;
import tetrapod.solve.LoadVector;
import tetrapod.solve.Solver;
import tetrapod.solve.StructuralModel;

/**
 * The member checks of the sweep ({@link MemberSweep}: numbers, cases skipped by bounds, checks in
 * full only where written, several threads) against the plain way: every member checked in full
 * at every case, one thread, the envelopes and the most utilised member of each azimuth kept as
 * the sweep always kept them. They must be equal, value for value and word for word. Examples
 * with their own idealisation and method, as frames (every member with bending, where the bounds
 * skip cases), with the other method, with a fixed crossing rule, and a finer sweep.
 */
class MemberSweepTest {

    static Stream<String> variants() {
        return Stream.of("ridge-lookout-square", "ridge-lookout-square as frame", "ridge-lookout-square other method",
                "harbour-beacon-rectangular", "harbour-beacon-rectangular as frame",
                "hilltop-relay-k crossing unsupported", "hilltop-relay-k as truss",
                "benchmark-25-bar-space-truss", "benchmark-25-bar-space-truss as frame",
                "ridge-lookout-square as frame, 2 deg");
    }

    record Case(TowerSpec spec, Tower tower, TowerLoads loads) { }

    static Case load(String name) throws Exception {
        String file = name.split("[ ,]")[0];
        String original = Files.readString(Path.of("models", file + ".json"));
        String text = original;
        if (name.contains("as frame")) {
            text = text.replaceFirst("\"idealisation\": \"[a-z-]+\"", "\"idealisation\": \"frame\"");
        }
        if (name.contains("as truss")) {
            text = text.replaceFirst("\"idealisation\": \"[a-z-]+\"", "\"idealisation\": \"truss\"");
        }
        if (name.contains("other method")) {
            text = text.replace("\"en1993\"", "\"asce10\"").replaceFirst("\\{", "{ \"mixedBasis\": true,");
        }
        if (name.contains("crossing unsupported")) {
            text = text.replace("\"bucklingLengths\": [", "\"bucklingLengths\": [ { \"role\": \"diagonal\","
                    + " \"crossing\": \"unsupported\" },");
        }
        if (name.contains("2 deg")) {
            text = text.replace("\"sweepStep\": 5.0", "\"sweepStep\": 2.0");
        }
        assertTrue(name.equals(file) || !text.equals(original), name + ": the variant differs from the example");
        SectionCatalogue catalogue = SectionCatalogue.standard();
        TowerSpec read = SpecReader.read(text, catalogue);
        Tower tower = TowerGenerator.generate(read, catalogue.with(read.userSections()), SteelGrades.fromSpec(read.material()));
        TowerSpec spec = ComputedStructuralFactor.resolve(read, tower, null, false).spec();   // as analyze fills it in
        return new Case(spec, tower, TowerLoads.build(tower, spec.loads()));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("variants")
    void sameAsCheckingEveryMemberInFullAtEveryCase(String name) throws Exception {
        Case c = load(name);
        AnalysisResult result = Analysis.run(c.tower(), c.loads(), c.spec().checks(), 0, ProgressListener.NONE, 3);
        Plain plain = plainSweep(c, result.secondOrder().amplification());
        assertEquals(plain.envelopes().size(), result.members().size());
        for (int m = 0; m < plain.envelopes().size(); m++) {
            assertEquals(plain.envelopes().get(m), result.members().get(m), name + ", member index " + m);
        }
        assertEquals(plain.byAzimuth(), result.utilisationByAzimuth(), name);
    }

    @Test
    void theBoundsSkipCasesOfMembersWithBending() throws Exception {
        Case c = load("ridge-lookout-square as frame");
        StructuralModel model = StructuralModel.of(c.tower().frame());
        BasisResponses responses = responses(model, c.loads());
        MemberSweep sweep = new MemberSweep(c.tower().frame(), responses, MemberChecker.of(c.tower(), c.spec().checks()), 1);
        int cases = 0;
        for (CaseKey key : keys(c.loads())) {
            sweep.add(key, c.loads().basis().weights(key.combination(), key.azimuthDeg()));
            cases++;
        }
        MemberSweep.Result r = sweep.finish();
        long all = (long) cases * c.tower().frame().members().size();
        assertEquals(all, r.evaluated() + r.skipped());
        assertTrue(r.skipped() > all / 4, "skipped " + r.skipped() + " of " + all);
    }

    @Test
    void resultsFileTheSameWithOneThreadAndWithSeveral() throws Exception {
        for (String name : List.of("hilltop-relay-k", "ridge-lookout-square as frame")) {
            Case c = load(name);
            String one = JsonOutput.toJson(ResultsDocument.build(c.spec(),
                    Analysis.run(c.tower(), c.loads(), c.spec().checks(), 2, ProgressListener.NONE, 1), List.of()));
            for (int threads : new int[] {2, 5}) {
                String several = JsonOutput.toJson(ResultsDocument.build(c.spec(),
                        Analysis.run(c.tower(), c.loads(), c.spec().checks(), 2, ProgressListener.NONE, threads), List.of()));
                assertEquals(one, several, name + " with " + threads + " threads");
            }
        }
    }

    record Plain(List<MemberEnvelope> envelopes, List<AzimuthUtilisation> byAzimuth) { }

    /**
     * Every member checked in full at every case, in case order, one thread; every wind weight
     * multiplied by {@code sway} (EN 1993-1-1 5.2.2(5)B, as the analysis does below α_cr 10).
     */
    static Plain plainSweep(Case c, double sway) throws Exception {
        StructuralModel model = StructuralModel.of(c.tower().frame());
        BasisResponses responses = responses(model, c.loads());
        MemberChecker checker = MemberChecker.of(c.tower(), c.spec().checks());
        List<Member> members = c.tower().frame().members();
        MemberEnvelope[] envelopes = new MemberEnvelope[members.size()];
        for (int m = 0; m < members.size(); m++) {
            envelopes[m] = MemberEnvelope.empty(members.get(m).id());
        }
        Map<Double, AzimuthUtilisation> byAzimuth = new TreeMap<>();
        double[] axial = new double[members.size()];
        double[] ends = new double[12];
        for (CaseKey key : keys(c.loads())) {
            double[] weights = c.loads().basis().weights(key.combination(), key.azimuthDeg());
            for (int k = 0; k < weights.length; k++) {
                LoadAction action = c.loads().basis().components().get(k).action();
                weights[k] *= action == LoadAction.WIND || action == LoadAction.WIND_ON_ICE ? sway : 1;
            }
            responses.axialForces(weights, axial);
            double worst = -1;
            int worstMember = 0;
            for (int m = 0; m < members.size(); m++) {
                Member member = members.get(m);
                MemberForces forces;
                if (member.axialOnly()) {
                    forces = MemberForces.axial(axial[m]);
                } else {
                    responses.endForces(m, weights, ends);
                    forces = MemberForces.ofEndActions(axial[m], ends);
                }
                MemberCheckResult checked = checker.check(member.id(), forces, id -> axial[model.memberIndex(id)]);
                envelopes[m] = envelopes[m].with(checked, forces, key.id(), key.azimuthDeg());
                if (checked.utilisation() > worst) {
                    worst = checked.utilisation();
                    worstMember = member.id();
                }
            }
            if (key.azimuthDeg() != null) {
                AzimuthUtilisation old = byAzimuth.get(key.azimuthDeg());
                if (old == null || worst > old.utilisation()) {
                    byAzimuth.put(key.azimuthDeg(), new AzimuthUtilisation(key.azimuthDeg(), worst, worstMember,
                            key.combination().name()));
                }
            }
        }
        return new Plain(List.of(envelopes), List.copyOf(byAzimuth.values()));
    }

    static BasisResponses responses(StructuralModel model, TowerLoads loads) throws Exception {
        FactoredSystem system = Solver.factor(model);
        List<LoadVector> vectors = new ArrayList<>();
        for (LoadComponent component : loads.basis().components()) {
            vectors.add(new LoadVector(component.name(), component.loads()));
        }
        return BasisResponses.of(system, vectors);
    }

    static List<CaseKey> keys(TowerLoads loads) {
        List<CaseKey> keys = new ArrayList<>();
        for (Combination combination : loads.combinations()) {
            if (combination.hasWind()) {
                loads.azimuths().forEach(a -> keys.add(new CaseKey(combination, a)));
            } else {
                keys.add(new CaseKey(combination, null));
            }
        }
        return keys;
    }
}
