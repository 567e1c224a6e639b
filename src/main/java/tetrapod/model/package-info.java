/**
 * The analysis model as immutable records: nodes, members, sections, material, supports, frame.
 * SI units throughout (m, N, Pa, kg). Tower axes: z up, x and y along the base's face directions.
 */
package tetrapod.model;
