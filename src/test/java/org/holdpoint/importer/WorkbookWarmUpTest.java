package org.holdpoint.importer;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** The bundled workbook read ahead of the command line is present and readable; which arguments start it. */
class WorkbookWarmUpTest {
    @Test
    void theBundledWorkbookIsReadAsAnImportReadsOne() {
        // phase/value header and one row: four cells
        assertThat(WorkbookWarmUp.run()).isEqualTo(4);
    }

    @Test
    void startedOnlyForArgumentsNamingAWorkbook() {
        assertThat(WorkbookWarmUp.namesWorkbook(new String[] {"analyze", "cmm export.XLSX", "-q"})).isTrue();
        assertThat(WorkbookWarmUp.namesWorkbook(new String[] {"analyze", "--before=a.xlsm", "--after=b.csv"}))
                .isTrue();
        assertThat(WorkbookWarmUp.namesWorkbook(new String[] {"analyze", "data.csv", "--report", "out.xls"}))
                .isFalse();
    }
}
