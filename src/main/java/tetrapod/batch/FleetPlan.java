package tetrapod.batch;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import tetrapod.common.BadInputException;
import tetrapod.io.ModelPatches;
import tetrapod.io.Sha256;

/**
 * What a fleet run has to do, whoever does it (the plain batch on a pool of threads, or the Spark
 * job): every tower × scenario of the manifest in manifest order (an item) and the analysis it
 * needs (its work). A piece of work is the model file to analyse, the tower's own file or its
 * patched model written into the run's folder, named by the SHA-256 of the patched model's
 * canonical bytes and the program version: the same model twice is one piece of work. An item
 * whose scenario patch cannot be read has its outcome already.
 */
public final class FleetPlan {

    /** One tower under one scenario, its patches in the order they apply. */
    private record Item(Manifest.Tower tower, String scenario, List<Object> patches, Optional<String> unreadablePatch) { }

    /**
     * One analysis to run: the model file to analyse, where its report goes (relative to the run's
     * folder) and its hash; null when the model cannot be read, so that it is never recorded.
     */
    public record Work(Path model, String reportLink, String hash) { }

    private final Manifest manifest;
    private final List<Item> items;
    private final Map<Item, Work> workOf;
    private final Map<Item, Outcome> known;

    private FleetPlan(Manifest manifest, List<Item> items, Map<Item, Work> workOf, Map<Item, Outcome> known) {
        this.manifest = manifest;
        this.items = items;
        this.workOf = workOf;
        this.known = known;
    }

    /** The plan of {@code manifest} under {@code scenarios}; the patched models are written into {@code folder}. */
    public static FleetPlan of(Manifest manifest, List<Scenario> scenarios, RunFolder folder, String program)
            throws IOException {
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
        return new FleetPlan(manifest, items, workOf, known);
    }

    /** The distinct pieces of work, in manifest order. */
    public List<Work> works() {
        return List.copyOf(new LinkedHashSet<>(workOf.values()));
    }

    /**
     * A model file as a row's message names it: a patched model relative to the run's folder
     * {@code runRoot} (where summary.csv is), any other as the manifest gave it.
     */
    public static String shown(Path runRoot, Path model) {
        Path root = runRoot.toAbsolutePath().normalize();
        Path file = model.toAbsolutePath().normalize();
        return file.startsWith(root) ? root.relativize(file).toString() : model.toString();
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

    /**
     * The summary's rows in manifest order, given the outcome of every piece of work: each with the
     * change of its largest utilisation from the same tower's base scenario.
     */
    public List<SummaryRow> rows(Map<Work, Outcome> outcomes) {
        Path base = manifest.source().toAbsolutePath().normalize();
        base = Files.isDirectory(base) ? base : base.getParent();
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
