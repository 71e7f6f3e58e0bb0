package org.ventcase.thermo.mix;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.EosVariant;

class KijTableTest {

    @Test
    void everyRowNamesBuiltInComponents() {
        for (KijTable.Entry e : KijTable.builtIn().entries(KijTable.Family.PR)) {
            ComponentLibrary.builtIn().get(e.pair().first());
            ComponentLibrary.builtIn().get(e.pair().second());
            assertTrue(e.source().startsWith("Knapp1982-PR p"), e.toString());
        }
    }

    @Test
    void carbonDioxideMethaneHasThePublishedValue() {
        // Source: Knapp et al., DECHEMA Chemistry Data Series VI (1982), p. 399, PR k_ij for
        // methane/carbon dioxide = 0.0978 (as listed in the ChemSep pr.ipd transcription).
        assertEquals(0.0978, KijTable.builtIn().find("methane", "carbon dioxide", KijTable.Family.PR).orElseThrow().kij(),
                0.0);
    }

    @Test
    void matrixIsSymmetricAndUsesOverridesAndDefaults() {
        List<Component> cs = List.of(ComponentLibrary.builtIn().get("methane"), ComponentLibrary.builtIn().get("carbon dioxide"),
                ComponentLibrary.builtIn().get("ethylene oxide"));
        KijTable.Matrix m = KijTable.builtIn().matrix(cs, EosVariant.PR78,
                Map.of(KijTable.Pair.of("carbon dioxide", "ethylene oxide"), 0.05));
        double[][] k = m.kij();
        assertEquals(k[0][1], k[1][0], 0.0);
        assertEquals(0.0978, k[0][1], 0.0); // Source: as above, p. 399
        assertEquals(0.05, k[1][2], 0.0); // the override itself
        assertEquals(0.0, k[0][2], 0.0); // not in the table: default zero ...
        assertTrue(m.warnings().stream().anyMatch(w -> w.contains("methane, ethylene oxide")), m.warnings().toString());
        assertEquals("case override", m.sources()[1][2]);
    }

    @Test
    void srkHasNoTableYetAndSaysSo() {
        List<Component> cs = List.of(ComponentLibrary.builtIn().get("methane"), ComponentLibrary.builtIn().get("ethane"));
        KijTable.Matrix m = KijTable.builtIn().matrix(cs, EosVariant.SRK);
        assertEquals(0.0, m.kij()[0][1], 0.0);
        assertEquals(1, m.warnings().size());
    }

    @Test
    void rowWithoutSourceIsRejected() {
        String csv = "component_a,component_b,eos,kij,source\nmethane,ethane,PR,0.01,\n";
        assertThrows(InvalidInputException.class, () -> KijTable.parse(new StringReader(csv), "test"));
    }
}
