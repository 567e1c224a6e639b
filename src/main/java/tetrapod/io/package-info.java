/**
 * Reading and writing model files (tower specs) and writing JSON output. The only package that
 * uses the JSON library (Jackson); the rest of the program sees records and plain Java values.
 *
 * <ul>
 *   <li>{@link tetrapod.io.SpecReader} reads a model file into a
 *       {@link tetrapod.model.spec.TowerSpec} with defaults filled in, or throws a
 *       {@link tetrapod.common.BadInputException} listing every problem, each with its JSON path
 *       ({@code segments[2].topWidthX}, {@code frame.members[4].j}; {@code $} for the whole file)
 *       and line.</li>
 *   <li>{@link tetrapod.io.SpecWriter} writes a spec back in the same format; reading that text
 *       gives an equal spec.</li>
 *   <li>{@link tetrapod.io.JsonOutput} writes maps, lists and scalars as pretty, deterministic
 *       JSON; {@link tetrapod.io.AtomicFiles} replaces a file in one step (temporary file in the
 *       same directory, then an atomic move). Every output writer should use them.</li>
 * </ul>
 *
 * <p>Model-file units: m, kN, kN·m, MPa, kg/m³; user section dimensions in mm, cm², cm⁴ as
 * their keys say. The JSON Schema of the format is {@code docs/tower-spec.schema.json}.
 */
package tetrapod.io;
