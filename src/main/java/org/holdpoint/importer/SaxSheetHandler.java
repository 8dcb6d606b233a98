package org.holdpoint.importer;

import org.xml.sax.Attributes;
import org.xml.sax.helpers.DefaultHandler;

/** The SAX handler of a worksheet part, for XML the byte scanner does not take. */
final class SaxSheetHandler extends DefaultHandler {
    private final SheetCells cells;
    private final StringBuilder value = new StringBuilder();
    private final StringBuilder formula = new StringBuilder();
    private final StringBuilder inline = new StringBuilder();
    private StringBuilder capture;
    private boolean inCell;
    private boolean hasValue;
    private boolean hasFormula;
    private boolean hasInline;

    SaxSheetHandler(SheetCells cells) {
        this.cells = cells;
    }

    @Override
    public void startElement(String uri, String localName, String qName, Attributes atts) {
        switch (localName) {
            case "row" -> cells.startRow(atts.getValue("r") == null ? -1
                    : SheetCells.parsePositive(atts.getValue("r"), -1));
            case "c" -> {
                inCell = true;
                hasValue = false;
                hasFormula = false;
                hasInline = false;
                inline.setLength(0);
                String r = atts.getValue("r");
                String s = atts.getValue("s");
                cells.startCell(r == null ? -1 : SheetCells.columnOf(r), SheetCells.typeOf(atts.getValue("t")),
                        s == null ? 0 : SheetCells.parsePositive(s, 0));
            }
            case "v" -> start(value, true, false);
            case "f" -> start(formula, false, true);
            case "t" -> {
                if (inCell) {
                    hasInline = true;
                    capture = inline;
                }
            }
            case "mergeCell" -> cells.merge(atts.getValue("ref"));
            default -> {
            }
        }
    }

    private void start(StringBuilder sb, boolean v, boolean f) {
        if (inCell) {
            sb.setLength(0);
            capture = sb;
            hasValue |= v;
            hasFormula |= f;
        }
    }

    @Override
    public void characters(char[] ch, int start, int length) {
        if (capture != null) {
            capture.append(ch, start, length);
        }
    }

    @Override
    public void endElement(String uri, String localName, String qName) {
        switch (localName) {
            case "v", "f", "t" -> capture = null;
            case "c" -> {
                if (inCell) {
                    cells.endCell(hasValue ? value : null, hasFormula ? formula : null, hasInline ? inline : null);
                }
                inCell = false;
            }
            default -> {
            }
        }
    }
}
