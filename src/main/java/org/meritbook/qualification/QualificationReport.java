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
        md.append("\nThe calibration fits recompute the certified values of NIST Statistical Reference Datasets "
                + "(linear least squares: Norris, NoInt1, NoInt2, Pontius; https://www.itl.nist.gov/div898/strd/). "
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
