package org.holdpoint.importer;

import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayDeque;
import java.util.Arrays;
import java.util.Deque;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Function;
import java.util.function.Supplier;

/**
 * Scans a large worksheet part on all cores (docs/performance.md, "Import"). The calling thread inflates the part
 * and cuts it into blocks of about {@link #BLOCK} bytes, each cut placed just before the start tag of a row that
 * carries its number (attribute {@code r}); a block is scanned by {@link SheetXmlScanner} into a sheet of its own,
 * and the blocks' sheets are appended in order ({@link SheetData#append}). A row's start tag cannot occur inside a
 * text or an attribute value ('&lt;' is escaped there), and a row with its number needs nothing from the rows before
 * it, so the result is what one scan of the whole part gives.
 *
 * <p>What a block cannot settle alone — a comment or processing instruction among the rows (a cut may have fallen
 * inside it), a block ending inside a tag, XML the scanner does not take, a cell beyond the last column, no row
 * number to cut at within eight blocks — raises {@link Again}: the caller then scans the part again from
 * its start in one piece, which gives the same cells or the same message as before this class existed.
 */
final class ParallelSheetScan {
    /** Bytes per block (a 4 MB block holds about 90,000 cells of a typical export). */
    static final int BLOCK = 4 << 20;

    /** The part must be scanned again in one piece (see the class comment); not an error of the file. */
    static final class Again extends Exception {
        private static final long serialVersionUID = 1L;

        Again(String why, Throwable cause) {
            super(why, cause, false, false);
        }
    }

    private ParallelSheetScan() {
    }

    /** @return how many threads scan blocks: the cores, at most 4; 1 means scan in one piece */
    static int workers() {
        return Math.min(4, Runtime.getRuntime().availableProcessors());
    }

    /**
     * Scans the part read from {@code in} into {@code first}.
     *
     * @param in       the part's inflated bytes, from their start
     * @param first    receives every cell (the first block is scanned into it, the others appended)
     * @param newSheet makes the sheet of a later block
     * @param cellsFor makes the cell reader of a block's sheet
     * @param workers  threads that scan blocks (at least 2)
     * @throws IOException  when reading the part fails (a damaged file), or a part of one block is cut off (then
     *                      it is the whole part and the message is the one-piece scan's)
     * @throws SheetXmlScanner.Unsupported for XML the scanner does not take, when the part is a single block
     * @throws Again        when the part must be scanned again in one piece
     */
    static void scan(InputStream in, SheetData first, Supplier<SheetData> newSheet,
            Function<SheetData, SheetCells> cellsFor, int workers) throws IOException, SheetXmlScanner.Unsupported,
            Again {
        scan(in, first, newSheet, cellsFor, workers, BLOCK);
    }

    /** As {@link #scan(InputStream, SheetData, Supplier, Function, int)}, with blocks of {@code block} bytes. */
    static void scan(InputStream in, SheetData first, Supplier<SheetData> newSheet,
            Function<SheetData, SheetCells> cellsFor, int workers, int block) throws IOException,
            SheetXmlScanner.Unsupported, Again {
        int maxBlock = 8 * block;
        // a small part fits the first 64 KB; a larger one is read on into a whole block (readNBytes(int) would
        // gather a block's bytes in pieces and copy them once more)
        byte[] head = new byte[Math.min(block, 1 << 16)];
        int headLen = in.readNBytes(head, 0, head.length);
        int firstLen = headLen;
        byte[] buf = head;
        if (headLen == head.length && head.length < block) {
            buf = Arrays.copyOf(head, block);
            firstLen += in.readNBytes(buf, headLen, block - headLen);
        }
        if (firstLen < block) {
            // a small part: one block, scanned here, with the one-piece scan's results and messages
            new SheetXmlScanner(buf, firstLen, cellsFor.apply(first), true, true).run();
            return;
        }
        AtomicInteger threadNo = new AtomicInteger();
        ExecutorService pool = Executors.newFixedThreadPool(workers, r -> {
            Thread t = new Thread(r, "holdpoint-sheet-scan-" + threadNo.incrementAndGet());
            t.setDaemon(true);
            return t;
        });
        // blocks in use are at most workers + 2 (scanning, waiting, being filled): memory stays bounded
        BlockingQueue<byte[]> free = new ArrayBlockingQueue<>(workers + 2);
        int made = 1;
        Deque<Future<SheetData>> pending = new ArrayDeque<>();
        // a block's sheet, once appended, is emptied and used again: its column arrays are not made anew per block
        Deque<SheetData> spare = new ArrayDeque<>();
        Supplier<SheetData> sheets = () -> spare.isEmpty() ? newSheet.get() : spare.pop();
        try {
            int len = firstLen;
            boolean eof = false;
            boolean start = true;
            while (true) {
                int cut = eof ? len : lastNumberedRow(buf, len);
                while (cut <= 0) {
                    // no numbered row after the block's first byte: read on into a larger block
                    if (buf.length >= maxBlock) {
                        throw new Again("no numbered row to cut at within " + maxBlock + " bytes", null);
                    }
                    buf = Arrays.copyOf(buf, buf.length * 2);
                    int n = in.readNBytes(buf, len, buf.length - len);
                    len += n;
                    eof = len < buf.length;
                    cut = eof ? len : lastNumberedRow(buf, len);
                }
                boolean end = cut == len && eof;
                pending.add(pool.submit(task(buf, cut, start, end, start ? first : sheets.get(), cellsFor, free)));
                start = false;
                appendDone(first, pending, spare, false);
                if (end) {
                    break;
                }
                byte[] next = free.poll();
                if (next == null && made < workers + 2) {
                    next = new byte[block];
                    made++;
                } else if (next == null) {
                    next = take(free);
                }
                int carry = len - cut;
                if (next.length < carry + block / 2) {
                    next = new byte[carry + block];
                }
                System.arraycopy(buf, cut, next, 0, carry);
                buf = next;
                int n = in.readNBytes(buf, carry, buf.length - carry);
                len = carry + n;
                eof = len < buf.length;
            }
            appendDone(first, pending, spare, true);
        } finally {
            pool.shutdownNow();
        }
    }

    private static byte[] take(BlockingQueue<byte[]> free) throws IOException {
        try {
            return free.take();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new java.io.InterruptedIOException("reading the sheet was interrupted");
        }
    }

    private static java.util.concurrent.Callable<SheetData> task(byte[] block, int length, boolean start, boolean end,
            SheetData sheet, Function<SheetData, SheetCells> cellsFor, BlockingQueue<byte[]> free) {
        return () -> {
            try {
                SheetXmlScanner scanner = new SheetXmlScanner(block, length, cellsFor.apply(sheet), start, end);
                scanner.run();
                if (scanner.markupAmongRows()) {
                    throw new Again("a comment or processing instruction among the rows", null);
                }
                return sheet;
            } finally {
                free.offer(block);
            }
        };
    }

    /** Appends the blocks at the head of the queue that are done (all of them, waiting, when {@code all}). */
    private static void appendDone(SheetData first, Deque<Future<SheetData>> pending, Deque<SheetData> spare,
            boolean all)
            throws IOException, Again {
        while (!pending.isEmpty() && (all || pending.peekFirst().isDone())) {
            SheetData sheet;
            try {
                sheet = pending.pollFirst().get();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new java.io.InterruptedIOException("reading the sheet was interrupted");
            } catch (ExecutionException e) {
                Throwable c = e.getCause();
                if (c instanceof Again a) {
                    throw a;
                }
                if (c instanceof IOException || c instanceof SheetXmlScanner.Unsupported
                        || c instanceof ImportException) {
                    // settled by the one-piece scan, which gives this part's true message
                    throw new Again(c.getMessage(), c);
                }
                if (c instanceof RuntimeException r) {
                    throw r;
                }
                if (c instanceof Error err) {
                    throw err;
                }
                throw new IllegalStateException(c);
            }
            if (sheet != first) {
                first.append(sheet);
                sheet.clearForReuse();
                spare.push(sheet);
            }
        }
    }

    /**
     * The index of the last start tag of a row that carries its number ({@code <row r="…"} or with a namespace
     * prefix), after index 0 and wholly inside {@code buf[0, len)}; −1 when there is none.
     */
    static int lastNumberedRow(byte[] buf, int len) {
        for (int q = len - 1; q > 0; q--) {
            if (buf[q] == '<' && numberedRowAt(buf, q, len)) {
                return q;
            }
        }
        return -1;
    }

    private static boolean numberedRowAt(byte[] b, int q, int len) {
        int i = q + 1;
        int nameStart = i;
        while (i < len && b[i] > ' ' && b[i] != '/' && b[i] != '>') {
            if (b[i] == ':') {
                nameStart = i + 1;
            }
            i++;
        }
        if (i - nameStart != 3 || b[nameStart] != 'r' || b[nameStart + 1] != 'o' || b[nameStart + 2] != 'w'
                || i >= len || b[i] > ' ') {
            return false;
        }
        boolean numbered = false;
        while (true) {
            while (i < len && b[i] <= ' ') {
                i++;
            }
            if (i >= len) {
                return false;
            }
            if (b[i] == '>' || b[i] == '/') {
                return numbered;
            }
            int an = i;
            while (i < len && b[i] != '=' && b[i] > ' ' && b[i] != '>') {
                i++;
            }
            int anLen = i - an;
            while (i < len && b[i] <= ' ') {
                i++;
            }
            if (i >= len || b[i] != '=') {
                return false;
            }
            i++;
            while (i < len && b[i] <= ' ') {
                i++;
            }
            if (i >= len || b[i] != '"' && b[i] != '\'') {
                return false;
            }
            byte quote = b[i++];
            int vs = i;
            while (i < len && b[i] != quote) {
                i++;
            }
            if (i >= len) {
                return false;
            }
            if (anLen == 1 && b[an] == 'r' && i > vs) {
                numbered = true;
            }
            i++;
        }
    }
}
