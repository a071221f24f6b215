/**
 * The cost of a dirty coil and the payback of cleaning it: the saturation-temperature shift a
 * capacity loss forces, the compressor power it costs by a Carnot-based cycle approximation,
 * the yearly energy and money, and a plain-language summary for a service manager. Pure
 * functions on immutable values; SI units inside (K, W, J, s), money as a plain number with the
 * user's currency label.
 */
package org.finstack.study.cost;
