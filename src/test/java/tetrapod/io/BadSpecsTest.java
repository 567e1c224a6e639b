package tetrapod.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;

/**
 * The catalogue of bad model files in src/test/resources/bad-specs: each must be refused with
 * its own clear message, at its path and on the line where the offending key or value stands
 * (counted in the file by hand), and with no other problem unless the table says so.
 */
class BadSpecsTest {

    /** One bad file: the problem expected (path, line, a fragment of its message) and how many problems in all. */
    record Case(String file, String path, int line, String fragment, int problems) {
        @Override
        public String toString() {
            return file;
        }
    }

    static Stream<Case> catalogue() {
        return Stream.of(
                new Case("malformed-json.json", "$", 8, "malformed JSON: unexpected character '}'", 1),
                new Case("wrong-type-panels.json", "segments[0].panels", 6, "must be a whole number from 1 to 5000, was \"four\"", 1),
                new Case("wrong-type-quoted-number.json", "segments[0].height", 5,
                        "must be a number in m, was the text \"8.0\"; write the number without quotes", 1),
                new Case("wrong-type-crossing.json", "segments[0].crossingConnected", 7, "must be true or false, was \"yes\"", 1),
                new Case("negative-width.json", "segments[1].topWidthX", 9, "must be ≥ 0.1 m and ≤ 200 m, was -1.5", 1),
                new Case("zero-height.json", "segments[0].height", 5, "must be ≥ 0.1 m and ≤ 1000 m, was 0", 1),
                new Case("zero-base-width.json", "base.widthY", 5, "must be > 0 m, was 0.0: the four legs would start from one point", 1),
                new Case("zero-width-below-segment.json", "segments[0].topWidthX", 6,
                        "must be > 0 m, was 0: the four legs would meet in a point at this level, and segments[1] above stands on it", 1),
                new Case("zero-panels.json", "segments[0].panels", 6, "must be a whole number from 1 to 5000, was 0", 1),
                new Case("unknown-bracing.json", "segments[1].bracing", 9, "unknown bracing 'z'; expected one of x, k, single", 1),
                new Case("unknown-section.json", "segments[0].sections.diagonal", 9,
                        "unknown section 'L60x7'; nearest known: L60x5, L60x6, L65x7", 1),
                new Case("unknown-key.json", "segments[0].hieght", 5, "unknown key; did you mean 'height'?", 2),
                new Case("unknown-top-key.json", "conectionAllowance", 9, "unknown key; did you mean 'connectionAllowance'?", 1),
                new Case("nan-value.json", "segments[0].topWidthY", 6, "must be a finite number in m, was NaN", 1),
                new Case("nan-text.json", "segments[0].height", 5,
                        "must be a number in m, was the text \"NaN\"; a value must be a finite number", 1),
                new Case("infinity.json", "base.widthY", 4, "must be a finite number in m, was Infinity", 1),
                new Case("empty-segments.json", "segments", 4, "must list at least one segment", 1),
                new Case("panel-heights-sum.json", "segments[0].panelHeights", 6,
                        "the panel heights add up to 7.5 m but the segment height is 8 m; they must agree within 1 mm", 1),
                new Case("panel-heights-count.json", "segments[0].panelHeights", 6, "has 3 heights but panels is 4", 1),
                new Case("both-base-and-frame.json", "frame", 9, "give either base and segments (a generated tower) or frame", 1),
                new Case("neither-base-nor-frame.json", "$", 1, "the model needs either base and segments", 1),
                new Case("missing-name.json", "name", 1, "required key is missing; expected a text", 1),
                new Case("missing-bracing.json", "segments[0].bracing", 5, "required key is missing; expected one of x, k, single", 1),
                new Case("missing-horizontal-section.json", "segments[0].sections.horizontal", 7, "K bracing needs them", 1),
                new Case("redundants-out-of-range.json", "segments[0].redundants", 6, "must be a whole number from 0 to 2, was 3", 1),
                new Case("duplicate-key.json", "segments[0].height", 7, "duplicate key 'height' (first given on line 5)", 1),
                new Case("connection-allowance-range.json", "connectionAllowance", 9, "must be ≥ 0 and < 1, was 10", 1),
                new Case("material-fu-below-fy.json", "material.fu", 10, "must not be less than fy (355 MPa), was 300", 1),
                new Case("user-angle-too-thick.json", "userSections.ANG55.angle.t_mm", 11,
                        "must be less than the shorter leg (55 mm), was 60", 1),
                new Case("frame-member-missing-node.json", "frame.members[1].j", 12, "node 17 does not exist", 1),
                new Case("frame-duplicate-node-id.json", "frame.nodes[2].id", 7, "node id 2 is already used by frame.nodes[1]", 1),
                new Case("restraint-wrong-length.json", "frame.supports[1].restraint", 17,
                        "must have 6 flags [ux, uy, uz, rx, ry, rz], each 0 or 1; had 5", 1),
                new Case("load-on-missing-node.json", "loads.nodal[1].node", 13, "node 5 does not exist", 1),
                new Case("frame-unknown-role.json", "frame.members[0].role", 8,
                        "unknown role 'column'; expected one of leg, diagonal, horizontal, redundant, plan, general", 1),
                new Case("frame-with-tower-supports.json", "supports", 3, "applies only to a generated tower", 1),
                new Case("not-an-object.json", "$", 1, "must be an object { ... }, was an array", 1),
                new Case("empty-file.json", "$", 1, "the file is empty", 1),
                new Case("wind-negative-speed.json", "loads.wind.basicSpeed", 9, "must be > 0 m/s, was -26.0", 1),
                new Case("wind-absurd-speed.json", "loads.wind.speed", 9,
                        "must be ≤ 100 m/s, was 160: wind speeds are in m/s", 1),
                new Case("wind-unknown-terrain.json", "loads.wind.terrain", 10,
                        "unknown terrain category 'V'; expected one of 0, I, II, III, IV", 1),
                new Case("wind-unknown-exposure.json", "loads.wind.exposure", 10,
                        "unknown exposure 'A'; expected one of B, C, D", 1),
                new Case("wind-unknown-method.json", "loads.wind.method", 9,
                        "unknown wind method 'en1992'; expected one of en1991, asce7, uniform", 1),
                new Case("wind-key-of-other-method.json", "loads.wind.exposure", 10,
                        "is a key of method 'asce7', not of 'en1991'", 1),
                new Case("wind-direction-factors-count.json", "loads.wind.directionFactors", 10,
                        "must list 12 values of c_dir", 1),
                new Case("ancillary-above-top.json", "loads.ancillaries[1].height", 12,
                        "is above the tower top (12 m), was 14.5", 1),
                new Case("ice-negative-thickness.json", "loads.ice.thickness_mm", 10, "must be ≥ 0 mm and ≤ 300 mm, was -10", 1),
                new Case("ice-asce7-design-thickness.json", "loads.ice.thickness_mm", 10,
                        "is not read with the asce7 wind: give nominalThickness_mm", 1),
                new Case("combination-misspelt-action.json", "loads.combinations[0].wnd", 11,
                        "unknown key; did you mean 'wind'?", 1),
                new Case("combination-wind-without-wind.json", "loads.combinations[0].wind", 11,
                        "the model has no wind (loads.wind)", 1),
                new Case("wind-on-explicit-frame.json", "loads.wind", 9, "applies only to a generated tower", 1),
                new Case("sweep-step-not-divisor.json", "loads.sweepStep", 10,
                        "360° is not a whole number of steps of 7°", 1),
                new Case("checks-unknown-key.json", "checks.conections", 12, "unknown key; did you mean 'connections'?", 1),
                new Case("checks-bolt-grade.json", "checks.connections[0].grade", 13,
                        "unknown bolt grade '8.9'; expected one of 4.6, 5.6, 8.8, 10.9", 1),
                new Case("checks-bolt-size.json", "checks.connections[0].diameter_mm", 13,
                        "must be a metric coarse thread size from M12 to M72", 1),
                new Case("checks-factors-asce.json", "checks.partialFactors", 12, "applies to method en1993 only", 1),
                new Case("basis-unknown.json", "basis", 3, "unknown design basis 'eu'; expected one of en, us", 1),
                new Case("basis-reliability-class-range.json", "loads.reliabilityClass", 10,
                        "must be a whole number from 1 to 3, was 4", 1),
                new Case("basis-action-factors-unknown.json", "loads.actionFactors", 10,
                        "unknown action factors 'en1991'; expected one of en1993-3-1, en1990, asce7", 1),
                new Case("basis-reliability-class-asce7.json", "loads.reliabilityClass", 10,
                        "applies only to actionFactors en1993-3-1", 1),
                new Case("basis-mixed-derived.json", "checks.method", 9, "ASCE 10 member and bolt checks belongs to the us"
                        + " family but the model's basis is en (no basis key: taken from loads.wind.method, else checks.method);"
                        + " allowed here: en1993; or set \"basis\" to match and change the other keys, or \"mixedBasis\": true", 1),
                new Case("basis-mixed-given.json", "loads.wind.method", 9, "EN 1991-1-4 wind belongs to the en family but the"
                        + " model's basis is us; allowed here: asce7 or uniform", 1),
                new Case("checks-connection-overlap.json", "checks.connections[1]", 13,
                        "covers diagonal members already covered by checks.connections[0]", 1),
                new Case("checks-segment-out-of-range.json", "checks.bucklingLengths[0].segments[0]", 12,
                        "must be a whole number from 1 to 2, was 3", 1),
                new Case("checks-uplift-both.json", "checks.foundation.uplift", 14,
                        "give either factorOfSafety (uplift × FS ≤ weights) or gammaStabilising (EN 1997 UPL), not both", 1),
                new Case("checks-anchor-no-resistance.json", "checks.foundation.anchorRods", 15,
                        "give either grade (4.6, 5.6, 8.8) or allowableTension and allowableShear in MPa", 1),
                new Case("checks-anchor-grade.json", "checks.foundation.anchorRods.grade", 15,
                        "anchor rods of grade 10.9 (f_yb = 900 MPa) are outside EN 1993-1-8 6.2.2 (7)", 1),
                new Case("checks-frustum-angle.json", "checks.foundation.frustumHalfAngle", 14,
                        "must be ≥ 0 degrees and < 90 degrees, was 90", 1),
                new Case("serviceability-negative-tilt.json", "serviceability.ancillaries[0].tilt_deg", 14,
                        "must be > 0 degrees and ≤ 10 degrees, was -0.5", 1),
                new Case("serviceability-absurd-sway.json", "serviceability.levels[0].sway_mm", 13,
                        "must be > 0 mm and ≤ 5000 mm, was 20000", 1),
                new Case("serviceability-unknown-ancillary.json", "serviceability.ancillaries[0].name", 13,
                        "no ancillary is called 'dish 1.2m' in loads.ancillaries; did you mean 'dish 1.2 m'?", 1),
                new Case("serviceability-wind-key-of-other-method.json", "serviceability.wind.speed", 12,
                        "does not go with the en1991 wind; with it give returnPeriod or probabilityFactor", 1),
                new Case("serviceability-return-period-range.json", "serviceability.wind.returnPeriod", 12,
                        "must be ≥ 2 years and ≤ 10000 years, was 1", 1));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("catalogue")
    void eachBadSpecGivesItsOwnLocatedMessage(Case c) throws IOException {
        String text = resource(c.file());
        BadInputException e = assertThrows(BadInputException.class, () -> SpecReader.read(text, new FixtureSections()));
        List<Problem> problems = e.problems();
        Problem found = problems.stream()
                .filter(p -> p.path().equals(c.path()) && p.message().contains(c.fragment()))
                .findFirst()
                .orElseThrow(() -> new AssertionError("no problem at " + c.path() + " containing '" + c.fragment()
                        + "'; got " + problems));
        assertEquals(c.line(), found.line(), () -> "line of " + found);
        assertEquals(c.problems(), problems.size(), () -> "problems: " + problems);
        for (Problem p : problems) {
            assertFalse(p.message().contains("com.fasterxml") || p.message().contains("Source:")
                    || p.message().contains("Exception"), () -> "library jargon in " + p);
            assertTrue(p.line() > 0, () -> "no line for " + p);
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("catalogue")
    void problemReadsAsOneLineWithPathAndLine(Case c) throws IOException {
        String text = resource(c.file());
        BadInputException e = assertThrows(BadInputException.class, () -> SpecReader.read(text, new FixtureSections()));
        String shown = e.problems().stream().filter(p -> p.path().equals(c.path())).findFirst().orElseThrow().toString();
        assertTrue(shown.startsWith(c.path() + ": "), shown);
        assertTrue(shown.endsWith("(line " + c.line() + ")"), shown);
        assertFalse(shown.contains("\n"), shown);
    }

    static String resource(String file) throws IOException {
        try (InputStream in = BadSpecsTest.class.getResourceAsStream("/bad-specs/" + file)) {
            if (in == null) {
                throw new IOException("missing test resource bad-specs/" + file);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }
}
