package org.ventcase.casefile;

import java.util.Collection;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Pattern;

/** Small text helpers of the case-file package: JSON paths and nearest-name suggestions. */
final class Names {

    private static final Pattern SIMPLE_KEY = Pattern.compile("[A-Za-z_][A-Za-z0-9_-]*");

    private Names() {
    }

    /** {@code parent.key}, or {@code parent['odd key']} for keys that are not plain words. */
    static String child(String parent, String key) {
        if (SIMPLE_KEY.matcher(key).matches()) {
            return parent + "." + key;
        }
        return parent + "['" + key.replace("\\", "\\\\").replace("'", "\\'") + "']";
    }

    /** {@code parent[index]}. */
    static String index(String parent, int index) {
        return parent + "[" + index + "]";
    }

    /**
     * The known name nearest to {@code given}: equal ignoring case, or containing it (or contained
     * in it, 3 characters or more), or within a Levenshtein distance of max(2, length / 3)
     * ignoring case. Empty when nothing is near enough.
     */
    static Optional<String> nearest(String given, Collection<String> known) {
        String g = given.toLowerCase(Locale.ROOT);
        String best = null;
        int bestScore = Integer.MAX_VALUE;
        for (String k : known) {
            String kl = k.toLowerCase(Locale.ROOT);
            int score;
            if (kl.equals(g)) {
                score = 0;
            } else if (g.length() >= 3 && (kl.contains(g) || g.contains(kl) && kl.length() >= 3)) {
                score = 1;
            } else {
                int d = levenshtein(g, kl);
                score = d <= Math.max(2, g.length() / 3) ? 1 + d : Integer.MAX_VALUE;
            }
            if (score < bestScore || score == bestScore && best != null && k.compareTo(best) < 0) {
                bestScore = score;
                best = k;
            }
        }
        return bestScore == Integer.MAX_VALUE ? Optional.empty() : Optional.of(best);
    }

    static int levenshtein(String a, String b) {
        return org.ventcase.common.Strings.editDistance(a, b);
    }

    /** A JSON value shortened for a message. */
    static String shorten(String s) {
        return s.length() <= 80 ? s : s.substring(0, 77) + "...";
    }
}
