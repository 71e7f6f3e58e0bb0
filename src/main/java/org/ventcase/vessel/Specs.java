package org.ventcase.vessel;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.ventcase.common.InvalidInputException;
import org.ventcase.units.Dimension;
import org.ventcase.units.Units;

/**
 * Parses the text forms of heads and levels that people type on the command line and in case
 * files, so that every front end reads them the same way.
 *
 * <p>Heads: {@code 2:1} (2:1 ellipsoidal), {@code ellipsoidal:DEPTH} (e.g.
 * {@code ellipsoidal:0.8 m}), {@code hemispherical}, {@code flanged-dished} (ASME F&amp;D:
 * crown = D, knuckle = 0.06 D), {@code 80/10} (crown 0.8 D, knuckle 0.1 D),
 * {@code torispherical:CROWN,KNUCKLE} (e.g. {@code torispherical:3 m,0.3 m}), {@code conical:ANGLE}
 * (half-angle, e.g. {@code conical:30 deg}), {@code flat}.
 *
 * <p>Levels: a length ({@code 2.1 m}), a percentage of height ({@code 65 %} or {@code 65 %h}) or
 * a percentage of volume ({@code 70 %v}).
 */
public final class Specs {

    private Specs() {
    }

    /** The head forms accepted, for help and messages. */
    public static final String HEAD_FORMS =
            "2:1, ellipsoidal:DEPTH, hemispherical, flanged-dished, 80/10, torispherical:CROWN,KNUCKLE, conical:HALF-ANGLE, flat";

    /** Parses a head for a vessel of the given inside diameter. */
    public static Head head(String field, String text, double diameter) {
        if (text == null || text.isBlank()) {
            throw InvalidInputException.missing(field, "expected one of " + HEAD_FORMS);
        }
        String t = text.trim().toLowerCase(Locale.ROOT);
        String kind = t;
        String arg = "";
        int colon = t.indexOf(':');
        if (colon > 0 && !t.equals("2:1") && !t.startsWith("ellipsoidal-2:1")) {
            kind = t.substring(0, colon).trim();
            arg = t.substring(colon + 1).trim();
        }
        try {
            switch (kind) {
                case "2:1":
                case "ellipsoidal-2:1":
                case "semi-elliptical":
                    return Head.ellipsoidal2to1(diameter);
                case "ellipsoidal":
                    return Head.ellipsoidal(Units.parse(field + " depth", arg, Dimension.LENGTH));
                case "hemispherical":
                case "hemi":
                    return Head.hemispherical();
                case "flanged-dished":
                case "f&d":
                case "asme-fd":
                    return Head.asmeFlangedAndDished(diameter);
                case "80/10":
                case "80-10":
                    return Head.torispherical80_10(diameter);
                case "torispherical": {
                    String[] parts = arg.split(",");
                    if (parts.length != 2) {
                        throw InvalidInputException.invalid(field, text,
                                "expected torispherical:CROWN,KNUCKLE, e.g. 'torispherical:3 m,0.3 m'");
                    }
                    return Head.torispherical(Units.parse(field + " crown radius", parts[0], Dimension.LENGTH),
                            Units.parse(field + " knuckle radius", parts[1], Dimension.LENGTH));
                }
                case "conical":
                    return Head.conical(Units.parse(field + " half-angle", arg, Dimension.ANGLE));
                case "flat":
                    return Head.flat();
                default:
                    throw InvalidInputException.invalid(field, text, "expected one of " + HEAD_FORMS);
            }
        } catch (InvalidInputException e) {
            if (e.field().startsWith(field)) {
                throw e;
            }
            throw new InvalidInputException(field, text, e.getMessage());
        }
    }

    private static final Pattern PERCENT = Pattern.compile(
            "^\\s*([-+]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*%\\s*(h|v|vol|height|volume)?\\s*$", Pattern.CASE_INSENSITIVE);

    /** Parses a liquid level: a length, "65 %" or "65 %h" (of height), or "70 %v" (of volume). */
    public static Level level(String field, String text) {
        if (text != null) {
            Matcher m = PERCENT.matcher(text);
            if (m.matches()) {
                double v = Double.parseDouble(m.group(1));
                String basis = m.group(2) == null ? "h" : m.group(2).toLowerCase(Locale.ROOT);
                if (!(v >= 0 && v <= 100)) {
                    throw InvalidInputException.outOfRange(field, v, 0, 100, "%");
                }
                return basis.startsWith("v") ? Level.ofPercentOfVolume(v) : Level.ofPercentOfHeight(v);
            }
        }
        try {
            return Level.ofHeight(Units.parse(field, text, Dimension.LENGTH));
        } catch (InvalidInputException e) {
            throw new InvalidInputException(field, text,
                    "expected a height ('2.1 m'), a percentage of height ('65 %' or '65 %h') or of volume ('70 %v')");
        }
    }
}
