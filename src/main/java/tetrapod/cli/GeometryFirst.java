package tetrapod.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.generate.TowerGenerator;
import tetrapod.io.JsonOutput;
import tetrapod.io.PlainJson;
import tetrapod.io.ProblemLines;
import tetrapod.io.SpecReader;
import tetrapod.model.spec.TowerSpec;
import tetrapod.section.SectionCatalogue;
import tetrapod.section.SteelGrades;

/**
 * The geometry's own problems of a model file that does not read, so that one run reports them
 * beside the reading problems: when the file without its {@code loads} and {@code checks} reads
 * cleanly, the tower is generated from it and what that finds (panel heights, plan bracing
 * levels, sections of a role a segment lacks, ...) is added, each with its line in the file.
 */
final class GeometryFirst {

    /** The parts of a model file that the geometry does not depend on. */
    private static final List<String> NOT_GEOMETRY = List.of("loads", "checks");

    private GeometryFirst() { }

    /** {@code reading}'s problems and, when the geometry can be checked apart, the geometry's problems after them. */
    static BadInputException withGeometry(Path file, BadInputException reading) {
        List<Problem> more = geometryProblems(file);
        if (more.isEmpty()) {
            return reading;
        }
        List<Problem> all = new ArrayList<>(reading.problems());
        for (Problem p : more) {
            if (!all.contains(p)) {
                all.add(p);
            }
        }
        return new BadInputException(all);
    }

    private static List<Problem> geometryProblems(Path file) {
        TowerSpec spec;
        try {
            if (!(PlainJson.read(file) instanceof Map<?, ?> root)
                    || NOT_GEOMETRY.stream().noneMatch(root::containsKey)) {
                return List.of();
            }
            Map<Object, Object> geometry = new LinkedHashMap<>(root);
            NOT_GEOMETRY.forEach(geometry::remove);
            if (!allFinite(geometry)) {
                return List.of();   // a number beyond the double range: the reader has reported it
            }
            spec = SpecReader.read(JsonOutput.toJson(geometry), SectionCatalogue.standard());
        } catch (BadInputException notApart) {
            return List.of();   // the geometry has reading problems of its own: already reported
        }
        try {
            TowerGenerator.generate(spec, SectionCatalogue.standard().with(spec.userSections()),
                    SteelGrades.fromSpec(spec.material()));
            return List.of();
        } catch (BadInputException e) {
            return ProblemLines.located(file, e).problems();
        }
    }

    private static boolean allFinite(Object value) {
        if (value instanceof Map<?, ?> map) {
            return map.values().stream().allMatch(GeometryFirst::allFinite);
        }
        if (value instanceof List<?> list) {
            return list.stream().allMatch(GeometryFirst::allFinite);
        }
        return !(value instanceof Double d) || Double.isFinite(d);
    }
}
