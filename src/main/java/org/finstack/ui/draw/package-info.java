/**
 * The coil drawings and the resistance bars, painted to any {@link java.awt.Graphics2D}: a window,
 * a PNG image or a test's {@link java.awt.image.BufferedImage}. No Swing components live here,
 * so exports and tests need no window; the colours come in a {@link org.finstack.ui.draw.Palette}.
 */
package org.finstack.ui.draw;
