package org.holdpoint.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;

/** The default template, its names, and the record's chunking. */
class TemplateTest {

    @Test
    void generatorIsReproducibleAndMatchesTheCommittedTemplate() throws IOException {
        byte[] first = TemplateGenerator.build();
        assertThat(TemplateGenerator.build()).isEqualTo(first);
        // the committed file must be regenerated whenever the generator changes (templates/README.md)
        assertThat(Files.readAllBytes(Path.of("templates", "holdpoint-default.xlsx"))).isEqualTo(first);
    }

    @Test
    void defaultTemplateHoldsEveryName() {
        Template t = Template.defaultTemplate();
        for (TemplateName n : TemplateName.values()) {
            assertThat(t.anchor(n)).as(n.definedName()).isNotNull();
        }
        assertThat(t.anchor(TemplateName.SUMMARY_TABLE)).isEqualTo(new Anchor("Summary", 13, 0));
    }

    @Test
    void missingNamesAreListed() throws IOException {
        byte[] bytes = without(TemplateGenerator.build(), "HP_RawData", "HP_ChangeId");
        assertThatThrownBy(() -> Template.of(bytes, "plant.xlsx")).isInstanceOf(ReportException.class)
                .hasMessageContaining("plant.xlsx").hasMessageContaining("HP_ChangeId, HP_RawData");
    }

    @Test
    void rowsBelowTheRawDataAreRefused() throws IOException {
        byte[] bytes;
        try (XSSFWorkbook wb = new XSSFWorkbook(new ByteArrayInputStream(TemplateGenerator.build()))) {
            wb.getSheet("Raw data").createRow(5).createCell(0).setCellValue("footer note");
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            wb.write(out);
            bytes = out.toByteArray();
        }
        assertThatThrownBy(() -> Template.of(bytes, "plant.xlsx")).hasMessageContaining("Raw data")
                .hasMessageContaining("leave everything below it empty");
    }

    @Test
    void notAWorkbook() {
        assertThatThrownBy(() -> Template.of("text".getBytes(java.nio.charset.StandardCharsets.UTF_8), "t.xlsx"))
                .isInstanceOf(ReportException.class).hasMessageContaining("t.xlsx");
    }

    @Test
    void chunksRespectTheCellLimitAndSurrogatePairs() {
        // a cell holds at most 32,767 characters (the spreadsheet format's limit); a surrogate pair at the
        // boundary must stay in one chunk
        String text = "a".repeat(RecordSheet.CHUNK - 1) + "\uD83D\uDE00" + "b".repeat(70_000);
        List<String> chunks = RecordSheet.chunks(text);
        assertThat(String.join("", chunks)).isEqualTo(text);
        assertThat(chunks).allSatisfy(c -> assertThat(c.length()).isLessThanOrEqualTo(32_767));
        assertThat(chunks.get(0)).hasSize(RecordSheet.CHUNK - 1);
        assertThat(chunks.get(1)).startsWith("\uD83D\uDE00");
    }

    @Test
    void formulaLikeTextIsRecognised() {
        for (String s : new String[] {"=1+1", "+A1", "-2+3", "@SUM(A1)", "\tx"}) {
            assertThat(Styles.needsQuotePrefix(s)).as(s).isTrue();
        }
        assertThat(Styles.needsQuotePrefix("Bore diameter")).isFalse();
    }

    private static byte[] without(byte[] template, String... names) throws IOException {
        try (XSSFWorkbook wb = new XSSFWorkbook(new ByteArrayInputStream(template))) {
            for (String n : names) {
                wb.removeName(wb.getName(n));
            }
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            wb.write(out);
            return out.toByteArray();
        }
    }
}
