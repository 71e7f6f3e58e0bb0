package org.ventcase.thermo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;

/** The "name:fraction,..." composition form and the Composition record's checks. */
class CompositionsTest {

    @Test
    void readsNamesAndFractionsInOrder() {
        Composition c = Compositions.parse("--fluid", " propane : 0.95 , n-butane:0.05 ", false);
        assertEquals(List.of("propane", "n-butane"), c.names());
        // Hand calculation: the fractions as typed (their sum is exactly 1).
        assertArrayEquals(new double[] {0.95, 0.05}, c.fractions(), 1e-15);
    }

    @Test
    void aBareNameIsAPureFluidEvenWithACommaInIt() {
        assertEquals(List.of("propane"), Compositions.parse("--fluid", "propane", false).names());
        assertEquals(List.of("1,3-butadiene"), Compositions.parse("--fluid", "1,3-butadiene", false).names());
        Composition c = Compositions.parse("--fluid", "1,3-butadiene:0.5,propane:0.5", false);
        assertEquals(List.of("1,3-butadiene", "propane"), c.names());
    }

    @Test
    void aSumOffByMoreThanOnePartPerMillionIsRefusedWithItsSum() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> Compositions.parse("--fluid", "propane:0.95,n-butane:0.06", false));
        assertEquals("--fluid", e.field());
        assertTrue(e.getMessage().contains("sum to 1.01"), e.getMessage());
        // Within 1e-6: accepted and normalised.
        Composition ok = Compositions.parse("--fluid", "propane:0.9500005,n-butane:0.05", false);
        assertEquals(1.0, ok.fraction(0) + ok.fraction(1), 1e-15);
    }

    @Test
    void normalisationDividesBySum() {
        Composition c = Compositions.parse("--fluid", "propane:95,n-butane:5", true);
        // Hand calculation: 95/100 and 5/100.
        assertArrayEquals(new double[] {0.95, 0.05}, c.fractions(), 1e-15);
    }

    @Test
    void malformedEntriesNameTheirPosition() {
        record Case(String text, String field) {
        }
        for (Case k : List.of(new Case("propane:0.5,nosuchthing:0.5", "--fluid[1]"),
                new Case("propane:0.5,propane:0.5", "--fluid[1]"),
                new Case("propane:abc", "--fluid[0]"),
                new Case("propane:0,n-butane:1", "--fluid[0]"),
                new Case("propane:1.5,n-butane:-0.5", "--fluid[0]"),
                new Case("propane:0.5,n-butane", "--fluid"),
                new Case("", "--fluid"))) {
            InvalidInputException e = assertThrows(InvalidInputException.class,
                    () -> Compositions.parse("--fluid", k.text(), false), k.text());
            assertEquals(k.field(), e.field(), k.text() + " -> " + e.getMessage());
        }
    }

    @Test
    void overAndUnionKeepTheFractionsOfEachComponent() {
        Composition liquid = Compositions.parse("f", "propane:0.95,n-butane:0.05", false);
        Composition vapour = Compositions.parse("v", "nitrogen:0.9,propane:0.1", false);
        List<Component> all = Composition.union(liquid, vapour);
        assertEquals(List.of("propane", "n-butane", "nitrogen"), all.stream().map(Component::name).toList());
        Composition v = vapour.over("v", all);
        // Hand calculation: the same fractions placed at the union's positions, zero for n-butane.
        assertArrayEquals(new double[] {0.1, 0.0, 0.9}, v.fractions(), 1e-15);
        assertEquals(1, Composition.pure(all.get(0)).present().length);
        assertThrows(InvalidInputException.class, () -> v.over("v", liquid.components()));
    }
}
