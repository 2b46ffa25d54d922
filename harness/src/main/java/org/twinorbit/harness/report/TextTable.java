package org.twinorbit.harness.report;

import java.util.ArrayList;
import java.util.List;

/** A table of strings rendered as Markdown or as aligned plain text. */
public final class TextTable {

    private final List<String> header;
    private final List<List<String>> rows = new ArrayList<>();

    public TextTable(List<String> header) {
        this.header = List.copyOf(header);
    }

    public TextTable add(List<String> row) {
        if (row.size() != header.size()) {
            throw new IllegalArgumentException("row has " + row.size() + " cells, header " + header.size());
        }
        rows.add(List.copyOf(row));
        return this;
    }

    /** A Markdown pipe table; the first column left-aligned, the rest right-aligned. */
    public String markdown() {
        StringBuilder sb = new StringBuilder();
        line(sb, header);
        sb.append('|');
        for (int i = 0; i < header.size(); i++) {
            sb.append(i == 0 ? "---|" : "---:|");
        }
        sb.append('\n');
        for (List<String> r : rows) {
            line(sb, r);
        }
        return sb.toString();
    }

    private static void line(StringBuilder sb, List<String> cells) {
        sb.append('|');
        for (String c : cells) {
            sb.append(' ').append(c.replace("|", "\\|")).append(" |");
        }
        sb.append('\n');
    }

    /** Columns padded to their widest cell, separated by two spaces. */
    public String aligned() {
        int[] w = new int[header.size()];
        for (int i = 0; i < w.length; i++) {
            w[i] = header.get(i).length();
            for (List<String> r : rows) {
                w[i] = Math.max(w[i], r.get(i).length());
            }
        }
        StringBuilder sb = new StringBuilder();
        pad(sb, header, w);
        for (List<String> r : rows) {
            pad(sb, r, w);
        }
        return sb.toString();
    }

    private static void pad(StringBuilder sb, List<String> cells, int[] w) {
        for (int i = 0; i < cells.size(); i++) {
            String c = cells.get(i);
            if (i == 0) {
                sb.append(c).append(" ".repeat(w[i] - c.length()));
            } else {
                sb.append("  ").append(" ".repeat(w[i] - c.length())).append(c);
            }
        }
        sb.append('\n');
    }
}
