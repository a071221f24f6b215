/**
 * Numerical functions shared by the calculation layers, written from published formulas:
 * modified Bessel functions of orders 0 and 1 (plain and exponentially scaled).
 */
package org.finstack.core.math;
