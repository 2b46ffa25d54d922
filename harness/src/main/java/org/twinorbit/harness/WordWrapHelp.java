package org.twinorbit.harness;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import picocli.CommandLine.Help;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Model.PositionalParamSpec;
import picocli.CommandLine.Model.UsageMessageSpec;

/**
 * Help text that wraps between words only. picocli breaks lines where {@link java.text.BreakIterator}
 * allows, which is also after a full stop or a comma inside a word, so that {@code scan.json},
 * {@code mass,charge} or {@code --box=X0,X1,...} came out split across two lines. Here the
 * synopsis, the description, the option list and the command list wrap at spaces; only a word
 * longer than a whole line is cut.
 */
final class WordWrapHelp extends Help {

    /** picocli's limit for the synopsis indent, as a fraction of the width. */
    private static final double MAX_SYNOPSIS_INDENT = 0.9;

    WordWrapHelp(CommandSpec spec, ColorScheme scheme) {
        super(spec, scheme);
    }

    private int width() {
        return commandSpec().usageMessage().width();
    }

    @Override
    public Layout createDefaultLayout(List<OptionSpec> options, List<PositionalParamSpec> positionals,
                                      ColorScheme scheme) {
        Layout base = super.createDefaultLayout(options, positionals, scheme);
        TextTable table = new WordTable(scheme, base.textTable().columns());
        table.indentWrappedLines = base.textTable().indentWrappedLines;
        return new Layout(scheme, table, base.optionRenderer(), base.parameterRenderer());
    }

    @Override
    public String description(Object... params) {
        return paragraphs(commandSpec().usageMessage().description(), params);
    }

    @Override
    public String header(Object... params) {
        return paragraphs(commandSpec().usageMessage().header(), params);
    }

    @Override
    public String footer(Object... params) {
        return paragraphs(commandSpec().usageMessage().footer(), params);
    }

    /** Lines of text across the whole width, each wrapped at spaces. */
    private String paragraphs(String[] lines, Object... params) {
        if (lines == null || lines.length == 0) {
            return "";
        }
        TextTable table = new WordTable(colorScheme(), new Column(width(), 0, Column.Overflow.WRAP));
        table.indentWrappedLines = 0;
        for (String line : lines) {
            table.addRowValues(colorScheme().text(format(line, params)));
        }
        return table.toString();
    }

    @Override
    protected String insertSynopsisCommandName(int headingLength, Ansi.Text details) {
        String name = commandSpec().qualifiedName();
        UsageMessageSpec usage = commandSpec().usageMessage();
        int indent = headingLength + name.length() + 1;
        if (indent > usage.synopsisAutoIndentThreshold() * width()) {
            indent = usage.synopsisIndent() < 0 ? headingLength : usage.synopsisIndent();
            indent = Math.min(indent, (int) (MAX_SYNOPSIS_INDENT * width()));
        }
        TextTable table = new WordTable(colorScheme(), new Column(width(), 0, Column.Overflow.WRAP));
        table.indentWrappedLines = indent;
        // the heading ("Usage: ") is printed before this text: hold its place, then cut it off
        Ansi.Text place = Ansi.OFF.new Text("X".repeat(headingLength), colorScheme());
        table.addRowValues(place.concat(colorScheme().commandText(name)).concat(details));
        return table.toString().substring(headingLength);
    }

    @Override
    public String commandList(Map<String, Help> subcommands) {
        if (subcommands.isEmpty()) {
            return "";
        }
        int longest = subcommands.keySet().stream().mapToInt(String::length).max().orElse(0);
        int nameWidth = Math.min(longest, width() / 2) + 2;
        TextTable table = new WordTable(colorScheme(), new Column(nameWidth, 2, Column.Overflow.SPAN),
                new Column(width() - nameWidth, 2, Column.Overflow.WRAP));
        for (Help help : subcommands.values()) {
            UsageMessageSpec usage = help.commandSpec().usageMessage();
            String[] first = usage.header().length > 0 ? usage.header() : usage.description();
            Ansi.Text[] lines = colorScheme().text(first.length > 0 ? format(first[0]) : "").splitLines();
            for (int i = 0; i < lines.length; i++) {
                table.addRowValues(i == 0 ? help.commandNamesText(", ") : Ansi.OFF.new Text(""), lines[i]);
            }
        }
        return table.toString();
    }

    /** A description line formatted as picocli does ({@code %n}, {@code %%}), left as it is if malformed. */
    private static String format(String line, Object... params) {
        try {
            return String.format(line, params);
        } catch (java.util.IllegalFormatException e) {
            return line;
        }
    }

    /** A text table whose wrapping columns break lines at spaces only. */
    static final class WordTable extends TextTable {

        WordTable(ColorScheme scheme, Column... columns) {
            super(scheme, columns);
        }

        @Override
        public Cell putValue(int row, int col, Ansi.Text value) {
            Column column = columns()[col];
            if (value == null || column.overflow != Column.Overflow.WRAP) {
                return super.putValue(row, col, value);
            }
            List<int[]> lines = lines(value.plainString(), column.width - column.indent,
                    column.width - column.indent - indentWrappedLines);
            Ansi.Text indent = Ansi.OFF.new Text(" ".repeat(Math.max(indentWrappedLines, 0)));
            Cell cell = null;
            int r = row;
            for (int i = 0; i < lines.size(); i++) {
                Ansi.Text piece = value.substring(lines.get(i)[0], lines.get(i)[1]);
                if (i > 0) {
                    r++;
                    addEmptyRow();
                    piece = indent.concat(piece);
                }
                cell = super.putValue(r, col, piece);
            }
            return cell != null ? cell : super.putValue(row, col, value);
        }

        /**
         * Greedy filling at spaces: [start, end) of each line of {@code text}, the first up to
         * {@code first} characters long, the others up to {@code next}.
         */
        static List<int[]> lines(String text, int first, int next) {
            List<int[]> lines = new ArrayList<>();
            int n = text.length();
            int pos = 0;
            int room = Math.max(first, 1);
            while (pos < n) {
                int end = -1;
                int i = pos;
                while (i < n) {
                    int wordEnd = i;
                    while (wordEnd < n && text.charAt(wordEnd) != ' ') {
                        wordEnd++;
                    }
                    if (wordEnd - pos > room) {
                        break;
                    }
                    end = wordEnd;
                    i = wordEnd;
                    while (i < n && text.charAt(i) == ' ') {
                        i++;
                    }
                }
                if (end < 0) { // one word longer than the line: cut it, nothing else can be done
                    end = pos + room;
                    i = end;
                }
                lines.add(new int[] {pos, end});
                pos = i;
                room = Math.max(next, 1);
            }
            return lines;
        }
    }
}
