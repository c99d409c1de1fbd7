package org.meritbook.workbook;

/** Why a formula could not be evaluated, in words for the "found" part of a located error. */
final class FormulaFailure extends Exception {
    private static final long serialVersionUID = 1L;

    FormulaFailure(String reason) {
        super(reason);
    }
}
