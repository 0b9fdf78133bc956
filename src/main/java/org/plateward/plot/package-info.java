/** Headless charts with Java2D ({@code BufferedImage} + {@code ImageIO}) for reports and calibration plots. */
package org.plateward.plot;
