package tetrapod.batch;

import java.io.IOException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletionService;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorCompletionService;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import tetrapod.batch.FleetPlan.Work;
import tetrapod.common.ProgressListener;

/**
 * A fleet run: every tower of the manifest under the base scenario, its own parameters (when its
 * manifest row has any) and every scenario patch, analysed on a fixed pool of threads. The work is
 * that of the {@link FleetPlan}: the same model twice is analysed once, and work an earlier run
 * recorded is not done again. The rows come back in manifest order whatever the number of threads.
 */
public final class FleetRun {

    /** What progress is reported as. */
    public static final String TASK = "towers × scenarios";

    private FleetRun() { }

    public static List<SummaryRow> run(Manifest manifest, List<Scenario> scenarios, RunFolder folder, int threads,
                                       boolean reports, String program, TowerJob job, ProgressListener progress)
            throws IOException, InterruptedException {
        FleetPlan plan = FleetPlan.of(manifest, scenarios, folder, program);
        Map<Work, Outcome> outcomes = new HashMap<>();
        List<Work> todo = new ArrayList<>();
        for (Work w : plan.works()) {
            Optional<Outcome> earlier = w.hash() == null ? Optional.empty() : folder.finished(w.hash());
            if (earlier.isPresent() && (!reports || earlier.get().report() != null || earlier.get().exitCode() != 0)) {
                outcomes.put(w, earlier.get());
            } else {
                todo.add(w);
            }
        }
        long total = outcomes.size() + todo.size();
        progress.progress(TASK, outcomes.size(), total);
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, threads));
        try {
            CompletionService<Map.Entry<Work, Outcome>> done = new ExecutorCompletionService<>(pool);
            for (Work w : todo) {
                done.submit(() -> Map.entry(w, job.analyse(w.model(),
                        reports ? Optional.of(folder.root().resolve(w.reportLink())) : Optional.empty(), w.reportLink())));
            }
            for (int k = 0; k < todo.size(); k++) {
                Future<Map.Entry<Work, Outcome>> next = done.take();
                Map.Entry<Work, Outcome> e;
                try {
                    e = next.get();
                } catch (ExecutionException fault) {
                    throw new IllegalStateException("a tower job must not throw", fault.getCause());
                }
                outcomes.put(e.getKey(), e.getValue());
                if (e.getKey().hash() != null && e.getValue().settled()) {
                    folder.record(e.getKey().hash(), e.getValue());
                }
                progress.progress(TASK, outcomes.size(), total);
            }
        } finally {
            pool.shutdownNow();
        }
        return plan.rows(outcomes);
    }

}
