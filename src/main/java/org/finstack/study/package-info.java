/**
 * What users came for, on top of the rating models: projects holding the existing coil and its
 * candidate replacements under shared conditions, a registry of rating models, and sweeps of one
 * parameter. Pure functions of immutable records; no Swing, no units parsing.
 */
package org.finstack.study;
