/**
 * Side-by-side comparison of a project's coils: each option rated at the project's conditions
 * with the model its case names ({@link org.finstack.coil.CoilModels#rate}), its capacity against
 * the existing coil's, the airflow the project's fan really delivers through it, its refrigerant
 * pressure drop and charge, its metal mass and materials, the margin of its tubes' allowable
 * pressure over the refrigerant's pressure at the highest expected condensing temperature, a
 * charge screen for flammable or toxic refrigerants against the project's room, the project's
 * limits it breaks, and (when asked for, {@link org.finstack.study.compare.BandSettings}) its
 * capacity band. A coil that cannot be rated, or an entry of the project file that could not be
 * read, reports its reason and the others still compare. Pure functions of immutable records;
 * values in SI.
 */
package org.finstack.study.compare;
