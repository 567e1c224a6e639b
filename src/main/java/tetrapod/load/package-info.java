/**
 * Loads on a tower: self-weight, wind from any azimuth by a published method, ancillaries, ice,
 * and their factored combinations, in SI units (N, m, Pa). Formulas and clauses: docs/methods.md.
 *
 * <h2>Entry point</h2>
 * {@link tetrapod.load.TowerLoads#build TowerLoads.build(tower, spec.loads())} gives every load of
 * a generated tower (or the nodal loads of an explicit frame):
 * <ul>
 * <li>{@link tetrapod.load.TowerLoads#dead()}, {@link tetrapod.load.TowerLoads#ice()},
 *     {@link tetrapod.load.TowerLoads#nodal()}: azimuth-independent nodal loads;</li>
 * <li>{@link tetrapod.load.TowerLoads#wind()}, {@link tetrapod.load.TowerLoads#windOnIce()}: the
 *     {@link tetrapod.load.WindLoads} of the bare and the iced tower;</li>
 * <li>{@link tetrapod.load.TowerLoads#combinations()}, {@link tetrapod.load.TowerLoads#azimuths()}
 *     and {@link tetrapod.load.TowerLoads#caseKeys()}: every combination at every azimuth of the
 *     sweep (once when it has no wind); {@link tetrapod.load.TowerLoads#loadCase} forms one case's
 *     factored load vector directly.</li>
 * </ul>
 *
 * <h2>Solving the sweep by superposition</h2>
 * {@link tetrapod.load.TowerLoads#basis()} is a {@link tetrapod.load.LoadBasis}: a few
 * azimuth-independent {@link tetrapod.load.LoadComponent}s (dead, ice, nodal, at most ten wind
 * vectors, at most ten wind-on-ice vectors) and, for any combination and azimuth, their weights:
 * <pre>
 *   LoadBasis basis = loads.basis();
 *   // solve every basis.components().get(j).loads() once with the one factorisation → u_j
 *   double[] w = new double[basis.size()];
 *   for (CaseKey key : loads.caseKeys()) {
 *       basis.weights(key.combination(), key.azimuthDeg(), w);   // allocates nothing
 *       // displacements, reactions and member forces of the case = Σ_j w[j] · (those of u_j)
 *   }
 * </pre>
 * The expansion is exact (docs/methods.md, "The sweep basis"); {@code loadCase(key)} gives the
 * same load vector formed directly, for results.json {@code cases[].loads} and for checking.
 *
 * <h2>results.json {@code wind}</h2>
 * {@link tetrapod.load.WindLoads#azimuth WindLoads.azimuth(θ)} gives, per panel, the
 * {@link tetrapod.load.PanelForce} record: panel, zBottom, zTop, zRef (m), q (Pa, with the
 * directional factor of θ), solidity, cf (with the incidence factor), area (m²), the response
 * factor, and the force Fx, Fy (N), with force = responseFactor × q × cf × area; and the
 * ancillaries' forces ({@link tetrapod.load.AncillaryForce}).
 *
 * <h2>Methods</h2>
 * Wind profiles ({@link tetrapod.load.WindProfile}): {@link tetrapod.load.En1991Wind},
 * {@link tetrapod.load.Asce7Wind}, {@link tetrapod.load.UniformWind}. Lattice force coefficients
 * ({@link tetrapod.load.LatticeCoefficients}): {@link tetrapod.load.En1993LatticeCoefficients},
 * {@link tetrapod.load.Asce7TrussedTowerCoefficients}, {@link tetrapod.load.UniformCoefficients}.
 * Ice: {@link tetrapod.load.Asce7Ice}. Combinations: {@link tetrapod.load.EnCombinations} ({@link tetrapod.load.EnPartialFactors}),
 * {@link tetrapod.load.Asce7Combinations}, {@link tetrapod.load.DefaultCombinations}.
 */
package tetrapod.load;
