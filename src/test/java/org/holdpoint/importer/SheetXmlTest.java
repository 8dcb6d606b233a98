package org.holdpoint.importer;

import static org.assertj.core.api.Assertions.assertThat;
import static org.holdpoint.importer.TestData.only;
import static org.holdpoint.importer.TestData.read;
import static org.holdpoint.importer.TestData.values;

import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import org.holdpoint.study.CharacteristicData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The sheet-XML paths: inline strings, entities, namespace prefixes, and the SAX fallback. */
class SheetXmlTest {
    @TempDir
    Path dir;

    @Test
    void inlineStringsAndEntitiesFromTheStreamingWriter() throws Exception {
        Path f = dir.resolve("inline.xlsx");
        try (SXSSFWorkbook wb = new SXSSFWorkbook(); OutputStream out = Files.newOutputStream(f)) {
            Sheet s = wb.createSheet("Data");
            String[][] rows = {{"phase", "bore & hole <1> (mm)"}, {"before", "1.25"}, {"before", null},
                {"after", "1.5"}, {"after", null}};
            double[] v = {0, 0, 1.75, 0, 2.0};
            for (int r = 0; r < rows.length; r++) {
                Row row = s.createRow(r);
                row.createCell(0).setCellValue(rows[r][0]);
                if (rows[r][1] != null) {
                    row.createCell(1).setCellValue(rows[r][1]);
                } else {
                    row.createCell(1).setCellValue(v[r]);
                }
            }
            wb.write(out);
        }
        CharacteristicData c = only(read(f));
        assertThat(c.name()).isEqualTo("bore & hole <1>");
        assertThat(c.unit()).isEqualTo("mm");
        assertThat(values(c.before())).containsExactly(1.25, 1.75);
        assertThat(values(c.after())).containsExactly(1.5, 2.0);
    }

    @Test
    void prefixedElementsAndCdataFallBackCorrectly() {
        byte[] valid = BadFiles.bytes(Workbooks.xlsx(dir.resolve("v.xlsx"), Workbooks.row("before", "after"),
                Workbooks.row(1.0, 2.0), Workbooks.row(1.5, 2.5)));
        Map<String, byte[]> parts = BadFiles.unzip(valid);
        String sheet = new String(parts.get("xl/worksheets/sheet1.xml"), StandardCharsets.UTF_8);

        // the same sheet with a namespace prefix on every element: read by the byte scanner
        String prefixed = sheet.replace("<worksheet xmlns=", "<x:worksheet xmlns:x=").replace("</worksheet>",
                "</x:worksheet>").replaceAll("<(/?)(sheetData|row|c|v)([ >])", "<$1x:$2$3");
        parts.put("xl/worksheets/sheet1.xml", prefixed.getBytes(StandardCharsets.UTF_8));
        Path p = TestData.write(dir, "prefixed.xlsx", BadFiles.zip(parts));
        assertThat(values(only(read(p)).after())).containsExactly(2.0, 2.5);

        // a value in CDATA: the scanner hands over to SAX, with the same result
        String cdata = sheet.replaceFirst("<v>2\\.5</v>", "<v><![CDATA[2.75]]></v>");
        assertThat(cdata).contains("CDATA");
        parts.put("xl/worksheets/sheet1.xml", cdata.getBytes(StandardCharsets.UTF_8));
        Path q = TestData.write(dir, "cdata.xlsx", BadFiles.zip(parts));
        assertThat(values(only(read(q)).after())).containsExactly(2.0, 2.75);
    }
}
