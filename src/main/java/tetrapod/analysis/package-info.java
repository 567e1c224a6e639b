/**
 * The analysis run: loads → one factorisation → every combination at every azimuth of the sweep,
 * by superposing the responses to a few azimuth-independent load vectors; the cases reported in
 * full are solved directly. Wires {@code load} and {@code solve}; {@code check} and {@code report}
 * read its result.
 */
package tetrapod.analysis;
