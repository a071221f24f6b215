/**
 * Helpers shared by the fluid back ends and their data-file readers: reading the JSON data files.
 * Not for use outside {@code org.finstack.fluid}.
 */
package org.finstack.fluid.internal;
