/**
 * Air-side heat transfer and friction of plate fins on round tubes: the surface description
 * the correlations need ({@link org.finstack.airside.AirSideSurface}), the Colburn j and Fanning
 * f factors ({@link org.finstack.airside.JF}), one class per published correlation behind
 * {@link org.finstack.airside.AirSideCorrelation}, a registry
 * ({@link org.finstack.airside.AirSideCorrelations}), the Kays &amp; London core pressure drop
 * and the heat-transfer coefficient from j. Fin efficiency lives in
 * {@code org.finstack.airside.fin}.
 */
package org.finstack.airside;
