package org.ventcase.vessel;

import java.util.function.DoubleFunction;

/**
 * How the vessel's descriptions and rule texts write a length and an area: SI by default (six
 * significant digits, "3.2 m", "12.5 m2"); the report layer passes the user's unit system. Kept in
 * the domain so that the words are written once, whatever the units.
 *
 * @param length a length in metres as text with its unit
 * @param area   an area in square metres as text with its unit
 */
public record Words(DoubleFunction<String> length, DoubleFunction<String> area) {

    /** Metres and square metres. */
    public static final Words SI = new Words(m -> Fmt.g(m) + " m", a -> Fmt.g(a) + " m2");

    String m(double metres) {
        return length.apply(metres);
    }

    String m2(double squareMetres) {
        return area.apply(squareMetres);
    }
}
