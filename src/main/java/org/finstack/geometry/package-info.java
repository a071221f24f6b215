/** Immutable coil descriptions and everything derived from them (areas, passages, volume, mass). */
package org.finstack.geometry;
