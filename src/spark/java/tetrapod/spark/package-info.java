/**
 * The fleet run ({@code tetrapod batch}) as an Apache Spark job, built only with the Maven profile
 * {@code spark}: the driver plans the work with {@link tetrapod.batch.FleetPlan}, the executors
 * analyse the models with {@link tetrapod.cli.TowerAnalysis}, and the driver writes the same
 * summary as the plain batch, with summary.parquet written by Spark.
 */
package tetrapod.spark;
