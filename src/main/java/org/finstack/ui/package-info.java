/**
 * The workbench: a Swing desktop program (FlatLaf) to enter a coil as it is measured, rate it,
 * compare candidates side by side, sweep a parameter and keep the work in project files. Panels
 * each own one concern; the rating runs off the event thread in a {@link javax.swing.SwingWorker};
 * strings live in {@code Messages.properties}, colours in the theme files' {@code Finstack.*} keys.
 */
package org.finstack.ui;
