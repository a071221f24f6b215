/**
 * Solids for tubes and fins, and coatings, each with conductivity and density from a named
 * source (data in {@code coil-library/materials.json}).
 */
package org.finstack.material;
