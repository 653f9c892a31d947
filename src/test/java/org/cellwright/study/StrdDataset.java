package org.cellwright.study;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A NIST StRD nonlinear regression dataset as copied into src/test/resources/org/cellwright/study/strd:
 * starting values, certified values and standard deviations, certified residual sum of squares and
 * standard deviation, and the data (y, x).
 *
 * @param name the dataset's name
 * @param start1 the first (far) starting point
 * @param start2 the second (near) starting point
 * @param certified the certified parameter values
 * @param certifiedSd their certified standard deviations
 * @param residualSumOfSquares the certified residual sum of squares
 * @param residualSd the certified residual standard deviation
 * @param y the responses
 * @param x the predictors
 */
record StrdDataset(String name, double[] start1, double[] start2, double[] certified, double[] certifiedSd,
                   double residualSumOfSquares, double residualSd, double[] y, double[] x) {

    private static final Pattern PARAMETER = Pattern.compile(
            "^\\s*b\\d+\\s*=\\s*(\\S+)\\s+(\\S+)\\s+(\\S+)\\s+(\\S+)\\s*$");
    private static final Pattern FIGURE = Pattern.compile("^(Residual Sum of Squares|Residual Standard Deviation):\\s+(\\S+)");

    static StrdDataset load(String name) throws IOException {
        String text;
        try (InputStream in = StrdDataset.class.getResourceAsStream("strd/" + name + ".dat")) {
            if (in == null) {
                throw new IOException("no resource strd/" + name + ".dat");
            }
            text = new String(in.readAllBytes(), StandardCharsets.US_ASCII);
        }
        List<double[]> params = new ArrayList<>();
        List<double[]> data = new ArrayList<>();
        double rss = Double.NaN;
        double rsd = Double.NaN;
        boolean inData = false;
        for (String line : text.split("\n")) {
            if (inData) {
                String[] f = line.trim().split("\\s+");
                if (f.length == 2) {
                    data.add(new double[] {Double.parseDouble(f[0]), Double.parseDouble(f[1])});
                }
                continue;
            }
            if (line.startsWith("Data:   y") || line.startsWith("Data:  y")) {
                inData = true;
                continue;
            }
            Matcher m = PARAMETER.matcher(line);
            if (m.matches()) {
                params.add(new double[] {Double.parseDouble(m.group(1)), Double.parseDouble(m.group(2)),
                        Double.parseDouble(m.group(3)), Double.parseDouble(m.group(4))});
            }
            Matcher f = FIGURE.matcher(line);
            if (f.find()) {
                if (f.group(1).startsWith("Residual Sum")) {
                    rss = Double.parseDouble(f.group(2));
                } else {
                    rsd = Double.parseDouble(f.group(2));
                }
            }
        }
        int p = params.size();
        double[][] cols = new double[4][p];
        for (int j = 0; j < p; j++) {
            for (int k = 0; k < 4; k++) {
                cols[k][j] = params.get(j)[k];
            }
        }
        return new StrdDataset(name, cols[0], cols[1], cols[2], cols[3], rss, rsd,
                data.stream().mapToDouble(d -> d[0]).toArray(), data.stream().mapToDouble(d -> d[1]).toArray());
    }
}
