package tetrapod.size;

/**
 * One analysed design of a sizing run.
 *
 * @param number         1 for the first analysis
 * @param steelMass      bare steel mass of the design, kg
 * @param maxUtilisation the largest member utilisation over every case
 * @param changedGroups  groups whose section the next design changes (0 for the last)
 * @param nanos          wall time of the iteration (rebuild, analysis, checks, choice), ns
 */
public record Iteration(int number, double steelMass, double maxUtilisation, int changedGroups, long nanos) { }
