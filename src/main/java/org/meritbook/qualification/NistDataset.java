package org.meritbook.qualification;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A NIST StRD linear-regression data set read from NIST's own .dat layout: the certified values
 * from the lines the header's "Certified Values (lines a to b)" names, the data from its
 * "Data (lines a to b)" lines, the columns as named by the "Data:" line just before them.
 */
public record NistDataset(String name, double[] x, double[] y, Map<String, double[]> parameters,
        double residualSd, double rSquared, int residualDf, double ssRegression, double ssResidual) {

    private static final Pattern CERTIFIED_LINES = Pattern.compile("Certified Values\\s*\\(lines (\\d+) to (\\d+)\\)");
    private static final Pattern DATA_LINES = Pattern.compile("Data\\s*\\(lines (\\d+) to (\\d+)\\)");
    private static final Pattern OBSERVATIONS = Pattern.compile("^\\s*(\\d+) Observations\\s*$");
    private static final Pattern PARAMETER = Pattern.compile("^\\s*(B\\d)\\s+(\\S+)\\s+(\\S+)\\s*$");
    private static final Pattern RESIDUAL_SD = Pattern.compile("^\\s*Standard Deviation\\s+(\\S+)\\s*$");
    private static final Pattern R_SQUARED = Pattern.compile("^\\s*R-Squared\\s+(\\S+)\\s*$");
    private static final Pattern REGRESSION = Pattern.compile("^\\s*Regression\\s+\\d+\\s+(\\S+)\\s+\\S+\\s+\\S+\\s*$");
    private static final Pattern RESIDUAL = Pattern.compile("^\\s*Residual\\s+(\\d+)\\s+(\\S+)\\s+\\S+\\s*$");

    /** Reads one of the NIST files meritbook ships ({@code nist-strd/<name>.dat} beside this class). */
    public static NistDataset load(String name) {
        return parse(name, NistFile.lines(name));
    }

    static NistDataset parse(String name, List<String> lines) {
        int[] certified = NistFile.range(lines, CERTIFIED_LINES);
        int[] data = NistFile.range(lines, DATA_LINES);
        Map<String, double[]> parameters = new HashMap<>();
        Double residualSd = null;
        Double rSquared = null;
        Double ssRegression = null;
        Double ssResidual = null;
        int residualDf = -1;
        for (String line : lines.subList(certified[0] - 1, certified[1])) {
            Matcher m;
            if ((m = PARAMETER.matcher(line)).matches()) {
                parameters.put(m.group(1), new double[] {number(m.group(2)), number(m.group(3))});
            } else if ((m = RESIDUAL_SD.matcher(line)).matches()) {
                residualSd = number(m.group(1));
            } else if ((m = R_SQUARED.matcher(line)).matches()) {
                rSquared = number(m.group(1));
            } else if ((m = REGRESSION.matcher(line)).matches()) {
                ssRegression = number(m.group(1));
            } else if ((m = RESIDUAL.matcher(line)).matches()) {
                residualDf = Integer.parseInt(m.group(1));
                ssResidual = number(m.group(2));
            }
        }
        if (parameters.isEmpty() || residualSd == null || rSquared == null || ssRegression == null
                || ssResidual == null) {
            throw new IllegalStateException(name + ": certified values incomplete");
        }

        String header = lines.get(data[0] - 2).trim();
        if (!header.startsWith("Data:")) {
            throw new IllegalStateException(name + ": expected the column line 'Data: ...' before the data, found " + header);
        }
        List<String> columns = List.of(header.substring("Data:".length()).trim().split("\\s+"));
        int xColumn = columns.indexOf("x");
        int yColumn = columns.indexOf("y");
        List<double[]> rows = new ArrayList<>();
        for (String line : lines.subList(data[0] - 1, data[1])) {
            String[] fields = line.trim().split("\\s+");
            if (fields.length != columns.size()) {
                throw new IllegalStateException(name + ": data line has " + fields.length + " fields: " + line);
            }
            rows.add(new double[] {number(fields[xColumn]), number(fields[yColumn])});
        }
        int stated = observations(lines);
        if (rows.size() != stated) {
            throw new IllegalStateException(name + ": header states " + stated + " observations, data has " + rows.size());
        }
        double[] x = rows.stream().mapToDouble(row -> row[0]).toArray();
        double[] y = rows.stream().mapToDouble(row -> row[1]).toArray();
        return new NistDataset(name, x, y, parameters, residualSd, rSquared, residualDf, ssRegression, ssResidual);
    }

    /** Certified estimate of parameter "B0", "B1", … */
    public double estimate(String parameter) {
        return parameters.get(parameter)[0];
    }

    /** Certified standard deviation of the estimate of a parameter. */
    public double standardDeviation(String parameter) {
        return parameters.get(parameter)[1];
    }

    private static int observations(List<String> lines) {
        for (String line : lines) {
            Matcher m = OBSERVATIONS.matcher(line);
            if (m.matches()) {
                return Integer.parseInt(m.group(1));
            }
        }
        throw new IllegalStateException("header states no number of observations");
    }

    private static double number(String text) {
        return NistFile.number(text);
    }
}
