package org.cellwright.study;

/**
 * One measured column beside the fitted model: for the plot of measured against fitted and the residuals.
 *
 * @param series the measured column
 * @param weight the weight its residuals carried
 * @param scale its typical magnitude (root mean square of its values), which its residuals were divided by
 * @param timesS the times of its values (s), blanks left out
 * @param measured its values there, in the log's unit
 * @param fitted the fitted model's values at the same times
 * @param curve the fitted model over the whole run, for a line
 * @param rmse root mean square of measured minus fitted, in the log's unit
 */
public record ColumnFit(LogSeries series, double weight, double scale, double[] timesS, double[] measured,
                        double[] fitted, ModelCurve curve, double rmse) {
}
