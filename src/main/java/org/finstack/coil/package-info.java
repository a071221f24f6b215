/**
 * Rating models that combine geometry, air side, refrigerant side and exchanger relations into a
 * {@link org.finstack.coil.Rating}.
 */
package org.finstack.coil;
