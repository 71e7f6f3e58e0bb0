package org.ventcase.thermo;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

import org.ventcase.common.InvalidInputException;

/**
 * Components with their mole fractions. Immutable; arrays are copied in and out. Fractions lie in
 * [0, 1] and sum to 1 within {@link #SUM_TOLERANCE}; they are stored normalised. A zero fraction is
 * allowed (a component listed for another phase, e.g. nitrogen in a liquid's list when the vapour
 * space holds it); a component may appear only once.
 *
 * @param components the components, in order
 * @param fractions  mole fractions, same order
 */
public record Composition(List<Component> components, double[] fractions) {

    /** Largest accepted deviation of the sum of mole fractions from 1. */
    public static final double SUM_TOLERANCE = 1e-6;

    public Composition {
        if (components == null || components.isEmpty()) {
            throw InvalidInputException.missing("composition", "expected at least one component");
        }
        components = List.copyOf(components);
        if (fractions == null || fractions.length != components.size()) {
            throw InvalidInputException.invalid("composition", fractions == null ? "missing" : fractions.length + " fractions",
                    "expected " + components.size() + " mole fractions, one per component");
        }
        Set<String> seen = new HashSet<>();
        double sum = 0;
        for (int i = 0; i < fractions.length; i++) {
            if (!seen.add(components.get(i).name())) {
                throw InvalidInputException.invalid("composition[" + i + "]", components.get(i).name(),
                        "each component may appear only once");
            }
            InvalidInputException.requireInRange("composition[" + i + "]", fractions[i], 0, 1, "");
            sum += fractions[i];
        }
        if (!(Math.abs(sum - 1.0) <= SUM_TOLERANCE)) {
            throw InvalidInputException.invalid("composition", String.format(Locale.US, "sum %.9g", sum),
                    "mole fractions must sum to 1 within 1e-6");
        }
        double[] x = new double[fractions.length];
        for (int i = 0; i < x.length; i++) {
            x[i] = fractions[i] / sum;
        }
        fractions = x;
    }

    /** A pure component. */
    public static Composition pure(Component c) {
        return new Composition(List.of(c), new double[] {1.0});
    }

    @Override
    public double[] fractions() {
        return fractions.clone();
    }

    /** Mole fraction of component i. */
    public double fraction(int i) {
        return fractions[i];
    }

    public int size() {
        return components.size();
    }

    /** Component names, in order. */
    public List<String> names() {
        return components.stream().map(Component::name).toList();
    }

    /** Name -> mole fraction, in order. */
    public Map<String, Double> asMap() {
        Map<String, Double> m = new LinkedHashMap<>();
        for (int i = 0; i < fractions.length; i++) {
            m.put(components.get(i).name(), fractions[i]);
        }
        return m;
    }

    /** Indices of the components with a non-zero fraction. */
    public int[] present() {
        int k = 0;
        for (double f : fractions) {
            if (f > 0) {
                k++;
            }
        }
        int[] out = new int[k];
        k = 0;
        for (int i = 0; i < fractions.length; i++) {
            if (fractions[i] > 0) {
                out[k++] = i;
            }
        }
        return out;
    }

    /** Molar mass of the mixture, kg/kmol. */
    public double molarMass() {
        double m = 0;
        for (int i = 0; i < fractions.length; i++) {
            m += fractions[i] * components.get(i).molarMass();
        }
        return m;
    }

    /** Kay's-rule pseudo-critical temperature sum x_i Tc_i, K (a screening figure only). */
    public double pseudoCriticalTemperatureK() {
        double t = 0;
        for (int i = 0; i < fractions.length; i++) {
            t += fractions[i] * components.get(i).tcK();
        }
        return t;
    }

    /** Kay's-rule pseudo-critical pressure sum x_i Pc_i, Pa (a screening figure only). */
    public double pseudoCriticalPressurePa() {
        double p = 0;
        for (int i = 0; i < fractions.length; i++) {
            p += fractions[i] * components.get(i).pcPa();
        }
        return p;
    }

    /**
     * This composition over a longer component list that contains every component of this one
     * (matched by name); components not in this composition get zero.
     *
     * @param field field path used when a component is missing from {@code list}
     */
    public Composition over(String field, List<Component> list) {
        double[] x = new double[list.size()];
        for (int i = 0; i < components.size(); i++) {
            String n = components.get(i).name();
            int j = indexOf(list, n);
            if (j < 0) {
                throw InvalidInputException.invalid(field + "[" + i + "]", n,
                        "expected one of the fluid's components: " + String.join(", ",
                                list.stream().map(Component::name).toList()));
            }
            x[j] = fractions[i];
        }
        return new Composition(list, x);
    }

    /** The components of {@code a} followed by those of {@code b} not in {@code a}. */
    public static List<Component> union(Composition a, Composition b) {
        List<Component> out = new ArrayList<>(a.components());
        for (Component c : b.components()) {
            if (indexOf(out, c.name()) < 0) {
                out.add(c);
            }
        }
        return List.copyOf(out);
    }

    private static int indexOf(List<Component> list, String name) {
        for (int i = 0; i < list.size(); i++) {
            if (list.get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Composition c && components.equals(c.components)
                && java.util.Arrays.equals(fractions, c.fractions);
    }

    @Override
    public int hashCode() {
        return 31 * components.hashCode() + java.util.Arrays.hashCode(fractions);
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < fractions.length; i++) {
            sb.append(i == 0 ? "" : ",").append(components.get(i).name()).append(':')
                    .append(String.format(Locale.US, "%.6g", fractions[i]));
        }
        return sb.toString();
    }
}
