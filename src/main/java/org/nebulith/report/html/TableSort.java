package org.nebulith.report.html;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Base64;

/**
 * The report's only script: clicking a column heading sorts the table by that column (numbers by
 * their full-precision value, text alphabetically; a second click reverses). It is allowed by its
 * SHA-256 hash in the page's Content-Security-Policy, so nothing else can run and nothing is
 * fetched.
 */
final class TableSort {

    /** The script. */
    static final String SCRIPT = "document.querySelectorAll('th.sortable').forEach(function(th){"
            + "th.addEventListener('click',function(){var t=th.closest('table'),b=t.tBodies[0],"
            + "i=Array.prototype.indexOf.call(th.parentNode.children,th),up=th.dataset.dir!=='up';"
            + "th.dataset.dir=up?'up':'down';var rows=Array.prototype.slice.call(b.rows);"
            + "rows.sort(function(x,y){var a=x.cells[i],c=y.cells[i],"
            + "p=a.dataset.v!==undefined?parseFloat(a.dataset.v):NaN,q=c.dataset.v!==undefined?parseFloat(c.dataset.v):NaN,"
            + "r=(!isNaN(p)&&!isNaN(q))?p-q:a.textContent.localeCompare(c.textContent);return up?r:-r;});"
            + "rows.forEach(function(r){b.appendChild(r);});});});";

    /** CSP source expression of the script. */
    static final String CSP_HASH = "sha256-" + sha256(SCRIPT);

    private TableSort() {
    }

    private static String sha256(final String text) {
        try {
            return Base64.getEncoder().encodeToString(MessageDigest.getInstance("SHA-256")
                    .digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 missing from the JDK", e);
        }
    }
}
