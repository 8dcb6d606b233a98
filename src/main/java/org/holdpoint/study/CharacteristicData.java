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

    /**
     * The measurement resolution in decimals: the most decimals among the raw values as read (values
     * known only as doubles count by their shortest decimal), at most 8. Values in the characteristic's
     * unit are shown with this many decimals plus two (means, differences, intervals, margins), so the same
     * data always get the same format.
     *
     * @return 0..8
     */
    public int resolutionDecimals() {
        int scale = 0;
        for (GroupData g : new GroupData[] {before, after}) {
            int m = Math.min(g.size(), 500);
            for (int i = 0; i < m; i++) {
                java.math.BigDecimal b = g.sample().hasExactDecimals() ? g.sample().decimal(i)
                        : g.sample().decimal(i).stripTrailingZeros();
                scale = Math.max(scale, b.scale());
            }
        }
        return Math.max(0, Math.min(8, scale));
    }

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
