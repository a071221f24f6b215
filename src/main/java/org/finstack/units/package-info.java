/**
 * Quantities at the edges: reading text such as {@code "9.52 mm"}, {@code "12 fpi"},
 * {@code "2000 cfm"} or {@code "3 psig"} into SI doubles, and writing SI doubles back as text in
 * SI or US customary units. Everything inside Finstack is SI (kelvin, pascal, metre, kilogram,
 * second, watt); this package is the only place that knows other units.
 *
 * <p>Conversion factors are the exact defined values or the values of NIST Special Publication
 * 811 (2008), Appendix B.8/B.9; each factor names its source beside it (see {@link
 * org.finstack.units.Quantities#SOURCE}).
 */
package org.finstack.units;
