package org.ventcase.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.ventcase.casefile.Templates;
import org.ventcase.relief.FireLoadCurve;
import org.ventcase.report.DisplayUnits.Kind;
import org.ventcase.report.SheetModel.Row;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Vessel;

/**
 * Turns calculation results into a {@link SheetModel}. Every number is a field of the result (or
 * of the domain's {@link FireLoadCurve}); this class only chooses what to print and formats it
 * through {@link DisplayUnits}.
 */
public final class SheetModels {

    private SheetModels() {
    }

    /**
     * The sheet of a whole case: every scenario of {@code result} (computed from {@code input} by
     * {@code calc.CaseCalculation.run}), with the title block, revision row and sign-off of
     * {@code id} (the case file's identity, the tool's name and version, the input hash). Inputs,
     * inventory by phase and component, relieving conditions, relieved-fluid properties, loads with
     * the governing scenario marked, areas and orifices, warnings, the vessel sketch, the
     * load-against-level curve of each wetted fire, the phase envelope of a mixture and the load over
     * time of boil-off and near-critical scenarios; the method of each scenario with its statement
     * and trace.
     */
    public static SheetModel from(org.ventcase.calc.CaseResult result, org.ventcase.calc.CaseInput input,
                                  SheetIdentity id, UnitSystem units) {
        return new CaseSheet(result, input, id, units).model();
    }

    /** The rows that describe a vessel's inside geometry, shared by every sheet that shows a vessel. */
    static List<Row> vesselGeometryRows(Vessel v, DisplayUnits u) {
        List<Row> vessel = new ArrayList<>();
        vessel.add(Row.of("Arrangement", v.describe(u.words())));
        vessel.add(Row.of("Inside diameter", u.plain(Kind.LENGTH, v.diameter())));
        if (v.shape() != Vessel.Shape.SPHERE) {
            vessel.add(Row.of("Tangent-to-tangent length", u.plain(Kind.LENGTH, v.tangentLength())));
            vessel.add(Row.of(v.shape() == Vessel.Shape.HORIZONTAL_CYLINDER ? "Head depths (left / right)"
                    : "Head depths (bottom / top)", u.plain(Kind.LENGTH, v.firstHeadDepth()) + " / "
                    + u.plain(Kind.LENGTH, v.secondHeadDepth())));
        }
        vessel.add(Row.of("Inside height", u.plain(Kind.LENGTH, v.totalHeight())));
        return vessel;
    }

    static String levelText(Level level, DisplayUnits u) {
        switch (level.basis()) {
            case HEIGHT_M:
                return u.plain(Kind.LENGTH, level.value()) + " above the lowest inside point";
            case PERCENT_OF_HEIGHT:
                return String.format(Locale.ROOT, "%.1f %% of the inside height", level.value());
            default:
                return String.format(Locale.ROOT, "%.1f %% of the inside volume", level.value());
        }
    }

    // ------------------------------------------------------------------------------ text blocks

    static String block(String name) {
        return Templates.text(name).orElseThrow(() -> new IllegalStateException("missing text block " + name));
    }

    /** Paragraphs of a text block: separated by blank lines, lines inside a paragraph joined. */
    static List<String> paragraphs(String text) {
        List<String> out = new ArrayList<>();
        for (String p : text.strip().split("\\n\\s*\\n")) {
            String joined = p.strip().replaceAll("\\s*\\n\\s*", " ");
            if (!joined.isEmpty()) {
                out.add(joined);
            }
        }
        return out;
    }

    static String fill(String text, SheetIdentity id) {
        return text.replace("{tag}", id.tag()).replace("{title}", id.title()).replace("{revision}", id.revision())
                .replace("{ventcaseVersion}", id.toolVersion()).replace("{inputHash}", id.inputHash());
    }
}
