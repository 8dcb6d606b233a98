package org.holdpoint.archive;

import java.util.ArrayList;
import java.util.List;

/**
 * Splits a plain SQL script into statements at semicolons that are outside quotes, comments and
 * PostgreSQL dollar-quoted bodies ({@code $$ … $$} or {@code $tag$ … $tag$}).
 */
final class SqlScript {

    private SqlScript() {
    }

    /**
     * @param script the script text
     * @return the statements, without their terminating semicolons, blank ones dropped
     */
    static List<String> split(String script) {
        List<String> out = new ArrayList<>();
        StringBuilder cur = new StringBuilder();
        int i = 0;
        int n = script.length();
        while (i < n) {
            char ch = script.charAt(i);
            if (ch == '-' && i + 1 < n && script.charAt(i + 1) == '-') {
                int end = script.indexOf('\n', i);
                i = end < 0 ? n : end;
            } else if (ch == '\'' || ch == '"') {
                int end = closing(script, i + 1, ch);
                cur.append(script, i, end);
                i = end;
            } else if (ch == '$' && dollarTag(script, i) != null) {
                String tag = dollarTag(script, i);
                int end = script.indexOf(tag, i + tag.length());
                end = end < 0 ? n : end + tag.length();
                cur.append(script, i, end);
                i = end;
            } else if (ch == ';') {
                add(out, cur);
                i++;
            } else {
                cur.append(ch);
                i++;
            }
        }
        add(out, cur);
        return out;
    }

    private static int closing(String s, int from, char quote) {
        int i = from;
        while (i < s.length()) {
            if (s.charAt(i) == quote) {
                if (i + 1 < s.length() && s.charAt(i + 1) == quote) {
                    i += 2;
                    continue;
                }
                return i + 1;
            }
            i++;
        }
        return s.length();
    }

    private static String dollarTag(String s, int at) {
        int j = at + 1;
        while (j < s.length() && (Character.isLetterOrDigit(s.charAt(j)) || s.charAt(j) == '_')) {
            j++;
        }
        return j < s.length() && s.charAt(j) == '$' ? s.substring(at, j + 1) : null;
    }

    private static void add(List<String> out, StringBuilder cur) {
        String s = cur.toString().strip();
        if (!s.isEmpty()) {
            out.add(s);
        }
        cur.setLength(0);
    }
}
