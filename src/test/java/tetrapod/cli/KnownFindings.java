package tetrapod.cli;

import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * Inputs known to break the exit contract whose fix is issue 13 item 1 (physical bounds in the
 * model readers), listed explicitly so that the fuzz test does not fail on them until that is
 * done, and reports how many it set aside (DEVELOPERS.md, "Fuzz test"). An entry matches a mutant
 * by what was done to it and, unless it keeps the mutant from running at all (it would run out of
 * memory or take minutes), by what came out; {@code files} are its recorded regression inputs in
 * {@code src/test/resources/fuzz/findings/}. Remove an entry when its bound is in place: the fuzz
 * test and the regression files then hold the readers to it.
 */
final class KnownFindings {

    /** One known class of finding. */
    record Known(String id, Pattern description, Pattern outcome, boolean doNotRun, List<String> files, String reason) {
        boolean excuses(String mutation, String violation) {
            return description.matcher(mutation).find() && (doNotRun || outcome.matcher(violation).find());
        }
    }

    private static final String HUGE_OR_TINY = "\\s*=\\s*(1000000|\\d\\.\\d+E-?\\d+|2147483647|1000000000)\\b";

    static final List<Known> ITEM_1 = List.of(
            new Known("unbounded-counts", Pattern.compile(
                    "\\.(panels|redundants|bolts|holesInSection|shearPlanes|count|sweepStep)" + HUGE_OR_TINY + "|"
                            + "\\.(panels|redundants|bolts|holesInSection|shearPlanes|count|sweepStep)\\s*=\\s*10000\\b"),
                    Pattern.compile(""), true, List.of(),
                    "no bound on counts and steps (issue 13: panels 1e9 runs out of memory, 1e6 takes 100 s)"),
            new Known("extreme-geometry", Pattern.compile(
                    "\\.(segments\\[\\d+\\]\\.(height|topWidthX|topWidthY)|base\\.width[XY])" + HUGE_OR_TINY),
                    Pattern.compile("internal error: .*(parallel lines have no single intersection"
                            + "|generated lattice is not connected|a force or moment is not finite)"), false,
                    List.of("validate-seed13-input15.json", "validate-seed13-input723.json", "validate-seed13-input1070.json",
                            "validate-seed13-input1409.json", "validate-seed13-input1903.json", "validate-seed13-input2379.json",
                            "validate-seed13-input2411.json", "validate-seed13-input2475.json", "validate-seed13-input2546.json"),
                    "heights and widths of 1e6 m and more or 5e-324 m pass the reader and break the generator"),
            new Known("extreme-section-properties", Pattern.compile("\\.userSections\\.[^.]+\\.properties\\.\\w+" + HUGE_OR_TINY),
                    Pattern.compile("internal error: .*section properties must be positive"), false,
                    List.of("validate-seed13-input772.json", "validate-seed13-input1844.json"),
                    "a user section property of 5e-324 passes the reader, then is zero in SI units"),
            new Known("extreme-ancillary", Pattern.compile("\\.loads\\.ancillaries\\[\\d+\\]\\.\\w+" + HUGE_OR_TINY),
                    Pattern.compile("internal error: .*a force or moment is not finite"), false,
                    List.of("validate-seed13-input859.json"),
                    "an ancillary area of 1.8e308 m² passes the reader and makes an infinite wind force"));

    private KnownFindings() { }

    /** The entry that keeps this mutant from running, if any. */
    static Optional<Known> notToRun(String mutation) {
        return ITEM_1.stream().filter(k -> k.doNotRun() && k.excuses(mutation, "")).findFirst();
    }

    /** The entry that excuses this outcome of this mutant, if any. */
    static Optional<Known> excusing(String mutation, String violation) {
        return ITEM_1.stream().filter(k -> !k.doNotRun() && k.excuses(mutation, violation)).findFirst();
    }

    /** The entry that lists this recorded regression file, if any. */
    static Optional<Known> listing(String file) {
        return ITEM_1.stream().filter(k -> k.files().contains(file)).findFirst();
    }
}
