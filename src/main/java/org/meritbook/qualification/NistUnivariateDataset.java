package org.meritbook.qualification;

import java.math.BigDecimal;
import java.util.List;
import java.util.regex.Pattern;

/**
 * A NIST StRD univariate summary-statistics data set (Michelso, Mavro, NumAcc1–4, Lew, Lottery,
 * PiDigits) read from NIST's layout: the certified mean and SD (denominator n − 1), and the data
 * both as the doubles nearest the printed decimals and centred exactly on the first value.
 *
 * @param name          e.g. "NumAcc4"
 * @param values        the data, each the double nearest NIST's decimal text
 * @param centre        the first value, exactly as printed
 * @param centredValues value − centre, computed in decimal and rounded once to a double
 * @param certifiedMean NIST's certified sample mean
 * @param certifiedSd   NIST's certified sample standard deviation
 */
public record NistUnivariateDataset(String name, double[] values, BigDecimal centre, double[] centredValues,
        double certifiedMean, double certifiedSd) {

    private static final Pattern DATA_LINES = Pattern.compile("Data\\s*:\\s*lines\\s+(\\d+)\\s+to\\s+(\\d+)");
    private static final Pattern CERTIFIED_LINES = Pattern.compile("Certified Values\\s*:\\s*lines\\s+(\\d+)\\s+to\\s+(\\d+)");
    private static final Pattern MEAN = Pattern.compile("^\\s*Sample Mean\\s+ybar:\\s+(\\S+).*$");
    private static final Pattern SD = Pattern.compile("^\\s*Sample Standard Deviation.*\\s+s:\\s+(\\S+).*$");
    private static final Pattern OBSERVATIONS = Pattern.compile("^\\s*Number of Observations:\\s+(\\d+)\\s*$");

    /** The nine univariate sets, in NIST's order of difficulty (lower, average, higher). */
    public static final List<String> NAMES = List.of("PiDigits", "Lottery", "Lew", "Mavro", "Michelso",
            "NumAcc1", "NumAcc2", "NumAcc3", "NumAcc4");

    /** Reads one of the shipped files ({@code nist-strd/<name>.dat}). */
    public static NistUnivariateDataset load(String name) {
        List<String> lines = NistFile.lines(name);
        List<String> certified = NistFile.slice(lines, NistFile.range(lines, CERTIFIED_LINES));
        double mean = NistFile.number(NistFile.find(name, certified, MEAN, "mean").group(1));
        double sd = NistFile.number(NistFile.find(name, certified, SD, "standard deviation").group(1));
        List<BigDecimal> data = NistFile.slice(lines, NistFile.range(lines, DATA_LINES)).stream()
                .map(String::trim).map(BigDecimal::new).toList();
        int stated = Integer.parseInt(NistFile.find(name, lines, OBSERVATIONS, "number of observations").group(1));
        if (data.size() != stated) {
            throw new IllegalStateException(name + ": header states " + stated + " observations, data has " + data.size());
        }
        double[] values = data.stream().mapToDouble(BigDecimal::doubleValue).toArray();
        return new NistUnivariateDataset(name, values, data.get(0), NistFile.centred(data, data.get(0)), mean, sd);
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    @Override
    public double[] centredValues() {
        return centredValues.clone();
    }
}
