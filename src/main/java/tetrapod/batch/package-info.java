/**
 * Fleet runs: many towers under many scenarios (JSON Merge Patch documents) in one run on every
 * core. The manifest and scenarios are read here, the work is identified and shared out here, and
 * the summary (CSV and HTML) is written here; the analysis of one tower × scenario is given by the
 * caller ({@link tetrapod.batch.TowerJob}), so that it is exactly what {@code analyze} does. The
 * plan of the work ({@link tetrapod.batch.FleetPlan}) and the summary writers serve the Spark job
 * ({@code tetrapod.spark}, Maven profile {@code spark}) too.
 */
package tetrapod.batch;
