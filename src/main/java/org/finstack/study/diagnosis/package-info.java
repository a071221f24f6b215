/**
 * Field diagnosis of a coil from measurements: the measured air-side duty, the equivalent
 * air-side fouling resistance that makes the rating model deliver it, the present and the clean
 * coil's UA and capacity, the loss, the dust deposit level behind the loss and (with a measured
 * air pressure drop) behind the pressure drop in the fouling study's terms
 * ({@link org.finstack.study.diagnosis.DepositLevel}), their uncertainty from the stated
 * instrument accuracies and the air-side correlation's published scatter (linear propagation,
 * the scatter applied through {@link org.finstack.coil.CorrelationFactors}), the common-practice ranges
 * a healthy coil shows beside each reading, and the payback of a cleaning. SI units inside.
 */
package org.finstack.study.diagnosis;
