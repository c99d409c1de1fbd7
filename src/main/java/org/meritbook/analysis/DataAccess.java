package org.meritbook.analysis;

import org.meritbook.study.DataReference;
import org.meritbook.workbook.DataBlock;

/**
 * How an analysis obtains its data: the pipeline resolves a notebook data reference to a block
 * read from the declared workbook. Analyses never see files or POI.
 */
@FunctionalInterface
public interface DataAccess {
    DataBlock block(DataReference reference);
}
