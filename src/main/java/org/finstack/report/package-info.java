/**
 * The one-page summary of a comparison a service manager can sign off: the question, the
 * recommendation, the comparison table, a chart of capacity and air pressure drop per option,
 * the trade-offs in words, the assumptions and conditions, the methods with their references,
 * the cautions and the statement that local codes and licensed practice govern. Written as PDF
 * (PDFBox) or HTML, atomically; the chart is drawn by JFreeChart to a PNG image placed in either.
 * Units are formatted here, at the edge; no physics.
 */
package org.finstack.report;
