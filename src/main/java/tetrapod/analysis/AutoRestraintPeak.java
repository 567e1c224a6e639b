package tetrapod.analysis;

import tetrapod.solve.AutoRestraint;

/**
 * An auto-restraint and the largest force it carried over every case of the sweep.
 *
 * @param force  largest |force| (N) or |moment| (N·m, for a rotation) along its direction
 * @param caseId the case where it occurred (the first case when it carried nothing)
 */
public record AutoRestraintPeak(AutoRestraint restraint, double force, String caseId) { }
