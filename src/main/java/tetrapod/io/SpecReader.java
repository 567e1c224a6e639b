package tetrapod.io;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.function.IntPredicate;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.model.Idealisation;
import tetrapod.model.SectionLookup;
import tetrapod.model.spec.ActionFactorSet;
import tetrapod.model.spec.BaseSpec;
import tetrapod.model.spec.BasisMix;
import tetrapod.model.spec.BasisMixes;
import tetrapod.model.spec.CheckMethod;
import tetrapod.model.spec.DesignBasis;
import tetrapod.model.spec.ExplicitFrameSpec;
import tetrapod.model.spec.ChecksSpec;
import tetrapod.model.spec.LoadsSpec;
import tetrapod.model.spec.LoadsSpec.NodalLoadSpec;
import tetrapod.model.spec.MaterialSpec;
import tetrapod.model.spec.ProjectSpec;
import tetrapod.model.spec.SegmentSpec;
import tetrapod.model.spec.ServiceabilitySpec;
import tetrapod.model.spec.SupportType;
import tetrapod.model.spec.TowerSpec;
import tetrapod.model.spec.UserSectionSpec;

/**
 * Reads a model file into a {@link TowerSpec}, defaults filled in, or fails with a
 * {@link BadInputException} listing every problem found, each with its JSON path and line.
 *
 * <p>Section names: a name is accepted when the file defines it under {@code userSections} or
 * {@code catalogue} finds it. Pass the plain catalogue, not one that already includes this
 * file's user sections: a user section may not reuse a catalogue name (one name, one section).
 */
public final class SpecReader {

    static final List<String> TOP_KEYS = List.of("name", "description", "idealisation", "base", "segments",
            "material", "supports", "connectionAllowance", "planBracingLevels", "userSections", "frame", "loads", "checks",
            "basis", "mixedBasis", "project", "serviceability");
    static final double DEFAULT_CONNECTION_ALLOWANCE = 0.10;

    private SpecReader() { }

    /** Reads the model file at {@code file} (UTF-8). A file that cannot be read is bad input too. */
    public static TowerSpec read(Path file, SectionLookup catalogue) throws BadInputException {
        String text = TextFiles.readUtf8(file);
        return read(text, catalogue);
    }

    /** Reads a model from its JSON text. */
    public static TowerSpec read(String json, SectionLookup catalogue) throws BadInputException {
        JsonLocations parsed = JsonLocations.parse(json);
        Problems problems = new Problems(parsed);
        parsed.duplicateKeys().forEach(problems::add);
        Fields root = Fields.of(parsed.root(), JsonPaths.ROOT, problems);
        if (root == null) {
            problems.throwIfAny();
        }
        TowerSpec spec = new SpecReader.Pass(root, problems, catalogue).read();
        problems.throwIfAny();
        return spec;
    }

    /** One reading of one file. */
    private record Pass(Fields root, Problems problems, SectionLookup catalogue) {

        TowerSpec read() {
            root.allowOnly(TOP_KEYS);
            String name = root.requiredText("name");
            String description = root.optionalText("description", "");
            Idealisation idealisation = Choices.IDEALISATION.optional(root, "idealisation", Idealisation.CONTINUOUS_LEGS);
            MaterialSpec material = root.has("material")
                    ? MaterialReader.read(root.get("material"), root.path("material"), problems)
                    : MaterialSpec.grade(MaterialReader.DEFAULT_GRADE);
            double allowance = root.optionalNumber("connectionAllowance", Bound.FRACTION, "", DEFAULT_CONNECTION_ALLOWANCE);

            Fields userFields = root.object("userSections", false);
            Map<String, UserSectionSpec> userSections = userFields == null
                    ? Map.of()
                    : new UserSectionReader(problems, catalogue).read(userFields);
            List<String> userNames = userFields == null ? List.of() : userFields.keys();
            SectionNames sectionNames = new SectionNames(userNames, catalogue);

            boolean generated = root.has("base") || root.has("segments");
            boolean explicit = root.has("frame");
            BaseSpec base = null;
            List<SegmentSpec> segments = List.of();
            ExplicitFrameSpec frame = null;
            SupportType supports = SupportType.PINNED;
            List<Double> planLevels = List.of();
            IntPredicate nodeExists = null;
            LoadsReader.Tower loadTower = LoadsReader.Tower.explicit();
            if (generated && explicit) {
                problems.add(root.path("frame"), "give either base and segments (a generated tower) or frame"
                        + " (an explicit frame), not both");
            } else if (!generated && !explicit) {
                problems.add(JsonPaths.ROOT, "the model needs either base and segments (a generated tower)"
                        + " or frame (an explicit frame)");
            } else if (generated) {
                SegmentReader segmentReader = new SegmentReader(problems, sectionNames);
                Fields baseFields = root.object("base", true);
                base = baseFields == null ? null : segmentReader.base(baseFields);
                JsonNode segmentArray = root.array("segments", true);
                segments = segmentArray == null ? null : segmentReader.segments(segmentArray, root.path("segments"), base);
                loadTower = new LoadsReader.Tower(true, segments == null ? Double.NaN
                        : segments.stream().mapToDouble(SegmentSpec::height).sum());
                supports = Choices.SUPPORT_TYPE.optional(root, "supports", SupportType.PINNED);
                planLevels = root.has("planBracingLevels")
                        ? Values.numbers(root.get("planBracingLevels"), root.path("planBracingLevels"),
                                PhysicalLimits.HEIGHT_ON_TOWER, "m", problems)
                        : List.of();
            } else {
                for (String key : List.of("supports", "planBracingLevels")) {
                    if (root.has(key)) {
                        problems.add(root.path(key), "applies only to a generated tower (base and segments);"
                                + " an explicit frame gives its supports and members in frame");
                    }
                }
                FrameReader frameReader = new FrameReader(problems, sectionNames);
                Fields frameFields = root.object("frame", true);
                frame = frameFields == null ? null : frameReader.read(frameFields);
                nodeExists = frameFields == null ? null : frameReader::nodeExists;
            }
            boolean basisGiven = root.has("basis");
            DesignBasis basis = basisGiven ? Choices.BASIS.optional(root, "basis", DesignBasis.EN) : derivedBasis(root);
            Boolean mixedBasis = root.optionalBool("mixedBasis", false);
            Fields loadFields = root.object("loads", false);
            DesignBasis readingBasis = basis == null ? DesignBasis.EN : basis;
            LoadsSpec loads = loadFields == null ? LoadsSpec.NONE
                    : new LoadsReader(problems).read(loadFields, nodeExists, loadTower, readingBasis);

            Fields checkFields = root.object("checks", false);
            int segmentCount = explicit && !generated ? 0 : segments == null ? -1 : segments.size();
            ChecksSpec checks = checkFields == null ? null
                    : new ChecksReader(problems, segmentCount, readingBasis).read(checkFields);

            ProjectSpec project = ProjectReader.read(root.object("project", false));
            if (idealisation == Idealisation.TRUSS && loads != null) {
                noMomentsOnATruss(loads.nodal());
            }
            ServiceabilitySpec serviceability = serviceability(root, generated && !explicit, loadTower.height());
            if (problems.count() > 0) {
                return null;
            }
            TowerSpec spec = new TowerSpec(name, description, idealisation, base, segments, material, supports, allowance,
                    planLevels, userSections, frame, loads, checks, basis, mixedBasis, project, serviceability);
            if (!mixedBasis) {
                refuseMixes(spec, basisGiven);
            }
            return spec;
        }

        /** A truss has no rotations: a nodal moment would have nothing to carry it. */
        private void noMomentsOnATruss(List<NodalLoadSpec> nodal) {
            for (int k = 0; k < nodal.size(); k++) {
                NodalLoadSpec f = nodal.get(k);
                if (f.mx() != 0 || f.my() != 0 || f.mz() != 0) {
                    problems.add("loads.nodal[" + k + "].F", "applies a moment at node " + f.node() + ", but the truss"
                            + " idealisation has no rotations to carry it: give [Fx, Fy, Fz], or choose idealisation"
                            + " frame or continuous-legs");
                }
            }
        }

        /** {@code serviceability}, of a generated tower only; {@link ServiceabilitySpec#NONE} when absent. */
        private ServiceabilitySpec serviceability(Fields root, boolean generated, double height) {
            Fields f = root.object("serviceability", false);
            if (f == null) {
                return ServiceabilitySpec.NONE;
            }
            if (!generated) {
                problems.add(root.path("serviceability"), "applies only to a generated tower (base and segments): "
                        + "the movement is measured at its panel levels");
                return ServiceabilitySpec.NONE;
            }
            String method = text(root.get("loads"), "wind", "method");
            method = method != null && LoadsReader.WIND_METHODS.contains(method) ? method : null;
            JsonNode loads = root.get("loads");
            if (method == null && loads != null && loads.isObject() && loads.has("wind")) {
                method = ServiceabilityReader.UNREADABLE_WIND;
            }
            JsonNode items = loads != null && loads.isObject() ? loads.get("ancillaries") : null;
            return new ServiceabilityReader(problems).read(f, method, height, items);
        }

        /** The basis of a model without the basis key: the family of its wind method, else of its check method. */
        private DesignBasis derivedBasis(Fields root) {
            String wind = text(root.get("loads"), "wind", "method");
            String checks = text(root.get("checks"), "method");
            String factors = text(root.get("loads"), "actionFactors");
            CheckMethod checkMethod = "asce10".equals(checks) ? CheckMethod.ASCE10 : "en1993".equals(checks) ? CheckMethod.EN1993 : null;
            ActionFactorSet set = null;
            for (ActionFactorSet s : ActionFactorSet.values()) {
                set = s.jsonName().equals(factors) ? s : set;
            }
            return BasisMixes.derive(wind, checkMethod, set);
        }

        /** The text at {@code keys} under {@code node}, or null. */
        private static String text(JsonNode node, String... keys) {
            JsonNode at = node;
            for (String key : keys) {
                at = at != null && at.isObject() ? at.get(key) : null;
            }
            return at != null && at.isTextual() ? at.textValue() : null;
        }

        /** Reports every value of the other family than the basis (mixedBasis is false). */
        private void refuseMixes(TowerSpec spec, boolean basisGiven) {
            String basis = spec.basis().jsonName();
            String whose = basisGiven ? "the model's basis is " + basis
                    : "the model's basis is " + basis + " (no basis key: taken from loads.wind.method, else checks.method)";
            for (BasisMix mix : spec.basisMixes()) {
                problems.add(mix.key(), mix.rule() + " belongs to the " + mix.family().jsonName() + " family but " + whose
                        + "; allowed here: " + BasisMixes.allowed(mix.key(), spec.basis())
                        + "; or set \"basis\" to match and change the other keys, or \"mixedBasis\": true to mix families");
            }
        }
    }
}
