/**
 * Fast property tables: {@link org.finstack.fluid.table.TabulatedFluid} wraps any exact fluid
 * and answers the same calls from splines along the saturation line and bicubic grids per phase
 * built once from it, falling back to the exact fluid outside the tables. The benchmark harness
 * {@link org.finstack.fluid.table.TableBenchmark} measures the speed-up.
 */
package org.finstack.fluid.table;
