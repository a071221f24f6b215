/**
 * What users came for, on top of the rating models: projects holding the existing coil and its
 * candidate replacements under shared conditions, a registry of rating models, sweeps of one
 * parameter, and the cautions that go with every rating. Pure functions of immutable records; no
 * Swing, no units parsing.
 */
package org.finstack.study;
