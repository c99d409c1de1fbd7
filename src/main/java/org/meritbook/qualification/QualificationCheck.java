package org.meritbook.qualification;

/**
 * One computed figure compared with its certified value.
 *
 * @param dataset   the NIST data set, e.g. "Norris"
 * @param model     the model fitted, e.g. "y = B0 + B1·x"
 * @param figure    the figure, e.g. "B1" or "residual SD"
 * @param certified NIST's certified value
 * @param computed  meritbook's value
 * @param digits    agreeing significant digits, LRE = −log10(|computed − certified| / |certified|), capped at 15
 * @param required  the digits required to pass
 */
public record QualificationCheck(String dataset, String model, String figure, double certified, double computed,
                                 double digits, double required) {
    public boolean passed() {
        return digits >= required;
    }

    /** Log relative error, the usual measure of agreement with certified values (McCullough 1998). */
    static double lre(double computed, double certified) {
        if (computed == certified) {
            return 15;
        }
        double relative = certified == 0 ? Math.abs(computed) : Math.abs(computed - certified) / Math.abs(certified);
        return Math.min(15, -Math.log10(relative));
    }
}
