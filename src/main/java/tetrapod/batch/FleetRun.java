package tetrapod.batch;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletionService;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorCompletionService;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import tetrapod.common.BadInputException;
import tetrapod.common.ProgressListener;
import tetrapod.io.ModelPatches;
import tetrapod.io.Sha256;

/**
 * A fleet run: every tower of the manifest under the base scenario, its own parameters (when its
 * manifest row has any) and every scenario patch, analysed on a fixed pool of threads. A piece of
 * work is named by the SHA-256 of the patched model's canonical bytes and the program version: the
 * same model twice is analysed once, and work an earlier run recorded is not done again. The rows
 * come back in manifest order whatever the number of threads.
 */
public final class FleetRun {

    /** What progress is reported as. */
    public static final String TASK = "towers × scenarios";

    private FleetRun() { }

    /** One tower under one scenario, its patches in the order they apply. */
    private record Item(Manifest.Tower tower, String scenario, List<Object> patches, Optional<String> unreadablePatch) { }

    /** One analysis to run: the model file to analyse and where its report goes. */
    private record Work(Path model, String reportLink, String hash) { }

    public static List<SummaryRow> run(Manifest manifest, List<Scenario> scenarios, RunFolder folder, int threads,
                                       boolean reports, String program, TowerJob job, ProgressListener progress)
            throws IOException, InterruptedException {
        List<Item> items = items(manifest, scenarios);
        Map<Item, Work> workOf = new LinkedHashMap<>();
        Map<Item, Outcome> known = new HashMap<>();
        Map<String, Work> byHash = new LinkedHashMap<>();
        for (Item item : items) {
            if (item.unreadablePatch().isPresent()) {
                known.put(item, Outcome.failed(2, item.unreadablePatch().get()));
                continue;
            }
            Work work = work(item, folder, program);
            if (work.hash() != null && byHash.containsKey(work.hash())) {
                work = byHash.get(work.hash()); // the same model under another name: analysed once
            } else if (work.hash() != null) {
                byHash.put(work.hash(), work);
            }
            workOf.put(item, work);
        }
        Map<Work, Outcome> outcomes = new HashMap<>();
        List<Work> todo = new ArrayList<>();
        for (Work w : new java.util.LinkedHashSet<>(workOf.values())) {
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
        return rows(manifest, items, workOf, known, outcomes);
    }

    /** The tower × scenario pairs in manifest order, each tower's scenarios in the order given. */
    private static List<Item> items(Manifest manifest, List<Scenario> scenarios) {
        List<Item> items = new ArrayList<>();
        for (Manifest.Tower t : manifest.towers()) {
            items.add(new Item(t, Scenario.BASE, List.of(), Optional.empty()));
            if (!t.parameters().isEmpty()) {
                items.add(new Item(t, Manifest.PARAMETERS, List.of(t.parameters()), Optional.empty()));
            }
            for (Scenario s : scenarios) {
                items.add(new Item(t, s.name(), s.patch() == null ? List.of() : List.of(s.patch()), s.unreadable()));
            }
        }
        return items;
    }

    /**
     * The work of an item: the patched model written into the run's folder, named by its hash. A
     * model that cannot be read is analysed as it is (without a hash, so never recorded): the
     * analysis then fails with the message analyze gives for it.
     */
    private static Work work(Item item, RunFolder folder, String program) throws IOException {
        Path model = item.tower().file();
        String link = RunFolder.reportLink(item.tower().id(), item.scenario());
        byte[] canonical;
        try {
            canonical = ModelPatches.canonical(model, item.patches());
        } catch (BadInputException unreadable) {
            return new Work(model, link, null);
        }
        byte[] named = (new String(canonical, StandardCharsets.UTF_8) + "\n" + program).getBytes(StandardCharsets.UTF_8);
        String hash = Sha256.of(named);
        if (!item.patches().isEmpty()) {
            model = folder.patchedModel(item.scenario(), item.tower().id());
            folder.writePatched(model, canonical);
        }
        return new Work(model, link, hash);
    }

    private static List<SummaryRow> rows(Manifest manifest, List<Item> items, Map<Item, Work> workOf,
                                         Map<Item, Outcome> known, Map<Work, Outcome> outcomes) {
        Path base = manifest.source().toAbsolutePath().normalize();
        base = java.nio.file.Files.isDirectory(base) ? base : base.getParent();
        Map<String, Double> baseUtilisation = new HashMap<>();
        List<SummaryRow> rows = new ArrayList<>();
        for (Item item : items) {
            Outcome o = known.containsKey(item) ? known.get(item) : outcomes.get(workOf.get(item));
            String model = base.relativize(item.tower().file().toAbsolutePath().normalize()).toString();
            Double u = o.figures() == null ? null : o.figures().maxUtilisation();
            if (item.scenario().equals(Scenario.BASE) && u != null) {
                baseUtilisation.put(item.tower().id(), u);
            }
            Double from = baseUtilisation.get(item.tower().id());
            rows.add(new SummaryRow(item.tower().id(), model, item.scenario(), o,
                    u == null || from == null ? null : u - from));
        }
        return rows;
    }
}
