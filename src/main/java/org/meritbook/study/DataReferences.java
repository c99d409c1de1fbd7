package org.meritbook.study;

import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;

/**
 * Data references for analyses: turns a {@code data:} option value into a {@link DataReference}.
 * {@link StudyParser} has already checked every reference of a parsed notebook (syntax and declared
 * source), so for such cells this does not fail; cells built by hand get the same checks.
 */
public final class DataReferences {
    private DataReferences() {
    }

    /**
     * @throws InputException BAD_DATA_REFERENCE when the value is not a single reference text
     */
    public static DataReference parse(OptionValue value) {
        String where = "notebook line " + value.line();
        if (!value.isScalar()) {
            throw new InputException(ErrorKey.BAD_DATA_REFERENCE, where, DataReferenceParser.ACCEPTED,
                    Problems.describe(value), "Write the reference on one line after 'data:'.");
        }
        DataReferenceParser.Parsed parsed = DataReferenceParser.parse(value.text(), value.line());
        if (!parsed.ok()) {
            throw new InputException(ErrorKey.BAD_DATA_REFERENCE, where, DataReferenceParser.ACCEPTED,
                    parsed.found(), parsed.fix());
        }
        return parsed.reference();
    }
}
