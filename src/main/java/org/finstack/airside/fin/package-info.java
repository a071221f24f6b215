/**
 * Dry fin efficiency of plate fins on round tubes: the unit cell of one tube
 * ({@link org.finstack.airside.fin.PlateFinCell}), the published efficiency methods behind
 * {@link org.finstack.airside.fin.FinEfficiencyMethod} (listed by
 * {@link org.finstack.airside.fin.FinEfficiencyMethods}), and the surface effectiveness that
 * combines fin efficiency with the bare-tube area.
 */
package org.finstack.airside.fin;
