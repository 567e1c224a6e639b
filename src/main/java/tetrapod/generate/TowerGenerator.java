package tetrapod.generate;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.model.Frame;
import tetrapod.model.Material;
import tetrapod.model.Restraint;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.SectionLookup;
import tetrapod.model.spec.SupportType;
import tetrapod.model.spec.TowerSpec;

/** Builds the analysis model of a tower from its spec: the entry point of this package. */
public final class TowerGenerator {

    private TowerGenerator() { }

    /**
     * The tower described by {@code spec}: generated from base and segments, or built from its
     * explicit frame (then without levels and panels).
     *
     * @param spec     the tower spec (not modified)
     * @param sections where section names are looked up
     * @param material the steel of every member
     * @throws BadInputException listing every problem found, each with its JSON path
     */
    public static Tower generate(TowerSpec spec, SectionLookup sections, Material material) throws BadInputException {
        Objects.requireNonNull(spec, "spec");
        Objects.requireNonNull(sections, "sections");
        Objects.requireNonNull(material, "material");
        if (spec.isExplicit()) {
            return explicit(spec, sections, material);
        }
        List<Problem> problems = new ArrayList<>(GeometryChecks.check(spec));
        LevelPlan plan = problems.isEmpty() ? LevelPlan.of(spec, problems) : null;
        List<Map<Role, Section>> resolved = SectionResolver.resolve(spec, plan, sections, problems);
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        LatticeBuilder.Lattice lattice = LatticeBuilder.build(plan, spec.segments(), resolved);
        List<MemberSplitter.Piece> pieces = MemberSplitter.split(lattice.members(), lattice.registry());
        Restraint restraint = spec.supports() == SupportType.FIXED ? Restraint.FIXED : Restraint.PINNED;
        FrameAssembler.Assembled assembled = FrameAssembler.assemble(spec.name(), spec.idealisation(), material,
                restraint, lattice, pieces, plan);
        TowerIndexer.Index index = TowerIndexer.index(assembled.frame(), plan, lattice, assembled.nodeIds());
        return new Tower(assembled.frame(), index.levels(), index.panels(), spec.connectionAllowance());
    }

    private static Tower explicit(TowerSpec spec, SectionLookup sections, Material material) throws BadInputException {
        List<Problem> problems = new ArrayList<>();
        if (spec.base() != null || !spec.segments().isEmpty()) {
            problems.add(Problem.at("frame", "give either an explicit frame or base and segments, not both"));
        }
        if (!spec.planBracingLevels().isEmpty()) {
            problems.add(Problem.at("planBracingLevels", "applies only to generated towers, not to an explicit frame"));
        }
        if (!Double.isFinite(spec.connectionAllowance()) || spec.connectionAllowance() < 0) {
            problems.add(Problem.at("connectionAllowance",
                    "must be a fraction >= 0 (0.10 = 10 %), was " + spec.connectionAllowance()));
        }
        Frame frame = ExplicitFrameBuilder.build(spec.name(), spec.idealisation(), spec.frame(), sections, material,
                problems);
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        return new Tower(frame, List.of(), List.of(), spec.connectionAllowance());
    }
}
