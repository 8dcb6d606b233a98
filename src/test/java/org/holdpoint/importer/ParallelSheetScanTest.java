package org.holdpoint.importer;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.ByteArrayInputStream;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.apache.poi.openxml4j.opc.OPCPackage;
import org.apache.poi.openxml4j.opc.PackageAccess;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.eventusermodel.XSSFReader;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A worksheet part scanned in blocks on several threads gives what one scan of the whole part gives: the same
 * cells (rows, kinds, exact decimals, texts with the same ids), merged ranges, counts and noted cells — on sheets of
 * our own with every kind of cell, rows and cells without their numbers, repeated row numbers, a namespace prefix
 * and blocks cut every few hundred bytes; and what blocks cannot settle alone is handed back to the one-piece scan.
 */
class ParallelSheetScanTest {
    private static final String SST = "<?xml version=\"1.0\" encoding=\"UTF-8\"?><sst xmlns=\"http://schemas.openxml"
            + "formats.org/spreadsheetml/2006/main\" count=\"4\" uniqueCount=\"4\"><si><t>before</t></si><si><t>after"
            + "</t></si><si><t>12.50</t></si><si><t>gauge R&amp;R ok</t></si></sst>";
    private static final String STYLES = "<?xml version=\"1.0\" encoding=\"UTF-8\"?><styleSheet xmlns=\"http://"
            + "schemas.openxmlformats.org/spreadsheetml/2006/main\"><cellXfs count=\"2\"><xf numFmtId=\"0\"/>"
            + "<xf numFmtId=\"14\" applyNumberFormat=\"1\"/></cellXfs></styleSheet>";

    @TempDir
    Path dir;

    /** An invented gauge-study export: every cell kind the scanner knows, in seeded random order. */
    private static String sheet(long seed, int rows, String prefix, boolean someRowsUnnumbered) {
        SplittableRandom rnd = new SplittableRandom(seed);
        String p = prefix;
        StringBuilder sb = new StringBuilder("<?xml version=\"1.0\" encoding=\"UTF-8\" standalone=\"yes\"?>\n<")
                .append(p).append("worksheet xmlns").append(p.isEmpty() ? "" : ":" + p.substring(0, p.length() - 1))
                .append("=\"http://schemas.openxmlformats.org/spreadsheetml/2006/main\"><").append(p)
                .append("dimension ref=\"A1:F").append(rows + 1).append("\"/><").append(p).append("sheetData>");
        sb.append('<').append(p).append("row r=\"1\"><").append(p).append("c r=\"A1\" t=\"inlineStr\"><").append(p)
                .append("is><").append(p).append("t>phase</").append(p).append("t></").append(p).append("is></")
                .append(p).append("c><").append(p).append("c r=\"B1\" t=\"inlineStr\"><").append(p).append("is><")
                .append(p).append("t>Bore &amp; seat (mm)</").append(p).append("t></").append(p).append("is></")
                .append(p).append("c></").append(p).append("row>");
        int r = 1;
        for (int i = 0; i < rows; i++) {
            int kindOfRow = rnd.nextInt(40);
            if (kindOfRow == 0) {
                r += 2; // a gap of one empty row
            } else if (kindOfRow == 1 && r > 1) {
                // the same row number again: the later cell wins
            } else {
                r++;
            }
            boolean numbered = !(someRowsUnnumbered && rnd.nextInt(5) == 0) || kindOfRow <= 1;
            sb.append('<').append(p).append("row").append(numbered ? " r=\"" + r + "\"" : "")
                    .append(rnd.nextInt(3) == 0 ? " spans=\"1:6\" x14ac:dyDescent=\"0.25\"" : "").append('>');
            // a row without its number counts on from the row before it; its cells then go without references
            String ref = numbered ? String.valueOf(r) : null;
            cell(sb, p, "A", ref, "t=\"s\"", "<" + p + "v>" + rnd.nextInt(2) + "</" + p + "v>");
            double v = 12 + rnd.nextGaussian() * 0.01;
            switch (rnd.nextInt(12)) {
                case 0 -> cell(sb, p, "B", ref, "t=\"inlineStr\"", "<" + p + "is><" + p + "t>"
                        + String.format(Locale.GERMANY, "%.3f", v) + "</" + p + "t></" + p + "is>");
                case 1 -> cell(sb, p, "B", ref, "t=\"s\"", "<" + p + "v>" + (2 + rnd.nextInt(2)) + "</" + p + "v>");
                case 2 -> cell(sb, p, "B", ref, "t=\"e\"", "<" + p + "v>#N/A</" + p + "v>");
                case 3 -> cell(sb, p, "B", ref, "", "<" + p + "f>AVERAGE(C2:C4)</" + p + "f>");
                case 4 -> cell(sb, p, "B", ref, "t=\"str\"", "<" + p + "f>TEXT(C2)</" + p + "f><" + p
                        + "v>n/a</" + p + "v>");
                case 5 -> cell(sb, p, "B", ref, "t=\"b\"", "<" + p + "v>1</" + p + "v>");
                case 6 -> { } // blank
                default -> cell(sb, p, "B", ref, "", "<" + p + "v>" + String.format(Locale.ROOT, "%.4f", v) + "</"
                        + p + "v>");
            }
            if (rnd.nextInt(4) == 0) {
                cell(sb, p, "C", ref, "s=\"1\"", "<" + p + "v>" + (46000 + rnd.nextInt(400)) + "</" + p + "v>");
            }
            // a cell without its reference follows the one before it
            sb.append('<').append(p).append("c><").append(p).append("v>").append(rnd.nextInt(1000)).append("</")
                    .append(p).append("v></").append(p).append("c>");
            if (rnd.nextInt(50) == 0) {
                sb.append('<').append(p).append("c r=\"F").append(ref == null ? "" : ref).append("\" t=\"inlineStr\"><")
                        .append(p).append("is><").append(p).append("t>operator ").append(rnd.nextInt(7))
                        .append(" &#x2013; shift B</").append(p).append("t></").append(p).append("is></")
                        .append(p).append("c>");
            }
            sb.append("</").append(p).append("row>");
        }
        sb.append("</").append(p).append("sheetData><").append(p).append("mergeCells count=\"2\"><").append(p)
                .append("mergeCell ref=\"A1:B1\"/><").append(p).append("mergeCell ref=\"D3:E4\"/></").append(p)
                .append("mergeCells><").append(p).append("pageMargins left=\"0.7\" right=\"0.7\"/></").append(p)
                .append("worksheet>");
        return sb.toString();
    }

    private static void cell(StringBuilder sb, String p, String col, String row, String attrs, String inner) {
        sb.append('<').append(p).append('c');
        if (row != null) {
            sb.append(" r=\"").append(col).append(row).append('"');
        }
        if (!attrs.isEmpty()) {
            sb.append(' ').append(attrs);
        }
        sb.append('>').append(inner).append("</").append(p).append("c>");
    }

    private static SharedStrings strings() throws Exception {
        return SharedStrings.read(new ByteArrayInputStream(SST.getBytes(StandardCharsets.UTF_8)));
    }

    private static CellStyles styles() throws Exception {
        return CellStyles.read(new ByteArrayInputStream(STYLES.getBytes(StandardCharsets.UTF_8)));
    }

    private static SheetData oneScan(byte[] xml, SharedStrings sst, CellStyles st) throws Exception {
        SheetData d = SheetData.forWorkbook("gauge.xlsx", "Data", SheetData.PER_COLUMN);
        new SheetXmlScanner(new ByteArrayInputStream(xml), new SheetCells(d, sst, st, false)).run();
        d.finish();
        return d;
    }

    private static SheetData blocks(byte[] xml, SharedStrings sst, CellStyles st, int workers, int block)
            throws Exception {
        SheetData d = SheetData.forWorkbook("gauge.xlsx", "Data", SheetData.PER_COLUMN);
        ParallelSheetScan.scan(new ByteArrayInputStream(xml), d,
                () -> SheetData.forWorkbook("gauge.xlsx", "Data", SheetData.PER_COLUMN),
                s -> new SheetCells(s, sst, st, false), workers, block);
        d.finish();
        return d;
    }

    /** Everything a sheet holds, written out: counts, texts by id, every cell, merged ranges and noted cells. */
    static String dump(SheetData d) {
        StringBuilder sb = new StringBuilder();
        sb.append("cells ").append(d.cellCount()).append(" lastRow ").append(d.lastRow()).append(" columns ")
                .append(d.columnCount()).append(" fromText ").append(d.numbersFromText()).append('\n');
        for (int t = 0; t < d.textCount(); t++) {
            sb.append("text ").append(t).append(' ').append(d.text(t)).append('\n');
        }
        for (int c = 0; c < d.columnCount(); c++) {
            SheetColumn col = d.column(c);
            sb.append("column ").append(c).append(col == null ? " none" : " size " + col.size()).append('\n');
            for (int i = 0; col != null && i < col.size(); i++) {
                sb.append(col.row(i)).append(' ').append(col.kind(i)).append(' ').append(col.scale(i)).append(' ')
                        .append(col.payload(i)).append('\n');
            }
            sb.append("separators ").append(d.separatorCells(c)).append('\n');
        }
        for (int[] m : d.merged()) {
            sb.append("merged ").append(Arrays.toString(m)).append('\n');
        }
        sb.append("other-separator columns ").append(d.otherSeparatorColumns()).append('\n');
        return sb.toString();
    }

    @Test
    void blocksCutEveryFewHundredBytesGiveWhatOneScanGives() throws Exception {
        SharedStrings sst = strings();
        CellStyles st = styles();
        int sheets = 0;
        for (String prefix : List.of("", "x:")) {
            for (boolean unnumbered : new boolean[] {false, true}) {
                byte[] xml = sheet(20261204L + sheets, 600, prefix, unnumbered).getBytes(StandardCharsets.UTF_8);
                String expected = dump(oneScan(xml, sst, st));
                assertThat(expected).contains("DATE", "ERROR", "BOOLEAN", "FORMULA_NO_VALUE", "merged [3, 4, 3, 4]");
                for (int block : new int[] {300, 1024, 7777}) {
                    for (int workers : new int[] {2, 3}) {
                        assertThat(dump(blocks(xml, sst, st, workers, block)))
                                .as("prefix '%s', unnumbered rows %s, block %d, %d threads", prefix, unnumbered, block,
                                        workers)
                                .isEqualTo(expected);
                    }
                }
                sheets++;
            }
        }
    }

    @Test
    void aPartSmallerThanOneBlockIsScannedInOnePieceWithItsOwnMessages() throws Exception {
        byte[] xml = sheet(7, 20, "", false).getBytes(StandardCharsets.UTF_8);
        assertThat(dump(blocks(xml, strings(), styles(), 2, 1 << 20))).isEqualTo(dump(oneScan(xml, strings(),
                styles())));
        byte[] cdata = sheet(7, 20, "", false).replace("<v>1</v>", "<v><![CDATA[1]]></v>")
                .getBytes(StandardCharsets.UTF_8);
        assertThatThrownBy(() -> blocks(cdata, strings(), styles(), 2, 1 << 20))
                .isInstanceOf(SheetXmlScanner.Unsupported.class);
    }

    @Test
    void whatBlocksCannotSettleAloneGoesBackToTheOnePieceScan() throws Exception {
        String good = sheet(11, 300, "", false);
        // a comment among the rows (a cut may fall inside it)
        byte[] comment = good.replace("<row r=\"200\"", "<!-- <row r=\"7\"> checked by QA --><row r=\"200\"")
                .getBytes(StandardCharsets.UTF_8);
        assertThat(new String(comment, StandardCharsets.UTF_8)).contains("<!--");
        assertThatThrownBy(() -> blocks(comment, strings(), styles(), 2, 512))
                .isInstanceOf(ParallelSheetScan.Again.class).hasMessageContaining("comment");
        // no row carries its number: no place to cut
        byte[] unnumbered = good.replaceAll("<row r=\"\\d+\"", "<row").replaceAll(" r=\"[A-F]\\d+\"", "")
                .getBytes(StandardCharsets.UTF_8);
        assertThatThrownBy(() -> blocks(unnumbered, strings(), styles(), 2, 512))
                .isInstanceOf(ParallelSheetScan.Again.class).hasMessageContaining("no numbered row");
        // cut off in the middle: the one-piece scan gives the message
        byte[] truncated = Arrays.copyOf(good.getBytes(StandardCharsets.UTF_8), good.length() * 2 / 3);
        assertThatThrownBy(() -> blocks(truncated, strings(), styles(), 2, 512))
                .isInstanceOf(ParallelSheetScan.Again.class);
        assertThatThrownBy(() -> oneScan(truncated, strings(), styles())).isInstanceOf(java.io.IOException.class)
                .hasMessageContaining("truncated");
        // CDATA somewhere in the middle
        int v = good.indexOf("<v>", good.indexOf("<row r=\"150\""));
        byte[] cdata = (good.substring(0, v + 3) + "<![CDATA[1]]>" + good.substring(good.indexOf("</v>", v)))
                .getBytes(StandardCharsets.UTF_8);
        assertThatThrownBy(() -> blocks(cdata, strings(), styles(), 2, 512))
                .isInstanceOf(ParallelSheetScan.Again.class);
    }

    @Test
    void theCutFallsOnlyBeforeARowThatCarriesItsNumber() {
        byte[] b = ("<row r=\"4\"><c r=\"A4\"><v>1</v></c></row><row spans=\"1:2\"><c><v>2</v></c></row>"
                + "<x:row spans=\"1:2\" r='6'><c><v>3</v></c></x:row><row r=\"7\"").getBytes(StandardCharsets.UTF_8);
        String s = new String(b, StandardCharsets.UTF_8);
        // the last tag is cut off before its end: not a place to cut; the prefixed row with r='6' is
        assertThat(ParallelSheetScan.lastNumberedRow(b, b.length)).isEqualTo(s.indexOf("<x:row"));
        // before it only the first row carries a number, and a cut at the very start is no cut
        assertThat(ParallelSheetScan.lastNumberedRow(b, s.indexOf("<x:row"))).isEqualTo(-1);
        byte[] rowspan = "<a><rows r=\"1\"/><row r=\"\"/>".getBytes(StandardCharsets.UTF_8);
        assertThat(ParallelSheetScan.lastNumberedRow(rowspan, rowspan.length)).isEqualTo(-1);
    }

    @Test
    void aWorkbookOfSeveralBlocksReadsAsOneScanReadsIt() throws Exception {
        // an invented two-phase export of 70,000 rows (about 6 MB of sheet XML: two blocks of the real size)
        Path f = dir.resolve("press-fit.xlsx");
        SplittableRandom rnd = new SplittableRandom(20261204);
        try (SXSSFWorkbook wb = new SXSSFWorkbook(); OutputStream out = Files.newOutputStream(f)) {
            Sheet s = wb.createSheet("Measurements");
            Row h = s.createRow(0);
            h.createCell(0).setCellValue("phase");
            h.createCell(1).setCellValue("Press-fit force (kN)");
            h.createCell(2).setCellValue("note");
            for (int i = 1; i <= 70_000; i++) {
                Row row = s.createRow(i);
                row.createCell(0).setCellValue(i <= 35_000 ? "before" : "after");
                row.createCell(1).setCellValue(Math.round((4.2 + 0.05 * rnd.nextGaussian()) * 1e4) / 1e4);
                if (i % 997 == 0) {
                    row.createCell(2).setCellValue("re-seated " + (i % 5));
                }
            }
            wb.write(out);
        }
        SheetData one;
        try (OPCPackage pkg = OPCPackage.open(f.toFile(), PackageAccess.READ)) {
            XSSFReader reader = new XSSFReader(pkg);
            SharedStrings sst = SharedStrings.read(pkg);
            CellStyles st;
            try (InputStream in = reader.getStylesData()) {
                st = CellStyles.read(in);
            }
            try (InputStream in = reader.getSheetsData().next()) {
                byte[] xml = in.readAllBytes();
                assertThat(xml.length).isGreaterThan(ParallelSheetScan.BLOCK + ParallelSheetScan.BLOCK / 4);
                one = oneScan(xml, sst, st);
            }
        }
        List<String> messages = new ArrayList<>();
        SheetData read = XlsxReader.read(f, "press-fit.xlsx", null, null, messages);
        assertThat(ParallelSheetScan.workers()).as("this check needs two cores").isGreaterThan(1);
        assertThat(dump(read)).isEqualTo(dump(one));
        assertThat(read.cellCount()).isEqualTo(3 + 70_000 * 2 + 70);
    }
}
