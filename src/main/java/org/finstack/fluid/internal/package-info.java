/**
 * Helpers shared by the fluid back ends and their data-file readers: reading the JSON data files,
 * and the input-pair dispatch, range checks, two-phase mixing and density iteration common to the
 * fluids computed from a Helmholtz-energy equation of state. Not for use outside
 * {@code org.finstack.fluid}.
 */
package org.finstack.fluid.internal;
