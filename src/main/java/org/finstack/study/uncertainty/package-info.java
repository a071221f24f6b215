/**
 * Uncertainty of a rating: the published scatter of the air-side correlations turned into a
 * standard deviation ({@link org.finstack.study.uncertainty.NormalCoverage}), input tolerances
 * ({@link org.finstack.study.uncertainty.InputTolerances}), and a seeded Monte Carlo band of capacity and air
 * pressure drop ({@link org.finstack.study.uncertainty.UncertaintyBand}), each sample rated with its drawn j and f
 * factors ({@link org.finstack.coil.CorrelationFactors}). Pure functions; SI units inside.
 */
package org.finstack.study.uncertainty;
