/**
 * Frost on an evaporator whose surface runs below 0 C in humid air: the frost's density and
 * conductivity from published relations, and a march in time in which the frost removed from the
 * air builds a layer that narrows the air passages exactly as a dust deposit does
 * ({@link org.finstack.study.fouling.DepositLayer}), with the fan in the loop, up to the defrost
 * interval. Pure functions on immutable values; SI units throughout.
 */
package org.finstack.study.frost;
