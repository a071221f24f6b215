/**
 * Foundations shared by every layer: citations, validity ranges, warnings, and the exception
 * hierarchy with its message catalogue.
 */
package org.finstack.core;
