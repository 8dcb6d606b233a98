package org.holdpoint.study;

import java.util.List;

/**
 * Everything an import produced: the characteristics' data, the inputs read, and the import report.
 *
 * @param characteristics the data per characteristic, in file order
 * @param inputs          the files read (one, or a before and an after file)
 * @param report          what was kept and skipped
 */
public record Dataset(List<CharacteristicData> characteristics, List<InputInfo> inputs, ImportReport report) {

    /** Copies the lists. */
    public Dataset {
        characteristics = List.copyOf(characteristics);
        inputs = List.copyOf(inputs);
    }
}
