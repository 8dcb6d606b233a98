package org.holdpoint.study;

import java.util.List;

/**
 * The measured data of one characteristic: a before and an after group. In a paired design both
 * groups hold the same units in the same order (matched by unit id by the importer), and
 * {@code unmatchedUnits} lists the units present in only one group, which are left out.
 *
 * @param name           the characteristic's name
 * @param unit           its unit of measure, or null when the data do not say
 * @param before         the before group
 * @param after          the after group
 * @param paired         whether before and after are matched unit by unit
 * @param unmatchedUnits unit ids found in only one group (paired layouts), never null
 */
public record CharacteristicData(String name, String unit, GroupData before, GroupData after, boolean paired,
        List<String> unmatchedUnits) {

    /** Validates the record. */
    public CharacteristicData {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a characteristic needs a name");
        }
        if (paired && before.size() != after.size()) {
            throw new IllegalArgumentException("paired groups must have equal sizes");
        }
        unmatchedUnits = unmatchedUnits == null ? List.of() : List.copyOf(unmatchedUnits);
    }
}
