package org.holdpoint.importer;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Trace columns recognised by name (docs/import.md, "Trace columns"), in English and German, and the
 * measured characteristics whose names contain such words but are not trace columns.
 */
class TraceColumnsTest {

    @ParameterizedTest
    @CsvSource({"serial,UNIT_ID", "Serial No.,UNIT_ID", "s/n,UNIT_ID", "Part serial,UNIT_ID", "Seriennummer,UNIT_ID",
        "unit,UNIT_ID", "Serial_Number,UNIT_ID", "lot,LOT", "Batch,LOT", "Heat lot,LOT", "Resin lot,LOT", "Charge,LOT",
        "Los,LOT", "Lot no.,LOT", "Chargennummer,LOT", "date,DATE", "time,DATE", "Timestamp,DATE", "Meas. date,DATE",
        "Datum,DATE", "Zeitstempel,DATE", "Messdatum,DATE", "sequence,SEQUENCE", "Run order,SEQUENCE",
        "cavity,GROUPING", "Kavität,GROUPING", "Nest,GROUPING", "Cavity no,GROUPING", "Spindle,GROUPING",
        "Fixture,GROUPING", "Machine,GROUPING", "Operator,GROUPING", "Shift,GROUPING", "Schicht,GROUPING",
        "subgroup,SUBGROUP"})
    void traceColumnsAreRecognised(String header, ColumnNames.Trace expected) {
        assertThat(ColumnNames.trace(ColumnNames.parse(header).key())).as(header).isEqualTo(expected);
    }

    @ParameterizedTest
    @ValueSource(strings = {"Spindle runout", "Cure time", "Slot width", "Pilot diameter", "Charge voltage",
        "Bore diameter", "Wall thickness", "Flatness", "Nest depth", "Machine torque", "Shift force", "Gate vestige",
        "Surface roughness Ra", "Lot width"})
    void measuredCharacteristicsAreNotTraceColumns(String header) {
        assertThat(ColumnNames.trace(ColumnNames.parse(header).key())).as(header).isNull();
    }

    @ParameterizedTest
    @ValueSource(strings = {"mm", "µm", "g", "°C", "N·m", "Nm", "%", "(mm)", "[µm]", "HRC", "HV10", "mm/s", "l/min",
        "MPa", "N", "kN", "-", "mm²"})
    void unitsOfMeasureAreRecognised(String text) {
        assertThat(HeaderDetector.isUnit(text)).as(text).isTrue();
    }

    @ParameterizedTest
    @ValueSource(strings = {"before", "after", "n/a", "OOT", "Bore", "vorher", "ok", "Width", "Dimensions", "3.2"})
    void otherTextsAreNotUnits(String text) {
        assertThat(HeaderDetector.isUnit(text)).as(text).isFalse();
    }
}
