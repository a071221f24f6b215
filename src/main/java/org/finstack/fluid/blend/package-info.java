/**
 * Refrigerant blends behind the {@link org.finstack.fluid.Fluid} interface. R-410A, R-404A,
 * R-407C and R-507A are computed as pseudo-pure fluids after Lemmon (2003)
 * ({@link org.finstack.fluid.blend.Lemmon2003PseudoPureBlend}): a Helmholtz-energy equation of
 * state for the blend at its fixed composition plus separate bubble-point and dew-point pressure
 * equations that carry the temperature glide. Other blends the trade uses (R-448A, R-449A,
 * R-454B, R-513A, R-407F) need a multi-fluid mixture model and are refused by name
 * ({@link org.finstack.fluid.blend.UnsupportedBlends}), never approximated.
 */
package org.finstack.fluid.blend;
