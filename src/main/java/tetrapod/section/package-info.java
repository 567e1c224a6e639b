/**
 * Cross-sections and steel grades: hot-rolled angles (EN 10056-1 range) with properties computed
 * from their dimensions, round tubes by name, user-defined sections, and EN 10025-2 / ASTM grades.
 *
 * <p>Angle axes (see {@link tetrapod.section.AngleProperties}): origin at the heel, leg A (the long
 * leg) along +y, leg B along +z; y–y is the centroidal axis parallel to leg A, z–z parallel to
 * leg B; u–u and v–v are the major and minor principal axes. SI units throughout.
 */
package tetrapod.section;
