package org.holdpoint.report;

/**
 * The defined names a sign-off template must hold. Each names one cell: a single value goes into it,
 * a block (table or section) starts there and grows right and down. Documented in templates/README.md.
 */
public enum TemplateName {
    /** The change id. */
    CHANGE_ID("HP_ChangeId", false, "the change id"),
    /** The change title. */
    TITLE("HP_Title", false, "the one-line title of the change"),
    /** The kind of change. */
    KIND("HP_Kind", false, "the kind of change (tooling, machine, material, supplier, method, other)"),
    /** The part number. */
    PART_NUMBER("HP_PartNumber", false, "the part number"),
    /** The part revision. */
    REVISION("HP_Revision", false, "the part revision"),
    /** The reason of the change. */
    REASON("HP_Reason", false, "why the change is made"),
    /** Who requested it. */
    REQUESTER("HP_Requester", false, "who requested the change"),
    /** The request date. */
    REQUEST_DATE("HP_RequestDate", false, "the date the change was requested"),
    /** The study date. */
    STUDY_DATE("HP_StudyDate", false, "the date of the study"),
    /** When the workbook was written. */
    GENERATED_AT("HP_GeneratedAt", false, "date and time the workbook was written"),
    /** The shape beside the overall verdict. */
    OVERALL_MARK("HP_OverallMark", false, "the shape of the overall verdict (never colour alone)"),
    /** The overall verdict in words. */
    OVERALL_VERDICT("HP_OverallVerdict", false, "the overall verdict in words: CHANGE VERIFIED or CHANGE NOT VERIFIED"),
    /** The overall verdict's sentence. */
    OVERALL_DETAIL("HP_OverallDetail", false, "the sentence explaining the overall verdict"),
    /** The record's SHA-256 shown to people. */
    RECORD_HASH("HP_RecordHash", false, "the SHA-256 of the embedded study record"),
    /** The summary table, one row per characteristic. */
    SUMMARY_TABLE("HP_SummaryTable", true, "top-left cell of the summary table (header row, then one row per "
            + "characteristic, 16 columns)"),
    /** The detail sections. */
    DETAILS("HP_Details", true, "top-left cell of the detail sections, one printed page per characteristic "
            + "(own sheet, 8 columns)"),
    /** The method and settings. */
    METHOD("HP_Method", true, "top-left cell of the method and settings list (2 columns)"),
    /** The import report. */
    IMPORT_REPORT("HP_ImportReport", true, "top-left cell of the import report (6 columns)"),
    /** The cautions. */
    CAUTIONS("HP_Cautions", true, "top-left cell of the cautions, one paragraph per row (merged over 8 columns)"),
    /** The raw data. */
    RAW_DATA("HP_RawData", true, "top-left cell of the raw data table (own sheet; no template rows below it; "
            + "13 columns)"),
    /** The sign-off block. */
    SIGN_OFF("HP_SignOff", true, "top-left cell of the sign-off block (prepared, reviewed, approved; 6 columns)"),
    /** The hidden record. */
    RECORD("HP_Record", true, "top-left cell of the record (own sheet, hidden and protected by the writer)");

    private final String definedName;
    private final boolean block;
    private final String description;

    TemplateName(String definedName, boolean block, String description) {
        this.definedName = definedName;
        this.block = block;
        this.description = description;
    }

    /** @return the defined name as it appears in the workbook, e.g. {@code HP_ChangeId} */
    public String definedName() {
        return definedName;
    }

    /** @return whether the name marks a block that grows from its cell (else a single value) */
    public boolean block() {
        return block;
    }

    /** @return what the writer puts there */
    public String description() {
        return description;
    }
}
