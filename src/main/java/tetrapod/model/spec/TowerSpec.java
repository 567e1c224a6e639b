package tetrapod.model.spec;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import tetrapod.model.Idealisation;

/**
 * The user's description of a tower, as read from a model file, with defaults filled in.
 * Units as in the file: m, kN, kN·m, MPa (user section dimensions in mm, as their keys say).
 * Either {@code base} and {@code segments} are given (a generated tower) or {@code frame}
 * (an explicit frame), never both.
 *
 * @param connectionAllowance fraction added to the steel mass for bolts, gussets and
 *                            galvanising (0.10 = 10 %)
 * @param planBracingLevels   heights (m) of horizontal diaphragms; each must be a panel level
 * @param userSections        sections defined in the file, by name
 * @param checks              how members, connections and foundations are checked; null for the
 *                            default of the basis
 * @param basis               the family of published rules every default follows; null to take it
 *                            from the wind method, else the check method (see {@link BasisMixes#derive})
 * @param mixedBasis          whether values of the other family are allowed (each is then a warning)
 * @param project             the title block's project, structure, revision, date and names
 * @param serviceability      the service wind and the movement limits ({@link ServiceabilitySpec#NONE}
 *                            for the defaults and none)
 */
public record TowerSpec(String name, String description, Idealisation idealisation,
                        BaseSpec base, List<SegmentSpec> segments, MaterialSpec material,
                        SupportType supports, double connectionAllowance,
                        List<Double> planBracingLevels, Map<String, UserSectionSpec> userSections,
                        ExplicitFrameSpec frame, LoadsSpec loads, ChecksSpec checks, DesignBasis basis,
                        boolean mixedBasis, ProjectSpec project, ServiceabilitySpec serviceability) {

    public TowerSpec {
        Objects.requireNonNull(name, "name");
        description = description == null ? "" : description;
        segments = segments == null ? List.of() : List.copyOf(segments);
        planBracingLevels = planBracingLevels == null ? List.of() : List.copyOf(planBracingLevels);
        userSections = userSections == null ? Map.of() : Map.copyOf(userSections);
        loads = loads == null ? LoadsSpec.NONE : loads;
        if (basis == null) {
            basis = BasisMixes.derive(loads.hasWind() ? loads.wind().method() : null,
                    checks == null ? null : checks.method(),
                    loads.actionFactors() == null ? null : loads.actionFactors().set());
        }
        checks = checks == null ? ChecksSpec.defaultFor(basis) : checks;
        loads = loads.actionFactors() == null ? loads.withActionFactors(ActionFactors.defaultFor(basis)) : loads;
        project = project == null ? ProjectSpec.NONE : project;
        serviceability = serviceability == null ? ServiceabilitySpec.NONE : serviceability;
    }

    /** A spec without serviceability keys. */
    public TowerSpec(String name, String description, Idealisation idealisation,
                     BaseSpec base, List<SegmentSpec> segments, MaterialSpec material,
                     SupportType supports, double connectionAllowance,
                     List<Double> planBracingLevels, Map<String, UserSectionSpec> userSections,
                     ExplicitFrameSpec frame, LoadsSpec loads, ChecksSpec checks, DesignBasis basis,
                     boolean mixedBasis, ProjectSpec project) {
        this(name, description, idealisation, base, segments, material, supports, connectionAllowance,
                planBracingLevels, userSections, frame, loads, checks, basis, mixedBasis, project, ServiceabilitySpec.NONE);
    }

    /** A spec without a project. */
    public TowerSpec(String name, String description, Idealisation idealisation,
                     BaseSpec base, List<SegmentSpec> segments, MaterialSpec material,
                     SupportType supports, double connectionAllowance,
                     List<Double> planBracingLevels, Map<String, UserSectionSpec> userSections,
                     ExplicitFrameSpec frame, LoadsSpec loads, ChecksSpec checks, DesignBasis basis,
                     boolean mixedBasis) {
        this(name, description, idealisation, base, segments, material, supports, connectionAllowance,
                planBracingLevels, userSections, frame, loads, checks, basis, mixedBasis, ProjectSpec.NONE);
    }

    /** A spec whose basis follows its wind or check method, mixing not allowed. */
    public TowerSpec(String name, String description, Idealisation idealisation,
                     BaseSpec base, List<SegmentSpec> segments, MaterialSpec material,
                     SupportType supports, double connectionAllowance,
                     List<Double> planBracingLevels, Map<String, UserSectionSpec> userSections,
                     ExplicitFrameSpec frame, LoadsSpec loads, ChecksSpec checks) {
        this(name, description, idealisation, base, segments, material, supports, connectionAllowance,
                planBracingLevels, userSections, frame, loads, checks, null, false);
    }

    /** A spec with the default checks of its basis. */
    public TowerSpec(String name, String description, Idealisation idealisation,
                     BaseSpec base, List<SegmentSpec> segments, MaterialSpec material,
                     SupportType supports, double connectionAllowance,
                     List<Double> planBracingLevels, Map<String, UserSectionSpec> userSections,
                     ExplicitFrameSpec frame, LoadsSpec loads) {
        this(name, description, idealisation, base, segments, material, supports, connectionAllowance,
                planBracingLevels, userSections, frame, loads, null);
    }

    /** This spec with other loads, everything else kept. */
    public TowerSpec withLoads(LoadsSpec l) {
        return new TowerSpec(name, description, idealisation, base, segments, material, supports, connectionAllowance,
                planBracingLevels, userSections, frame, l, checks, basis, mixedBasis, project, serviceability);
    }

    /** The values of this model that belong to the other family than its basis (warnings when allowed). */
    public List<BasisMix> basisMixes() {
        return BasisMixes.of(this);
    }

    public boolean isExplicit() {
        return frame != null;
    }

    public Optional<ExplicitFrameSpec> explicitFrame() {
        return Optional.ofNullable(frame);
    }

    /** Height of the whole generated tower, m (0 for an explicit frame). */
    public double height() {
        return segments.stream().mapToDouble(SegmentSpec::height).sum();
    }
}
