package org.holdpoint.importer;

import static org.assertj.core.api.Assertions.assertThat;
import static org.holdpoint.importer.TestData.only;
import static org.holdpoint.importer.TestData.read;
import static org.holdpoint.importer.TestData.values;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.poi.xssf.eventusermodel.ReadOnlySharedStringsTable;
import org.holdpoint.study.CharacteristicData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The shared-strings reader gives, item for item, the text of the spreadsheet library's own read-only table (Apache
 * POI {@code ReadOnlySharedStringsTable.getItemAt(i).getString()}, phonetic runs excluded), which is the reference
 * here; and a part without the optional {@code count} attribute (ECMA-376 Part 1 §18.4.9: count and uniqueCount
 * are optional) still gives its strings.
 */
class SharedStringsTest {
    private static final String NS = "http://schemas.openxmlformats.org/spreadsheetml/2006/main";

    @TempDir
    Path dir;

    /** Items covering runs, phonetic runs, escapes, entities, spaces, empty items and a prefixed namespace. */
    private static String part(String prefix, boolean withCount) {
        String p = prefix.isEmpty() ? "" : prefix + ":";
        String[] items = {
            "<t>Bore diameter</t>",
            "<t xml:space=\"preserve\">  before  </t>",
            "<r><rPr><b/></rPr><t>Flat</t></r><r><t xml:space=\"preserve\">ness </t></r><r><t>(mm)</t></r>",
            "<t>\u6e2c\u5b9a</t><rPh sb=\"0\" eb=\"2\"><t>\u305d\u304f\u3066\u3044</t></rPh>",
            "<t>line_x000D__x000A_break</t>",
            "<t>_x005F_x0041_ kept</t>",
            "<t>_x00e9_t\u00e9 _x00E9_ _xZZZZ_ _x12_ _x1234 end_</t>",
            "<t>a &amp; b &lt;1&gt; &quot;q&quot;</t>",
            "<t/>",
            "",
            "<t>\ud835\udc65 surrogate pair, and _xD835__xDC65_ escaped</t>",
            "<t>__x0041__</t>",
            "<t>1.250</t>",
        };
        StringBuilder sb = new StringBuilder("<?xml version=\"1.0\" encoding=\"UTF-8\" standalone=\"yes\"?>\n");
        sb.append('<').append(p).append("sst xmlns").append(prefix.isEmpty() ? "" : ":" + prefix).append("=\"")
                .append(NS).append('"');
        if (withCount) {
            sb.append(" count=\"40\"");
        }
        sb.append(" uniqueCount=\"").append(items.length).append("\">");
        for (String item : items) {
            String inner = prefix.isEmpty() ? item : item.replaceAll("<(/?)(t|r|rPr|b|rPh)([ />])", "<$1" + p + "$2$3");
            sb.append('<').append(p).append("si>").append(inner).append("</").append(p).append("si>");
        }
        sb.append("</").append(p).append("sst>");
        return sb.toString();
    }

    private static List<String> reference(String xml) throws Exception {
        ReadOnlySharedStringsTable t = new ReadOnlySharedStringsTable(
                new ByteArrayInputStream(xml.getBytes(StandardCharsets.UTF_8)), false);
        List<String> out = new ArrayList<>();
        for (int i = 0; i < t.getUniqueCount(); i++) {
            out.add(t.getItemAt(i).getString());
        }
        return out;
    }

    private static List<String> ours(String xml) throws Exception {
        SharedStrings s = SharedStrings.read(new ByteArrayInputStream(xml.getBytes(StandardCharsets.UTF_8)));
        List<String> out = new ArrayList<>();
        for (int i = 0; i < s.size(); i++) {
            out.add(s.text(i));
        }
        return out;
    }

    @Test
    void sameTextsAsTheLibrarysTable() throws Exception {
        for (String prefix : new String[] {"", "x"}) {
            String xml = part(prefix, true);
            List<String> ref = reference(xml);
            assertThat(ref).hasSize(13);
            assertThat(ours(xml)).as("prefix '%s'", prefix).containsExactlyElementsOf(ref);
        }
        // a few items spelled out, so that a change in the library would show here too (ECMA-376 Part 1
        // §22.9.2.19: _xHHHH_ is the character HHHH; an escaped underscore is not read again)
        List<String> ours = ours(part("", true));
        assertThat(ours.get(2)).isEqualTo("Flatness (mm)");
        assertThat(ours.get(3)).isEqualTo("\u6e2c\u5b9a");
        assertThat(ours.get(4)).isEqualTo("line\r\nbreak");
        assertThat(ours.get(5)).isEqualTo("_x0041_ kept");
        assertThat(ours.get(6)).isEqualTo("\u00e9t\u00e9 \u00e9 _xZZZZ_ _x12_ _x1234 end_");
        assertThat(ours.get(10)).isEqualTo("\ud835\udc65 surrogate pair, and \ud835\udc65 escaped");
        assertThat(ours.get(11)).isEqualTo("_A_");
    }

    @Test
    void anEmptyPartHoldsNoStrings() throws Exception {
        assertThat(SharedStrings.read(new ByteArrayInputStream(new byte[0])).size()).isZero();
    }

    @Test
    void aPartWithoutItsCountAttributeStillGivesItsStrings() throws Exception {
        String xml = part("", false);
        assertThat(ours(xml)).containsExactlyElementsOf(reference(xml));

        // a whole workbook whose shared-strings part names only uniqueCount, as some writers save it
        Path valid = Workbooks.xlsx(dir.resolve("v.xlsx"), Workbooks.row("phase", "Bore diameter (mm)"),
                Workbooks.row("before", 12.011), Workbooks.row("before", 12.014), Workbooks.row("after", 12.009),
                Workbooks.row("after", 12.016));
        Map<String, byte[]> parts = BadFiles.unzip(BadFiles.bytes(valid));
        String sst = new String(parts.get("xl/sharedStrings.xml"), StandardCharsets.UTF_8);
        String noCount = sst.replaceFirst(" count=\"\\d+\"", "");
        assertThat(noCount).isNotEqualTo(sst).doesNotContain(" count=");
        parts.put("xl/sharedStrings.xml", noCount.getBytes(StandardCharsets.UTF_8));
        Path p = TestData.write(dir, "no-count.xlsx", BadFiles.zip(parts));
        CharacteristicData c = only(read(p));
        assertThat(c.name()).isEqualTo("Bore diameter");
        assertThat(values(c.before())).containsExactly(12.011, 12.014);
        assertThat(values(c.after())).containsExactly(12.009, 12.016);
    }
}
