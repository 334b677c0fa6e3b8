package org.tracewell.report;

import java.util.ArrayList;
import java.util.List;

/**
 * A small HTML writer: markup comes only from this class's own constants and tag names, every text and
 * attribute value goes through {@link Html#escape}. No method takes raw markup from a caller, so a model
 * string cannot end up unescaped.
 */
final class Page {

    private final StringBuilder out = new StringBuilder(64 * 1024);

    /** Opens {@code tag} with an optional class (and id), e.g. {@code open("section", "loops", "loops")}. */
    Page open(String tag, String cssClass, String id) {
        out.append('<').append(tag);
        attribute("id", id);
        attribute("class", cssClass);
        out.append('>');
        return this;
    }

    Page open(String tag, String cssClass) {
        return open(tag, cssClass, null);
    }

    Page open(String tag) {
        return open(tag, null, null);
    }

    Page close(String tag) {
        out.append("</").append(tag).append(">\n");
        return this;
    }

    /** {@code <tag class="…">escaped text</tag>}. */
    Page element(String tag, String cssClass, String text) {
        open(tag, cssClass, null);
        text(text);
        out.append("</").append(tag).append('>');
        return tag.equals("span") || tag.equals("strong") ? this : newline();
    }

    Page element(String tag, String text) {
        return element(tag, null, text);
    }

    Page text(String text) {
        out.append(Html.escape(text));
        return this;
    }

    /** A heading with an id, so the contents list can link to it. */
    Page heading(int level, String id, String text) {
        String tag = "h" + level;
        open(tag, null, id);
        text(text);
        return close(tag);
    }

    /** A link to a fragment of this page. */
    Page anchorLink(String fragmentId, String text) {
        out.append("<a href=\"#").append(Html.escape(fragmentId)).append("\">");
        text(text);
        out.append("</a>");
        return this;
    }

    /** An image with its alternative text; {@code source} is a relative file name or a data: URI of a PNG. */
    Page image(String source, String alt, int widthPx, int heightPx) {
        out.append("<img src=\"").append(Html.escape(source)).append("\" alt=\"").append(Html.escape(alt))
                .append("\" width=\"").append(widthPx).append("\" height=\"").append(heightPx).append("\">");
        return this;
    }

    /** A figure: the image and a caption. */
    Page figure(String source, String alt, int widthPx, int heightPx, String caption) {
        open("figure");
        image(source, alt, widthPx, heightPx);
        element("figcaption", caption);
        return close("figure");
    }

    /** A status word in its coloured badge: colour and word together, never colour alone. */
    Page status(String cssKey, String word) {
        out.append("<span class=\"status ").append(Html.escape(cssKey)).append("\">");
        text(word);
        out.append("</span>");
        return this;
    }

    /** A definition list of label → value pairs. */
    Page facts(List<String[]> pairs) {
        open("dl", "facts");
        for (String[] pair : pairs) {
            element("dt", pair[0]);
            element("dd", pair[1]);
        }
        return close("dl");
    }

    /** An unordered list of escaped items; nothing when the list is empty. */
    Page list(String cssClass, List<String> items) {
        if (items.isEmpty()) {
            return this;
        }
        open("ul", cssClass);
        for (String item : items) {
            element("li", item);
        }
        return close("ul");
    }

    Page newline() {
        out.append('\n');
        return this;
    }

    /** Writes the fixed document head (doctype, charset, title, style) — the style is this bundle's constant. */
    Page documentStart(String title, String css) {
        out.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
                .append("<meta name=\"generator\" content=\"Tracewell\">\n<title>");
        text(title);
        out.append("</title>\n<style>\n").append(css).append("</style>\n</head>\n<body>\n");
        return this;
    }

    Page documentEnd() {
        out.append("</body>\n</html>\n");
        return this;
    }

    Table table(String cssClass, String caption, String... headers) {
        return new Table(cssClass, caption, headers);
    }

    @Override
    public String toString() {
        return out.toString();
    }

    private void attribute(String name, String value) {
        if (value != null && !value.isEmpty()) {
            out.append(' ').append(name).append("=\"").append(Html.escape(value)).append('"');
        }
    }

    /** A table collected row by row, written by {@link #end()}. */
    final class Table {
        private final String cssClass;
        private final String caption;
        private final String[] headers;
        private final List<List<Cell>> rows = new ArrayList<>();

        private Table(String cssClass, String caption, String[] headers) {
            this.cssClass = cssClass;
            this.caption = caption;
            this.headers = headers.clone();
        }

        Table row(Cell... cells) {
            if (cells.length != headers.length) {
                throw new IllegalArgumentException("table '" + caption + "' has " + headers.length
                        + " columns but a row of " + cells.length + " cells");
            }
            rows.add(List.of(cells));
            return this;
        }

        int rowCount() {
            return rows.size();
        }

        Page end() {
            open("div", "table-wrap");
            open("table", cssClass);
            if (caption != null && !caption.isEmpty()) {
                element("caption", caption);
            }
            open("thead");
            open("tr");
            for (String h : headers) {
                element("th", h);
            }
            close("tr");
            close("thead");
            open("tbody");
            for (List<Cell> row : rows) {
                open("tr");
                for (Cell cell : row) {
                    open("td", cell.cssClass());
                    if (cell.statusKey() != null) {
                        status(cell.statusKey(), cell.text());
                        if (cell.note() != null) {
                            out.append(' ');
                            element("span", "muted", cell.note());
                        }
                    } else {
                        text(cell.text());
                    }
                    out.append("</td>");
                }
                close("tr");
            }
            close("tbody");
            close("table");
            return close("div");
        }
    }

    /**
     * One table cell: escaped text with an optional class ("num" right-aligns), or a status badge (word inside
     * the badge) with an optional note after it.
     */
    record Cell(String text, String cssClass, String statusKey, String note) {

        static Cell text(String text) {
            return new Cell(text, null, null, null);
        }

        static Cell number(String text) {
            return new Cell(text, "num", null, null);
        }

        static Cell status(String key, String word) {
            return new Cell(word, "status-cell", key, null);
        }

        static Cell status(String key, String word, String note) {
            return new Cell(word, "status-cell", key, note);
        }
    }
}
