package tetrapod.size;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import tetrapod.check.MemberChecker;
import tetrapod.check.MemberEnvelope;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.common.ProgressListener;
import tetrapod.common.UnstableStructureException;
import tetrapod.model.Member;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.SectionShape;
import tetrapod.model.spec.SegmentSpec;
import tetrapod.model.spec.TowerSpec;
import tetrapod.section.SectionCatalogue;

/**
 * Sizes the members of a generated tower: the lightest allowed section per group (role ×
 * segment) that keeps every member's utilisation at or below the target over every load case.
 *
 * <p>Each iteration rebuilds the tower with the current sections (self-weight and wind area follow
 * them), analyses it ({@link FastEnvelope}: every combination at every azimuth), and chooses the
 * next design ({@link SectionChooser}) under the forces found. Member forces change with the
 * stiffness, so it repeats until an analysis changes no group. When a design comes back that was
 * analysed before, the designs are cycling: each group is then held at no lighter than the
 * heaviest section it had in the cycle, which only lets sections grow until the cycle is broken.
 * A design is returned only when its own analysis shows every member at or below the target.
 */
public final class Sizer {

    private Sizer() { }

    /**
     * @param model    the tower spec and what it builds (input)
     * @param options  target, iteration limit, rules, start design
     * @param progress told "size" after each iteration (done of the limit)
     * @throws BadInputException for an explicit frame (its members have no groups) or an unknown
     *                           allowed section name
     * @throws UnstableStructureException when a design is a mechanism
     */
    public static SizingResult size(SizingModel model, SizingOptions options, ProgressListener progress)
            throws BadInputException, UnstableStructureException {
        TowerSpec spec = model.spec();
        if (spec.isExplicit()) {
            throw BadInputException.at("frame", "sizing works on a generated tower (base and segments), whose "
                    + "members are grouped by role and segment; an explicit frame has no such groups");
        }
        List<Member> members = model.tower().frame().members();
        Map<SizingGroup, List<Integer>> membersOf = new TreeMap<>();
        Map<SizingGroup, Section> given = new TreeMap<>();
        for (int m = 0; m < members.size(); m++) {
            Member member = members.get(m);
            SizingGroup g = new SizingGroup(member.segment(), member.role());
            membersOf.computeIfAbsent(g, k -> new ArrayList<>()).add(m);
            given.putIfAbsent(g, member.section());
        }
        MemberChecker checker = MemberChecker.of(model.tower(), spec.checks());
        List<Section> pool = pool(model.catalogue(), options.rules().allowed());
        Map<SizingGroup, List<Section>> candidates = new TreeMap<>();
        for (Map.Entry<SizingGroup, List<Integer>> e : membersOf.entrySet()) {
            SizingGroup g = e.getKey();
            var connection = checker.connectionOf(members.get(e.getValue().get(0)).id());
            candidates.put(g, pool.stream().filter(s -> SectionRules.allowed(s, g.role(), connection, options.rules()))
                    .toList());
        }
        Map<SizingGroup, Section> start = startDesign(options.start(), given, candidates);
        return new Run(model, options, membersOf, given, candidates, progress).run(start);
    }

    /** The sections to choose from, lightest first (then by name). */
    static List<Section> pool(SectionCatalogue catalogue, List<String> allowed) throws BadInputException {
        List<Section> pool = new ArrayList<>();
        if (allowed.isEmpty()) {
            for (String name : catalogue.names()) {
                Section s = catalogue.find(name).orElseThrow();
                if (s.shape() instanceof SectionShape.Angle a && a.equalLegs()) {
                    pool.add(s);
                }
            }
            return List.copyOf(pool);
        }
        List<Problem> problems = new ArrayList<>();
        for (String name : allowed) {
            try {
                Section s = catalogue.require(name, "allowed");
                if (!pool.contains(s)) {
                    pool.add(s);
                }
            } catch (BadInputException e) {
                problems.addAll(e.problems());
            }
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        pool.sort(Comparator.comparingDouble(Section::massPerMetre).thenComparing(Section::name));
        return List.copyOf(pool);
    }

    private static Map<SizingGroup, Section> startDesign(SizingOptions.Start start, Map<SizingGroup, Section> given,
                                                         Map<SizingGroup, List<Section>> candidates) {
        Map<SizingGroup, Section> design = new TreeMap<>(given);
        if (start != SizingOptions.Start.SPEC) {
            candidates.forEach((g, list) -> {
                if (!list.isEmpty()) {
                    design.put(g, start == SizingOptions.Start.LIGHTEST ? list.get(0) : list.get(list.size() - 1));
                }
            });
        }
        return design;
    }

    /** The spec with each group's section set to {@code design}'s; names the spec gave are kept where unchanged. */
    static TowerSpec withSections(TowerSpec spec, Map<SizingGroup, Section> design, Map<SizingGroup, Section> given) {
        List<SegmentSpec> segments = new ArrayList<>();
        for (int s = 0; s < spec.segments().size(); s++) {
            SegmentSpec seg = spec.segments().get(s);
            Map<Role, String> sections = new EnumMap<>(Role.class);
            sections.putAll(seg.sections());
            for (Map.Entry<SizingGroup, Section> e : design.entrySet()) {
                SizingGroup g = e.getKey();
                if (g.segment() == s + 1 && !e.getValue().equals(given.get(g))) {
                    sections.put(g.role(), e.getValue().name());
                }
            }
            segments.add(new SegmentSpec(seg.height(), seg.topWidthX(), seg.topWidthY(), seg.panels(),
                    seg.panelHeights(), seg.bracing(), seg.horizontals(), seg.crossingConnected(), seg.redundants(),
                    sections));
        }
        return new TowerSpec(spec.name(), spec.description(), spec.idealisation(), spec.base(), segments,
                spec.material(), spec.supports(), spec.connectionAllowance(), spec.planBracingLevels(),
                spec.userSections(), spec.frame(), spec.loads(), spec.checks(), spec.basis(), spec.mixedBasis(),
                spec.project(), spec.serviceability());
    }

    /** One design that was analysed; {@code requirementsMet}: every member meets every requirement. */
    private record Analysed(Map<SizingGroup, Section> design, double mass, double maxUtilisation,
                            boolean requirementsMet, Map<SizingGroup, GroupState> states) { }

    /** The iterations of one run. */
    private static final class Run {
        private final SizingModel model;
        private final SizingOptions options;
        private final Map<SizingGroup, List<Integer>> membersOf;
        private final Map<SizingGroup, Section> given;
        private final SectionChooser chooser;
        private final ProgressListener progress;

        Run(SizingModel model, SizingOptions options, Map<SizingGroup, List<Integer>> membersOf,
            Map<SizingGroup, Section> given, Map<SizingGroup, List<Section>> candidates, ProgressListener progress) {
            this.model = model;
            this.options = options;
            this.membersOf = membersOf;
            this.given = given;
            this.chooser = new SectionChooser(membersOf, candidates, options.target());
            this.progress = progress;
        }

        SizingResult run(Map<SizingGroup, Section> start) throws BadInputException, UnstableStructureException {
            List<Analysed> analysed = new ArrayList<>();
            List<Iteration> history = new ArrayList<>();
            Map<SizingGroup, Section> floors = new TreeMap<>();
            Map<SizingGroup, Section> design = start;
            boolean cycled = false;
            Outcome outcome = null;
            List<Shortfall> shortfalls = List.of();
            for (int k = 1; k <= options.maxIterations() && outcome == null; k++) {
                long t0 = System.nanoTime();
                SizingModel current = design.equals(given) ? model : model.with(withSections(model.spec(), design, given));
                Evaluation eval = FastEnvelope.evaluate(current.tower(), current.loads(), current.spec().checks());
                if (eval.envelopes().size() != membersOf.values().stream().mapToInt(List::size).sum()) {
                    throw new IllegalStateException("the tower's members changed with its sections");
                }
                Analysed a = new Analysed(design, current.tower().steelMass(), eval.maxUtilisation(),
                        eval.envelopes().stream().allMatch(tetrapod.check.MemberEnvelope::requirementsMet),
                        states(eval, design));
                SectionChooser.Step step = chooser.choose(eval, design, floors);
                List<Map<SizingGroup, Section>> designs = new ArrayList<>();
                analysed.forEach(x -> designs.add(x.design()));
                designs.add(design);
                var raised = Cycles.raisedFloors(designs, step.next(), floors);
                if (raised.isPresent()) {
                    cycled = true;
                    floors = raised.get();
                    step = chooser.choose(eval, design, floors);
                }
                analysed.add(a);
                shortfalls = step.shortfalls();
                if (step.next().equals(design)) {
                    outcome = !shortfalls.isEmpty() ? Outcome.INFEASIBLE
                            : cycled ? Outcome.CONVERGED_AFTER_CYCLE : Outcome.CONVERGED;
                }
                history.add(new Iteration(k, a.mass(), a.maxUtilisation(), changed(design, step.next()),
                        System.nanoTime() - t0));
                progress.progress("size", k, options.maxIterations());
                design = step.next();
            }
            Analysed chosen = null;
            if (outcome == null) {
                outcome = shortfalls.isEmpty() ? Outcome.ITERATION_LIMIT : Outcome.INFEASIBLE;
                if (outcome == Outcome.ITERATION_LIMIT) {
                    chosen = lightestPassing(analysed);
                }
            } else if (outcome != Outcome.INFEASIBLE) {
                chosen = analysed.get(analysed.size() - 1);
                if (chosen.maxUtilisation() > options.target() || !chosen.requirementsMet()) {
                    throw new IllegalStateException("sizing settled on a design above the target or breaking a "
                            + "requirement: " + chosen.maxUtilisation());
                }
            }
            Analysed first = analysed.get(0);
            List<GroupResult> groups = new ArrayList<>();
            for (SizingGroup g : membersOf.keySet()) {
                groups.add(new GroupResult(g, first.states().get(g), chosen == null ? null : chosen.states().get(g)));
            }
            return new SizingResult(outcome, chosen == null ? null : withSections(model.spec(), chosen.design(), given),
                    options.target(), groups, first.mass(), chosen == null ? 0 : chosen.mass(), history,
                    outcome == Outcome.INFEASIBLE ? shortfalls : List.of(), model.spec().connectionAllowance());
        }

        private Map<SizingGroup, GroupState> states(Evaluation eval, Map<SizingGroup, Section> design) {
            Map<SizingGroup, GroupState> states = new LinkedHashMap<>();
            for (Map.Entry<SizingGroup, List<Integer>> e : membersOf.entrySet()) {
                MemberEnvelope worst = null;
                for (int m : e.getValue()) {
                    MemberEnvelope env = eval.envelopes().get(m);
                    if (worst == null || Evaluation.utilisation(env) > Evaluation.utilisation(worst)) {
                        worst = env;
                    }
                }
                states.put(e.getKey(), new GroupState(design.get(e.getKey()).name(), Evaluation.utilisation(worst),
                        worst.member(), worst.governing(), worst.governingWhere()));
            }
            return states;
        }

        private static int changed(Map<SizingGroup, Section> from, Map<SizingGroup, Section> to) {
            int n = 0;
            for (Map.Entry<SizingGroup, Section> e : from.entrySet()) {
                if (!e.getValue().equals(to.get(e.getKey()))) {
                    n++;
                }
            }
            return n;
        }

        private Analysed lightestPassing(List<Analysed> analysed) {
            Analysed best = null;
            for (Analysed a : analysed) {
                if (a.maxUtilisation() <= options.target() && a.requirementsMet()
                        && (best == null || a.mass() < best.mass())) {
                    best = a;
                }
            }
            return best;
        }
    }
}
