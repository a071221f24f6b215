/**
 * Air-side particulate fouling and inside (oil-film) fouling of a coil, with the fan in the
 * loop: a deposit of given thickness narrows the air passages and adds its conduction
 * resistance ({@link org.finstack.study.fouling.FoulingLevel},
 * {@link org.finstack.study.fouling.DepositLayer}); the coil is re-rated at the airflow where the
 * fan curve meets the coil's pressure-drop curve ({@link org.finstack.study.fouling.FanInLoop});
 * {@link org.finstack.study.fouling.FoulingStudy} sweeps the level from clean to heavily fouled
 * and infers the level from a measured rise of the air-side pressure drop. Pure functions on
 * immutable values; SI units throughout.
 */
package org.finstack.study.fouling;
