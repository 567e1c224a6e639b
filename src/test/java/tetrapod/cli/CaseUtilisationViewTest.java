package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tetrapod.analysis.Analysis;
import tetrapod.analysis.AnalysisResult;
import tetrapod.analysis.SolvedCase;
import tetrapod.check.MemberChecker;
import tetrapod.check.MemberEnvelope;
import tetrapod.check.MemberForces;
import tetrapod.common.ProgressListener;
import tetrapod.model.Member;
import tetrapod.solve.MemberEndForces;
import tetrapod.view.Colouring;
import tetrapod.view.ViewCase;
import tetrapod.view.ViewData;

/**
 * Every case solved in full offers a utilisation colouring (issue 16 item 8), and it agrees with the
 * sweep: where a member's governing case is one of them, the case's utilisation is the envelope's.
 */
class CaseUtilisationViewTest {

    @Test
    void aCaseShowsTheUtilisationTheSweepFoundInIt() throws Exception {
        LoadedModel loaded = LoadedModel.read(Path.of("models/ridge-lookout-square.json"));
        AnalysisResult result = Analysis.run(loaded.tower(), loaded.loads(), loaded.spec().checks(), 1,
                ProgressListener.NONE);
        ViewData data = ResultViews.of(result, loaded.spec().checks());
        Map<String, ViewCase> byName = new HashMap<>();
        for (ViewCase c : data.cases().subList(1, data.cases().size())) {
            assertTrue(c.offers(Colouring.UTILISATION) && c.offers(Colouring.AXIAL), c.name());
            byName.put(c.name(), c);
        }
        int compared = 0;
        for (MemberEnvelope m : result.members()) {
            ViewCase c = byName.get(m.governingWhere().caseId());
            if (c == null) {
                continue;
            }
            int index = indexOf(result, m.member());
            assertEquals(m.governing().utilisation(), c.scalars().get(Colouring.UTILISATION).get(index), 1e-9,
                    "member " + m.member() + " in " + c.name());
            compared++;
        }
        assertTrue(compared > 100, compared + " members compared");
    }

    /** Every member of every case: the view's number is the checks' own governing utilisation, to the last bit. */
    @Test
    void everyMemberOfEveryCaseHasTheUtilisationOfTheChecksInFull() throws Exception {
        LoadedModel loaded = LoadedModel.read(Path.of("models/harbour-beacon-rectangular.json"));
        AnalysisResult result = Analysis.run(loaded.tower(), loaded.loads(), loaded.spec().checks(), 1,
                ProgressListener.NONE);
        ViewData data = ResultViews.of(result, loaded.spec().checks());
        MemberChecker checker = MemberChecker.of(result.tower(), loaded.spec().checks());
        var members = result.tower().frame().members();
        int compared = 0;
        for (int c = 0; c < result.cases().size(); c++) {
            SolvedCase solved = result.cases().get(c);
            ViewCase view = data.cases().get(c + 1);
            Map<Integer, MemberEndForces> ends = new HashMap<>();
            solved.solution().memberForces().forEach(f -> ends.put(f.member(), f));
            for (int k = 0; k < members.size(); k++) {
                Member m = members.get(k);
                MemberEndForces f = ends.get(m.id());
                MemberForces forces = m.axialOnly() ? MemberForces.axial(f.axial())
                        : new MemberForces(f.axial(), f.atI().my(), f.atJ().my(), f.atI().mz(), f.atJ().mz());
                double full = checker.check(m.id(), forces, id -> ends.get(id).axial()).governing().utilisation();
                assertEquals(full, view.scalars().get(Colouring.UTILISATION).get(k), 0, solved.id() + ", member " + m.id());
                compared++;
            }
        }
        assertTrue(compared > 1000, compared + " member cases compared");
    }

    private static int indexOf(AnalysisResult result, int memberId) {
        var members = result.tower().frame().members();
        for (int k = 0; k < members.size(); k++) {
            if (members.get(k).id() == memberId) {
                return k;
            }
        }
        throw new IllegalArgumentException("no member " + memberId);
    }
}
