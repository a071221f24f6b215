/**
 * Fans on a coil: a fan's static-pressure curve with monotone interpolation, its operating point
 * against the coil's system curve, the fan laws, and three generic fan behaviours (axial
 * propeller, forward-curved centrifugal, constant-airflow EC) for when no maker's curve is known.
 * Pure functions on immutable values; SI units throughout (m3/s, Pa, W).
 */
package org.finstack.study.fan;
