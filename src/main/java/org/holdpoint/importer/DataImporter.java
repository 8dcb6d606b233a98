package org.holdpoint.importer;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.holdpoint.stats.Background;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.GroupData;
import org.holdpoint.study.InputInfo;
import org.holdpoint.study.Layout;
import org.holdpoint.study.Origin;
import org.holdpoint.study.SkipReason;

/**
 * Imports a change study's before/after data from a workbook (.xlsx streamed, .xls) or delimited
 * text (.csv, .tsv, .txt), one file holding both groups or a before file and an after file. The kind
 * of file is told from its first bytes (zip → workbook, OLE2 → binary workbook, else text), never only
 * from its name. Every value kept carries its origin; every cell of a value column that is not used is
 * counted and listed with its reason in the {@link org.holdpoint.study.ImportReport}; the layout used
 * is stated there. Input files are only read, never written.
 */
public final class DataImporter {
    /** Told the number of cells each time a file's cells have been read, before its layout is worked out. */
    private final java.util.function.LongConsumer whenCellsRead;

    /** Creates an importer; it holds no state between reads. */
    public DataImporter() {
        this(cells -> { });
    }

    /**
     * Creates an importer that tells {@code whenCellsRead} the number of cells each time a file's cells have been
     * read, before its layout is worked out (one core is then often idle: the caller may start work of its own).
     *
     * @param whenCellsRead quick to return (longer work goes on a thread of its own)
     */
    public DataImporter(java.util.function.LongConsumer whenCellsRead) {
        this.whenCellsRead = whenCellsRead;
    }

    /**
     * Reads the request's file or files.
     *
     * @param request what to read and how
     * @return the characteristics' data, the inputs (with SHA-256) and the import report
     * @throws ImportException for any input that cannot be read as a change study; the message names the
     *                         file, sheet and cell or row and column, and says what to do
     */
    public Dataset read(ImportRequest request) {
        if (request == null) {
            throw new ImportException("no input given: name a data file, or a before file and an after file");
        }
        try {
            return doRead(request);
        } catch (ImportException e) {
            throw e;
        } catch (RuntimeException | StackOverflowError e) {
            throw new ImportException(e, "%s could not be read: %s. The file may be damaged; open it in its program, "
                    + "save a fresh copy and try again", describe(request), e.getMessage());
        }
    }

    /**
     * Reads the baseline that exists before a trial (for planning): one file, any layout; without a group
     * column every row is a before value, with one the rows labelled before are. The after groups are empty
     * (or hold the rows labelled after, if the file has some).
     *
     * @param request the one data file and the import options
     * @return the data, before groups filled
     * @throws ImportException as {@link #read}, or when two files are given
     */
    public Dataset readBaseline(ImportRequest request) {
        if (request == null || request.file() == null) {
            throw new ImportException("planning from data reads one file of baseline (before) values; name it");
        }
        try {
            SkipLog log = new SkipLog();
            Map<String, LayoutReader.Accum> accums = new LinkedHashMap<>();
            Choosing choosing = new Choosing(request.choice());
            Source s = readSource(request.file(), request.sheet(), request, Plan.Role.BASELINE, log, accums, choosing);
            choosing.chooseStacked(accums, log);
            choosing.check();
            if (s.plan.groupCol() < 0) {
                log.message("file " + s.name + ": no group column, so every row is a baseline (before) value");
            }
            List<InputInfo> inputs = List.of(new InputInfo(s.name, s.sha256, s.sheet, s.plan.layout(), "baseline"));
            return finish(request, List.of(s), accums, inputs, log, false, true);
        } catch (ImportException e) {
            throw e;
        } catch (RuntimeException | StackOverflowError e) {
            throw new ImportException(e, "%s could not be read: %s. The file may be damaged; open it in its program, "
                    + "save a fresh copy and try again", describe(request), e.getMessage());
        }
    }

    private static String describe(ImportRequest r) {
        return r.file() != null ? "file " + r.file() : "files " + r.beforeFile() + " and " + r.afterFile();
    }

    private Dataset doRead(ImportRequest r) {
        boolean one = r.file() != null;
        boolean two = r.beforeFile() != null || r.afterFile() != null;
        if (one == two || two && (r.beforeFile() == null || r.afterFile() == null)) {
            throw new ImportException("give either one data file, or both a before file and an after file (got %s)",
                    describe(r));
        }
        SkipLog log = new SkipLog();
        Map<String, LayoutReader.Accum> accums = new LinkedHashMap<>();
        List<InputInfo> inputs = new ArrayList<>();
        Choosing choosing = new Choosing(r.choice());
        if (one) {
            Source s = readSource(r.file(), r.sheet(), r, Plan.Role.BOTH, log, accums, choosing);
            inputs.add(new InputInfo(s.name, s.sha256, s.sheet, s.plan.layout(), "data"));
            choosing.chooseStacked(accums, log);
            choosing.check();
            return finish(r, List.of(s), accums, inputs, log, s.plan.paired());
        }
        Map<String, LayoutReader.Accum> bAcc = new LinkedHashMap<>();
        Map<String, LayoutReader.Accum> aAcc = new LinkedHashMap<>();
        Source b = readSource(r.beforeFile(), r.beforeSheet() != null ? r.beforeSheet() : r.sheet(), r,
                Plan.Role.BEFORE, log, bAcc, choosing);
        Source a = readSource(r.afterFile(), r.afterSheet() != null ? r.afterSheet() : r.sheet(), r, Plan.Role.AFTER,
                log, aAcc, choosing);
        inputs.add(new InputInfo(b.name, b.sha256, b.sheet, Layout.SEPARATE, "before"));
        inputs.add(new InputInfo(a.name, a.sha256, a.sheet, Layout.SEPARATE, "after"));
        choosing.chooseStacked(bAcc, log);
        choosing.chooseStacked(aAcc, log);
        choosing.check();
        merge(bAcc, aAcc, accums, b, a, log);
        return finish(r, List.of(b, a), accums, inputs, log, r.paired() || b.plan.paired() || a.plan.paired());
    }

    /**
     * The user's choice of characteristics applied to the files read: which columns are kept, and the
     * check that every name chosen or ignored exists (a name that matches nothing is refused with the
     * closest names, so that a misspelt criteria row never leaves a characteristic unjudged in silence).
     */
    private static final class Choosing {
        private final ColumnChoice choice;
        private final List<String> onlyKeys;
        private final List<String> ignoreKeys;
        /** Characteristic names found (key to name as written), over every file read. */
        private final Map<String, String> found = new LinkedHashMap<>();
        /** Every header name found (key to name as written), for --ignore-column. */
        private final Map<String, String> columns = new LinkedHashMap<>();

        Choosing(ColumnChoice choice) {
            this.choice = choice;
            this.onlyKeys = choice.onlyKeys();
            this.ignoreKeys = choice.ignoreKeys();
        }

        private String why(String key) {
            if (ignoreKeys.contains(key)) {
                return "left out by the user's choice (ignored column)";
            }
            if (!onlyKeys.isEmpty() && !onlyKeys.contains(key)) {
                return "not in the criteria, not analysed" + (choice.onlySource() == null ? ""
                        : " (only the characteristics of " + choice.onlySource() + " are analysed)");
            }
            return null;
        }

        /** The plan with the characteristic columns the choice leaves out set aside. */
        Plan choose(Plan plan) {
            Header h = plan.header();
            for (int c = 0; c < h.width(); c++) {
                ColumnNames.Name n = h.name(c);
                if (n != null) {
                    columns.putIfAbsent(n.key(), n.raw().strip());
                }
            }
            List<Plan.Target> kept = new ArrayList<>();
            Map<Integer, String> more = new LinkedHashMap<>();
            for (Plan.Target t : plan.targets()) {
                if (t.name() == null) {
                    kept.add(t);
                    continue;
                }
                String key = ColumnNames.key(t.name());
                found.putIfAbsent(key, t.name());
                String why = why(key);
                if (why == null) {
                    kept.add(t);
                } else if (t.column() >= 0) {
                    more.put(t.column(), why);
                } else {
                    more.put(t.beforeCol(), why);
                    more.put(t.afterCol(), why);
                }
            }
            for (int c = 0; c < h.width(); c++) {
                ColumnNames.Name n = h.name(c);
                if (n != null && ignoreKeys.contains(n.key()) && !more.containsKey(c)
                        && !plan.setAside().containsKey(c)) {
                    more.put(c, "left out by the user's choice (ignored column)");
                }
            }
            return more.isEmpty() ? plan : plan.withTargets(kept, more);
        }

        /** Stacked files name their characteristics per row: the choice is applied to what was read. */
        void chooseStacked(Map<String, LayoutReader.Accum> accums, SkipLog log) {
            List<String> dropped = new ArrayList<>();
            var it = accums.entrySet().iterator();
            while (it.hasNext()) {
                LayoutReader.Accum a = it.next().getValue();
                String key = ColumnNames.key(a.name);
                found.putIfAbsent(key, a.name);
                if (why(key) != null) {
                    dropped.add("\"" + a.name + "\"");
                    it.remove();
                }
            }
            if (!dropped.isEmpty()) {
                log.message(String.format(Locale.ROOT, "%s %s: %s", dropped.size() == 1 ? "characteristic"
                        : "characteristics", dropped.size() > 12
                        ? String.join(", ", dropped.subList(0, 12)) + " and " + (dropped.size() - 12) + " more"
                        : String.join(", ", dropped), !onlyKeys.isEmpty() ? "not in the criteria, not analysed"
                                : "left out by the user's choice"));
            }
        }

        /** Refuses a chosen or ignored name that matches nothing, naming the closest names found. */
        void check() {
            List<String> problems = new ArrayList<>();
            for (int i = 0; i < onlyKeys.size(); i++) {
                if (!found.containsKey(onlyKeys.get(i))) {
                    problems.add(String.format(Locale.ROOT, "%s: the characteristic \"%s\" matches no "
                            + "characteristic in the data%s", choice.onlySource() == null ? "the choice"
                                    : choice.onlySource(), choice.only().get(i), Closest.describe(choice.only().get(i),
                                            found.values())));
                }
            }
            for (int i = 0; i < ignoreKeys.size(); i++) {
                if (!columns.containsKey(ignoreKeys.get(i)) && !found.containsKey(ignoreKeys.get(i))) {
                    List<String> all = new ArrayList<>(columns.values());
                    all.addAll(found.values());
                    problems.add(String.format(Locale.ROOT, "the column to ignore \"%s\" is not in the data%s",
                            choice.ignore().get(i), Closest.describe(choice.ignore().get(i), all)));
                }
            }
            if (!problems.isEmpty()) {
                throw new ImportException("%s. Correct the name%s (case, spaces and a unit in brackets do not "
                        + "matter) or remove %s", String.join("; ", problems), problems.size() == 1 ? "" : "s",
                        problems.size() == 1 ? "it" : "them");
            }
            if (!onlyKeys.isEmpty() || !ignoreKeys.isEmpty()) {
                boolean any = found.keySet().stream().anyMatch(k -> why(k) == null);
                if (!any) {
                    throw new ImportException("every characteristic in the data is left out by the choice of columns; "
                            + "choose at least one to analyse");
                }
            }
        }
    }

    /** The hash computed beside the parser; its failure is the importer's message, anything else a bug. */
    private static String hashOf(java.util.concurrent.FutureTask<String> hashing) {
        try {
            return hashing.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new ImportException(e, "the import was interrupted");
        } catch (java.util.concurrent.ExecutionException e) {
            if (e.getCause() instanceof ImportException ie) {
                throw ie;
            }
            throw new IllegalStateException("hashing the input failed", e.getCause());
        }
    }

    /** A file read: its name, hash, sheet and plan, and the labels that matched no group. */
    private record Source(String name, String sha256, String sheet, Plan plan, Set<String> unknownLabels) {
    }

    private Source readSource(Path path, String sheet, ImportRequest r, Plan.Role role, SkipLog log,
            Map<String, LayoutReader.Accum> accums, Choosing choosing) {
        String name = path.toString();
        FileKind kind = FileKind.sniff(path, name);
        // the file's hash is read on a thread of its own while the parser reads the same file: on two cores it
        // costs no wall time (it was a fifth of a million-value workbook's import)
        java.util.concurrent.FutureTask<String> hashing = new java.util.concurrent.FutureTask<>(
                () -> Sha256.of(path, name));
        Thread hasher = new Thread(hashing, "holdpoint-input-hash");
        hasher.setDaemon(true);
        hasher.start();
        SheetData data;
        try {
            data = switch (kind) {
                case ZIP -> XlsxReader.read(path, name, sheet, r.decimalSeparator(), log.messages());
                case OLE2 -> XlsReader.read(path, name, sheet, r.decimalSeparator(), log.messages());
                case TEXT -> {
                    if (sheet != null) {
                        log.message(name + " is a text file; the sheet option is ignored for it");
                    }
                    yield CsvReader.read(path, name, r.delimiter(), r.decimalSeparator(), log.messages());
                }
            };
        } catch (ImportException e) {
            throw e;
        } catch (RuntimeException | StackOverflowError e) {
            throw new ImportException(e, "file %s could not be read: %s. The file may be damaged; open it in its "
                    + "program, save a fresh copy and try again", name, e.getMessage());
        }
        whenCellsRead.accept(data.cellCount());
        String sha = hashOf(hashing);
        if (!data.otherSeparatorColumns().isEmpty()) {
            List<String> cols = new ArrayList<>();
            data.otherSeparatorColumns().forEach(c -> cols.add(org.holdpoint.study.Origin.columnName(c + 1)));
            log.message(String.format(Locale.ROOT, "%s: column%s %s hold%s numbers stored as text with a decimal "
                    + "comma; read as numbers", data.where(), cols.size() == 1 ? "" : "s", String.join(", ", cols),
                    cols.size() == 1 ? "s" : ""));
        }
        Header header = HeaderDetector.detect(data, r.headerRowFor(role), labelKey(r.beforeLabel(), "before"),
                labelKey(r.afterLabel(), "after"));
        if (header.row() > 1) {
            log.message(String.format(Locale.ROOT, "%s: header in row %d (rows above it are not read)", data.where(),
                    header.row()));
        }
        if (header.limitRowsEnd() > 0) {
            int first = Math.max(header.row(), header.unitsRow()) + 1;
            log.message(String.format(Locale.ROOT, "%s: %s %s nominal values or limits (not read as data; enter the "
                    + "limits as criteria)", data.where(), first == header.limitRowsEnd() ? "row " + first
                            : "rows " + first + " to " + header.limitRowsEnd(), first == header.limitRowsEnd()
                                    ? "holds" : "hold"));
        }
        if (header.unitsRow() > 0) {
            log.message(String.format(Locale.ROOT, "%s: row %d holds the units of measure (read as units, not as "
                    + "data)", data.where(), header.unitsRow()));
        }
        Plan plan = choosing.choose(LayoutResolver.resolve(data, header, r, role, stem(path)));
        log.message(describePlan(data, plan, r.layout() != null));
        if (!plan.setAside().isEmpty()) {
            // columns set aside for the same reason are named together, the reason once (52 columns outside a
            // settings file's list made one line of 52 repeated reasons)
            Map<String, List<String>> byReason = new LinkedHashMap<>();
            for (Map.Entry<Integer, String> e : plan.setAside().entrySet()) {
                byReason.computeIfAbsent(e.getValue(), k -> new ArrayList<>()).add(col(plan.header(), e.getKey()));
            }
            List<String> aside = new ArrayList<>();
            for (Map.Entry<String, List<String>> e : byReason.entrySet()) {
                aside.add(String.join(", ", e.getValue()) + ": " + e.getKey());
            }
            log.message(data.where() + ": columns not read as characteristics: " + String.join("; ", aside));
        }
        if (data.sheet() != null && data.numbersFromText() > 0) {
            log.message(String.format(Locale.ROOT, "%s: %,d numbers stored as text were read as numbers", data.where(),
                    data.numbersFromText()));
        }
        reportOutsideColumns(data, plan, log);
        Set<String> unknown = LayoutReader.read(data, plan, log, accums);
        for (LayoutReader.Accum a : accums.values()) {
            a.unknownLabels.addAll(unknown);
        }
        return new Source(name, sha, data.sheet(), plan, unknown);
    }

    private static String labelKey(String label, String dflt) {
        return ColumnNames.key(label == null ? dflt : label);
    }

    private static String stem(Path path) {
        Path f = path.getFileName();
        String s = f == null ? path.toString() : f.toString();
        int dot = s.lastIndexOf('.');
        return dot > 0 ? s.substring(0, dot) : s;
    }

    private static String describePlan(SheetData data, Plan p, boolean requested) {
        StringBuilder sb = new StringBuilder(data.where()).append(": layout ").append(p.layout().words());
        if (p.role() != Plan.Role.BOTH) {
            sb.append(" (").append(p.role() == Plan.Role.BEFORE ? "before values only" : p.role() == Plan.Role.AFTER
                    ? "after values only" : "baseline: before values").append(")");
        }
        if (p.paired()) {
            sb.append(", pairs matched by unit id in ").append(col(p.header(), p.unitCol()));
        }
        sb.append(requested ? " (as requested)" : " (detected)");
        if (p.groupCol() >= 0) {
            sb.append("; group column ").append(col(p.header(), p.groupCol())).append(" with labels \"")
                    .append(p.beforeKey()).append("\" and \"").append(p.afterKey()).append('"');
        }
        if (p.charCol() >= 0) {
            sb.append("; characteristic column ").append(col(p.header(), p.charCol()));
        }
        if (p.unitCol() >= 0) {
            sb.append("; unit id column ").append(col(p.header(), p.unitCol()));
        }
        if (p.lotCol() >= 0) {
            sb.append("; lot column ").append(col(p.header(), p.lotCol()));
        }
        if (p.subgroupCol() >= 0) {
            sb.append("; subgroup column ").append(col(p.header(), p.subgroupCol()));
        }
        if (p.sequenceCol() >= 0) {
            sb.append("; run order from ").append(col(p.header(), p.sequenceCol()));
        }
        List<String> t = new ArrayList<>();
        for (Plan.Target target : p.targets()) {
            if (target.beforeCol() >= 0) {
                t.add((target.name() == null ? "" : target.name() + ": ") + "before " + col(p.header(),
                        target.beforeCol()) + ", after " + col(p.header(), target.afterCol()));
            } else {
                t.add(col(p.header(), target.column()));
            }
        }
        sb.append(t.size() == 1 ? "; value column " : "; value columns ")
                .append(t.size() > 12 ? String.join(", ", t.subList(0, 12)) + String.format(Locale.ROOT,
                        " and %d more", t.size() - 12) : String.join(", ", t));
        return sb.toString();
    }

    private static String col(Header h, int c) {
        ColumnNames.Name n = h.name(c);
        return (n == null ? "" : "\"" + n.raw().strip() + "\" ") + "(" + Origin.columnName(c + 1) + ")";
    }

    /** Cells below the header in columns the header does not name are listed as outside the columns. */
    private static void reportOutsideColumns(SheetData data, Plan plan, SkipLog log) {
        Header h = plan.header();
        List<String> unused = new ArrayList<>();
        for (int c = 0; c < data.columnCount(); c++) {
            SheetColumn col = data.column(c);
            if (col == null) {
                continue;
            }
            int from = col.firstAtOrAfter(h.dataStart());
            int split = h.name(c) == null && c >= h.width() && data.sheet() == null ? decimalCommaSplit(data, col, c,
                    from) : -1;
            if (split >= 0) {
                // a text line with more fields than the header, digits beside a number: a decimal comma in a
                // comma-separated file ("10,002" read as 10 and 002), so the value of that line cannot be trusted
                int row = col.row(split);
                from = split;
                throw new ImportException("file %s, line %d has more fields than the header (%s \"%s\" in column %s "
                        + "has no header). If a number is written with a decimal comma in this comma-separated file, "
                        + "quote it (\"10,002\") or save the file with semicolons; otherwise give the column a "
                        + "header", data.file(), row, "the field", data.display(col, from),
                        Origin.columnName(c + 1));
            }
            if (h.name(c) == null) {
                for (int i = from; i < col.size(); i++) {
                    log.skip(null, new Origin(data.file(), data.sheet(), col.row(i), c + 1), SkipReason.OUTSIDE_COLUMNS,
                            data.display(col, i));
                }
            } else if (!used(plan, c) && from < col.size()) {
                unused.add(col(h, c));
            }
        }
        if (!unused.isEmpty()) {
            log.message(data.where() + ": columns not used: " + (unused.size() > 12
                    ? String.join(", ", unused.subList(0, 12)) + " and " + (unused.size() - 12) + " more"
                    : String.join(", ", unused)));
        }
    }

    /** The first cell of an extra column that holds only digits beside a number, or −1. */
    private static int decimalCommaSplit(SheetData data, SheetColumn col, int c, int from) {
        SheetColumn left = data.column(c - 1);
        for (int i = from; i < col.size(); i++) {
            String t = data.display(col, i);
            if (t != null && t.matches("[0-9]+") && left != null) {
                int j = left.indexOfRow(col.row(i));
                if (j >= 0 && left.kind(j) == CellKind.NUMBER) {
                    return i;
                }
            }
        }
        return -1;
    }

    private static boolean used(Plan p, int c) {
        if (p.setAside().containsKey(c) || c == p.groupCol() || c == p.charCol() || c == p.unitCol() || c == p.lotCol() || c == p.subgroupCol()
                || c == p.sequenceCol() || c == p.uomCol()) {
            return true;
        }
        return p.targets().stream().anyMatch(t -> t.column() == c || t.beforeCol() == c || t.afterCol() == c);
    }

    /** Joins the before file's and the after file's characteristics by name (or the only one of each). */
    private static void merge(Map<String, LayoutReader.Accum> bAcc, Map<String, LayoutReader.Accum> aAcc,
            Map<String, LayoutReader.Accum> out, Source b, Source a, SkipLog log) {
        if (bAcc.size() == 1 && aAcc.size() == 1 && !bAcc.keySet().equals(aAcc.keySet())) {
            LayoutReader.Accum x = bAcc.values().iterator().next();
            LayoutReader.Accum y = aAcc.values().iterator().next();
            log.message(String.format(Locale.ROOT, "the before file's \"%s\" and the after file's \"%s\" are read as "
                    + "one characteristic, \"%s\"", x.name, y.name, x.name));
            x.after = y.after;
            x.skippedAfter.putAll(y.skippedAfter);
            x.firstSkipAfter = y.firstSkipAfter;
            x.unit = x.unit != null ? x.unit : y.unit;
            x.unknownLabels.addAll(y.unknownLabels);
            out.put(bAcc.keySet().iterator().next(), x);
            return;
        }
        for (Map.Entry<String, LayoutReader.Accum> e : bAcc.entrySet()) {
            LayoutReader.Accum y = aAcc.get(e.getKey());
            if (y == null) {
                throw new ImportException("characteristic \"%s\" is in the before file %s but not in the after file %s "
                        + "(which has %s). Use the same column names in both files", e.getValue().name, b.name, a.name,
                        names(aAcc));
            }
            LayoutReader.Accum x = e.getValue();
            x.after = y.after;
            x.skippedAfter.putAll(y.skippedAfter);
            x.firstSkipAfter = y.firstSkipAfter;
            x.unit = x.unit != null ? x.unit : y.unit;
            x.unknownLabels.addAll(y.unknownLabels);
            out.put(e.getKey(), x);
        }
        for (Map.Entry<String, LayoutReader.Accum> e : aAcc.entrySet()) {
            if (!bAcc.containsKey(e.getKey())) {
                throw new ImportException("characteristic \"%s\" is in the after file %s but not in the before file %s "
                        + "(which has %s). Use the same column names in both files", e.getValue().name, a.name, b.name,
                        names(bAcc));
            }
        }
    }

    private static String names(Map<String, LayoutReader.Accum> m) {
        return m.values().stream().limit(10).map(x -> "\"" + x.name + "\"").collect(Collectors.joining(", "))
                + (m.size() > 10 ? " and " + (m.size() - 10) + " more" : "");
    }

    /** Values of one characteristic from which its two groups are built side by side. */
    private static final int BUILD_BESIDE_FROM = 40_000;

    private Dataset finish(ImportRequest r, List<Source> sources, Map<String, LayoutReader.Accum> accums,
            List<InputInfo> inputs, SkipLog log, boolean paired) {
        return finish(r, sources, accums, inputs, log, paired, false);
    }

    private Dataset finish(ImportRequest r, List<Source> sources, Map<String, LayoutReader.Accum> accums,
            List<InputInfo> inputs, SkipLog log, boolean paired, boolean baseline) {
        if (accums.isEmpty()) {
            throw new ImportException("%s: no values found below the header. Check the layout, header row and column choices",
                    describe(r));
        }
        List<CharacteristicData> out = new ArrayList<>();
        Map<String, Long> used = new LinkedHashMap<>();
        long total = 0;
        List<String> problems = new ArrayList<>();
        Set<String> incomplete = new java.util.HashSet<>();
        for (Map.Entry<String, LayoutReader.Accum> e : accums.entrySet()) {
            LayoutReader.Accum acc = e.getValue();
            // a baseline has no after values yet: only a characteristic without before values is a problem
            String p = baseline ? (acc.before == null || acc.before.size() == 0 ? "characteristic \"" + acc.name
                    + "\" has no baseline (before) values" : null) : missingGroup(acc, sources);
            if (p != null) {
                problems.add(p);
                incomplete.add(e.getKey());
            }
        }
        if (problems.size() == accums.size()) {
            throw new ImportException("%s%s", problems.size() > 3 ? problems.size() + " characteristics cannot be "
                    + "analysed; the first: " : "", String.join("; ", problems.subList(0, Math.min(3,
                            problems.size()))));
        }
        for (String p : problems) {
            log.message(p + " (reported as not assessable; the other characteristics are analysed)");
        }
        for (Map.Entry<String, LayoutReader.Accum> e : accums.entrySet()) {
            LayoutReader.Accum a = e.getValue();
            GroupBuilder b = a.before;
            GroupBuilder f = a.after;
            if (b == null) {
                b = f.emptyCopy();
            }
            if (f == null) {
                f = b.emptyCopy();
            }
            List<String> unmatched = List.of();
            if (paired && !incomplete.contains(e.getKey()) && (accums.size() == 1 || shareUnitId(b, f))) {
                Pairing.Matched m = Pairing.match(a.name, b, f, log);
                b = m.before();
                f = m.after();
                unmatched = m.unmatched();
                if (!unmatched.isEmpty()) {
                    log.message(String.format(Locale.ROOT, "characteristic %s: %d unit(s) found in only one group, left "
                            + "out of the paired analysis: %s", a.name, unmatched.size(), unmatched.size() > 20
                                    ? String.join(", ", unmatched.subList(0, 20)) + ", …" : String.join(", ", unmatched)));
                }
            } else if (paired) {
                if (!incomplete.contains(e.getKey())) {
                    // no pair can be formed: reported on this characteristic (not assessable); the others go on
                    log.message(String.format(Locale.ROOT, "characteristic %s: no unit id occurs in both the before "
                            + "and the after group, so no pair can be formed (reported as not assessable)", a.name));
                    unmatched = unitIds(b, f);
                }
                b = b.emptyCopy();
                f = f.emptyCopy();
            }
            GroupBuilder after = f;
            // a large characteristic's two groups are built side by side (each is a few passes over its values)
            Background.Forked<GroupData> afterBuilt = b.size() + f.size() >= BUILD_BESIDE_FROM
                    ? Background.fork(after::build) : null;
            GroupData beforeData = b.build();
            out.add(new CharacteristicData(a.name, a.unit, beforeData, afterBuilt == null ? f.build()
                    : afterBuilt.join(), paired, unmatched));
            used.put(a.name, (long) b.size() + f.size());
            total += b.size() + f.size();
        }
        if (!paired) {
            String hint = pairingHint(out);
            if (hint != null) {
                log.message(hint);
            }
        }
        return new Dataset(out, inputs, log.report(total, used));
    }

    private static boolean shareUnitId(GroupBuilder b, GroupBuilder f) {
        Set<String> ids = new java.util.HashSet<>();
        for (int i = 0; i < b.size(); i++) {
            ids.add(b.unit(i));
        }
        for (int i = 0; i < f.size(); i++) {
            if (ids.contains(f.unit(i))) {
                return true;
            }
        }
        return false;
    }

    /** Every unit id of both groups, in order, without repeats. */
    private static List<String> unitIds(GroupBuilder b, GroupBuilder f) {
        java.util.LinkedHashSet<String> ids = new java.util.LinkedHashSet<>();
        for (GroupBuilder g : new GroupBuilder[] {b, f}) {
            for (int i = 0; i < g.size(); i++) {
                if (g.unit(i) != null) {
                    ids.add(g.unit(i));
                }
            }
        }
        return new ArrayList<>(ids);
    }

    /** Share of common unit ids from which the data are said to look paired (common practice, no source). */
    static final double PAIRING_HINT_OVERLAP = 0.8;

    /**
     * When the before and the after group carry the same unit ids (at least 80 % of the ids of the smaller
     * group occur in both) but the data are read as independent groups: a hint to pair them.
     */
    static String pairingHint(List<CharacteristicData> data) {
        for (CharacteristicData c : data) {
            if (!c.before().hasUnits() || !c.after().hasUnits() || c.before().size() < 2 || c.after().size() < 2) {
                continue;
            }
            Set<String> b = new java.util.HashSet<>();
            for (int i = 0; i < c.before().size(); i++) {
                b.add(c.before().unit(i));
            }
            Set<String> a = new java.util.HashSet<>();
            for (int i = 0; i < c.after().size(); i++) {
                a.add(c.after().unit(i));
            }
            long common = a.stream().filter(b::contains).count();
            int smaller = Math.min(a.size(), b.size());
            if (smaller >= 2 && common >= PAIRING_HINT_OVERLAP * smaller) {
                return String.format(Locale.ROOT, "PAIRING HINT: %d of the %d unit ids of characteristic \"%s\" occur "
                        + "in both the before and the after group, so the same parts seem to have been measured "
                        + "twice, but they were analysed as independent groups. If so, analyse them as paired (the "
                        + "paired choice); the values are then "
                        + "matched by unit id and the paired tests are used", common, smaller, c.name());
            }
        }
        return null;
    }

    /** A message when a characteristic lacks the before or the after values, else null. */
    private static String missingGroup(LayoutReader.Accum a, List<Source> sources) {
        boolean noB = a.before == null || a.before.size() == 0;
        boolean noA = a.after == null || a.after.size() == 0;
        if (!noB && !noA) {
            return null;
        }
        String which = noB && noA ? "neither before nor after values" : noB ? "no before values" : "no after values";
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT, "characteristic \"%s\" (%s) has %s", a.name,
                String.join("; ", a.where), which));
        if (noB) {
            sb.append(skipped("before", a.skippedBefore, a.firstSkipBefore));
        }
        if (noA) {
            sb.append(skipped("after", a.skippedAfter, a.firstSkipAfter));
        }
        Plan plan = sources.get(0).plan();
        boolean cellsSkipped = noB && !a.skippedBefore.isEmpty() || noA && !a.skippedAfter.isEmpty();
        if (cellsSkipped && a.unknownLabels.isEmpty()) {
            sb.append(". Correct those cells (measurements must be numbers) or export the values again");
        } else if (sources.size() == 2 && !a.unknownLabels.isEmpty() && a.unknownLabels.stream().map(ColumnNames::key)
                .anyMatch(k -> k.equals(noB ? sources.get(1).plan().afterKey() : sources.get(0).plan().beforeKey()))) {
            // a two-file study whose before file is labelled "after" (or the other way round)
            sb.append(String.format(Locale.ROOT, ". The %s file's group column says %s: the two files seem to be "
                    + "given the other way round (the before file is the one measured before the change), or its rows are "
                    + "labelled wrongly", noB ? "before" : "after", a.unknownLabels.stream().map(x -> "\"" + x + "\"")
                            .collect(Collectors.joining(", "))));
        } else if (!a.unknownLabels.isEmpty()) {
            sb.append(String.format(Locale.ROOT, ". The group column holds the label(s) %s, which are neither \"%s\" nor "
                    + "\"%s\": name the labels that mean before and after", a.unknownLabels
                            .stream().map(s -> "\"" + s + "\"").collect(Collectors.joining(", ")), plan.beforeKey(),
                    plan.afterKey()));
        } else if (sources.size() == 1 && plan.groupCol() >= 0) {
            sb.append(String.format(Locale.ROOT, ". Check that the group column holds both labels \"%s\" and \"%s\"",
                    plan.beforeKey(), plan.afterKey()));
        } else {
            sb.append(". Check that the measurements are numbers in the value columns");
        }
        return sb.toString();
    }

    private static String skipped(String group, EnumMap<SkipReason, Long> m, String first) {
        if (m.isEmpty()) {
            return "";
        }
        String reasons = m.entrySet().stream().map(e -> e.getValue() + " " + e.getKey().words())
                .collect(Collectors.joining(", "));
        return String.format(Locale.ROOT, " (%s cells not used: %s; the first at %s)", group, reasons, first);
    }
}
