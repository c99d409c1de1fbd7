package org.meritbook.qualification;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A NIST StRD one-way ANOVA data set (SiRstv, SmLs01–09, AtmWtAg) read from NIST's layout: the
 * certified ANOVA table, R² and residual SD, and the responses grouped by treatment in order of
 * appearance, both as the doubles nearest the printed decimals and centred exactly on the first
 * response.
 *
 * @param name          e.g. "SmLs07"
 * @param groups        responses per treatment, each the double nearest NIST's decimal text
 * @param centre        the first response, exactly as printed
 * @param centredGroups response − centre, computed in decimal and rounded once to a double
 * @param dfBetween     certified between-treatment degrees of freedom
 * @param ssBetween     certified between-treatment sum of squares
 * @param msBetween     certified between-treatment mean square
 * @param f             certified F statistic
 * @param dfWithin      certified within-treatment degrees of freedom
 * @param ssWithin      certified within-treatment sum of squares
 * @param msWithin      certified within-treatment mean square
 * @param rSquared      certified R²
 * @param residualSd    certified residual standard deviation
 */
public record NistAnovaDataset(String name, List<double[]> groups, BigDecimal centre, List<double[]> centredGroups,
        int dfBetween, double ssBetween, double msBetween, double f, int dfWithin, double ssWithin, double msWithin,
        double rSquared, double residualSd) {

    private static final Pattern CERTIFIED_LINES = Pattern.compile("Certified Values\\s*\\(lines (\\d+) to (\\d+)\\)");
    private static final Pattern DATA_LINES = Pattern.compile("Data\\s*\\(lines (\\d+) to (\\d+)\\)");
    private static final Pattern BETWEEN = Pattern.compile("^\\s*Between\\s+\\S+\\s+(\\d+)\\s+(\\S+)\\s+(\\S+)\\s+(\\S+)\\s*$");
    private static final Pattern WITHIN = Pattern.compile("^\\s*Within\\s+\\S+\\s+(\\d+)\\s+(\\S+)\\s+(\\S+)\\s*$");
    private static final Pattern R_SQUARED = Pattern.compile("^\\s*Certified R-Squared\\s+(\\S+)\\s*$");
    private static final Pattern RESIDUAL_SD = Pattern.compile("^\\s*Standard Deviation\\s+(\\S+)\\s*$");
    private static final Pattern OBSERVATIONS = Pattern.compile("^\\s*(\\d+) Observations\\s*$");

    /** The eleven ANOVA sets, in NIST's order of difficulty (lower, average, higher). */
    public static final List<String> NAMES = List.of("SiRstv", "SmLs01", "SmLs02", "SmLs03", "AtmWtAg",
            "SmLs04", "SmLs05", "SmLs06", "SmLs07", "SmLs08", "SmLs09");

    public NistAnovaDataset {
        groups = List.copyOf(groups);
        centredGroups = List.copyOf(centredGroups);
    }

    /** Reads one of the shipped files ({@code nist-strd/<name>.dat}). */
    public static NistAnovaDataset load(String name) {
        List<String> lines = NistFile.lines(name);
        int[] data = NistFile.range(lines, DATA_LINES);
        // The certified block runs to the data: AtmWtAg's header names lines 41 to 47, but its
        // residual SD stands on line 48.
        int[] certifiedLines = {NistFile.range(lines, CERTIFIED_LINES)[0], data[0] - 1};
        List<String> certified = NistFile.slice(lines, certifiedLines);
        Matcher between = NistFile.find(name, certified, BETWEEN, "between-treatment line");
        Matcher within = NistFile.find(name, certified, WITHIN, "within-treatment line");
        double rSquared = NistFile.number(NistFile.find(name, certified, R_SQUARED, "R-squared").group(1));
        double residualSd = NistFile.number(NistFile.find(name, certified, RESIDUAL_SD, "residual SD").group(1));

        if (!lines.get(data[0] - 2).trim().startsWith("Data:")) {
            throw new IllegalStateException(name + ": expected the column line 'Data: ...' before the data");
        }
        Map<String, List<BigDecimal>> byTreatment = new LinkedHashMap<>();
        for (String line : NistFile.slice(lines, data)) {
            String[] fields = line.trim().split("\\s+");
            if (fields.length != 2) {
                throw new IllegalStateException(name + ": data line has " + fields.length + " fields: " + line);
            }
            byTreatment.computeIfAbsent(fields[0], k -> new ArrayList<>()).add(new BigDecimal(fields[1]));
        }
        int count = byTreatment.values().stream().mapToInt(List::size).sum();
        int stated = Integer.parseInt(NistFile.find(name, lines, OBSERVATIONS, "number of observations").group(1));
        if (count != stated) {
            throw new IllegalStateException(name + ": header states " + stated + " observations, data has " + count);
        }
        BigDecimal centre = byTreatment.values().iterator().next().get(0);
        List<double[]> groups = new ArrayList<>();
        List<double[]> centred = new ArrayList<>();
        for (List<BigDecimal> g : byTreatment.values()) {
            groups.add(g.stream().mapToDouble(BigDecimal::doubleValue).toArray());
            centred.add(NistFile.centred(g, centre));
        }
        return new NistAnovaDataset(name, groups, centre, centred,
                Integer.parseInt(between.group(1)), NistFile.number(between.group(2)), NistFile.number(between.group(3)),
                NistFile.number(between.group(4)), Integer.parseInt(within.group(1)), NistFile.number(within.group(2)),
                NistFile.number(within.group(3)), rSquared, residualSd);
    }

    /** The groups (copies), as the doubles nearest the printed responses. */
    @Override
    public List<double[]> groups() {
        return groups.stream().map(double[]::clone).toList();
    }

    /** The groups (copies), centred exactly on {@link #centre()} before conversion to doubles. */
    @Override
    public List<double[]> centredGroups() {
        return centredGroups.stream().map(double[]::clone).toList();
    }
}
