package org.meritbook.qualification;

import java.util.List;
import java.util.Locale;

/** The qualification record as Markdown: what was run, on what, and every figure with its digits. */
public final class QualificationReport {
    private QualificationReport() {
    }

    /**
     * @param checks      the checks run
     * @param environment lines describing the software and machine (version, Java, OS, time of the run)
     */
    public static String markdown(List<QualificationCheck> checks, List<String> environment) {
        long failed = checks.stream().filter(c -> !c.passed()).count();
        StringBuilder md = new StringBuilder("# meritbook qualification record\n\n");
        for (String line : environment) {
            md.append("- ").append(line).append('\n');
        }
        md.append("\nmeritbook's statistics recompute the certified values of NIST Statistical Reference Datasets "
                + "(https://www.itl.nist.gov/div898/strd/): the calibration fits on the linear least-squares sets "
                + "Norris, NoInt1, NoInt2 and Pontius; the mean and SD on the univariate sets "
                + String.join(", ", NistUnivariateDataset.NAMES) + "; the one-way analysis of variance on "
                + String.join(", ", NistAnovaDataset.NAMES) + ". "
                + "The univariate and ANOVA data are read as decimals and centred exactly on each file's first value "
                + "before conversion to binary numbers, because a double cannot carry their constant leading digits "
                + "(up to 13 in SmLs07–09) beside the varying ones; the mean is shifted back, and SDs, sums of squares, "
                + "mean squares, F and R² do not change under the shift. "
                + "Digits are the log relative error, −log10(|computed − certified| / |certified|), capped at 15; "
                + "each figure must reach ").append(fmt(Qualification.REQUIRED_DIGITS, 0)).append(".\n\n");
        md.append("**Outcome: ").append(failed == 0 ? "all " + checks.size() + " figures passed"
                : failed + " of " + checks.size() + " figures FAILED").append(".**\n\n");
        md.append("| data set | model | figure | certified | computed | digits | result |\n")
                .append("|---|---|---|---|---|---|---|\n");
        for (QualificationCheck c : checks) {
            md.append("| ").append(c.dataset()).append(" | ").append(c.model()).append(" | ").append(c.figure())
                    .append(" | ").append(sci(c.certified())).append(" | ").append(sci(c.computed())).append(" | ")
                    .append(fmt(c.digits(), 1)).append(" | ").append(c.passed() ? "pass" : "FAIL").append(" |\n");
        }
        md.append("\nThis record supports, and does not replace, the laboratory's own validation of the software "
                + "under its procedures.\n");
        return md.toString();
    }

    private static String sci(double v) {
        return String.format(Locale.ROOT, "%.15e", v);
    }

    private static String fmt(double v, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }
}
