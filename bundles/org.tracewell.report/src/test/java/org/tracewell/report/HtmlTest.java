package org.tracewell.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import org.junit.jupiter.api.Test;

/** The five characters HTML gives meaning to in text and quoted attributes (HTML Living Standard, §13.1). */
class HtmlTest {

    @Test
    void escapesMarkupAndBothQuotes() {
        assertEquals("&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt; &amp; &quot;q&quot;",
                Html.escape("<script>alert('x')</script> & \"q\""));
    }

    @Test
    void leavesPlainTextAloneAndUnicodeIntact() {
        String plain = "Circular deviation G ≤ 25 µm at F = 3 m/min, R = 100 mm";
        assertSame(plain, Html.escape(plain), "no copy when nothing needs escaping");
        assertEquals("", Html.escape(null));
    }

    @Test
    void replacesControlCharactersHtmlForbids() {
        assertEquals("a\uFFFDb\tc\nd", Html.escape("a\u0000b\tc\nd"));
    }

    @Test
    void fragmentIdsAreSafeAndKeepDifferentIdsApart() {
        assertEquals("axis-lm3020-x1", Html.fragmentId("axis", "lm3020-x1"));
        assertEquals("axis-a_20_b", Html.fragmentId("axis", "a b"));
        assertNotEquals(Html.fragmentId("axis", "a b"), Html.fragmentId("axis", "a_b"));
        assertEquals("axis-_3c_script_3e_", Html.fragmentId("axis", "<script>"));
    }
}
