/** The calibration's files: the TOML parameter file (cautions in its header) and the residual plots. */
package org.plateward.calibration.io;
