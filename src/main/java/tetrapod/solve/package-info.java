/**
 * The direct-stiffness solver: element matrices, sparse assembly (EJML), one Cholesky
 * factorisation per structure, any number of load vectors, and the diagnosis of unstable
 * structures.
 *
 * <p>Use: {@code StructuralModel model = StructuralModel.of(frame);}
 * {@code FactoredSystem system = Solver.factor(model);}
 * {@code List<Solution> solutions = system.solveAll(loadVectors);}
 *
 * <p>Conventions: SI units (N, m, Pa, rad); tower axes z up; DOFs per node ux, uy, uz, rx, ry, rz
 * (right-handed rotations); member local x from i to j, y = orientation, z = x × y; Iy = Iu,
 * Iz = Iv. Reactions are the forces the supports exert on the structure. Member end forces are
 * end actions in local axes ({@link tetrapod.solve.MemberEndForces}); N is positive in tension.
 * EJML is used in this package only. See docs/solver.md.
 */
package tetrapod.solve;
