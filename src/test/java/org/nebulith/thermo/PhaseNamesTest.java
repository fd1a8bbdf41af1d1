package org.nebulith.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;

class PhaseNamesTest {

    @Test
    void rawIdsOfTheDataFileBecomeMineralNamesOrConventionalFormulas() {
        // mineral names of these compositions: IMA-CNMNC List of Minerals (common practice)
        assertEquals("andalusite", PhaseNames.display("AL2SiO5(an)"));
        assertEquals("troilite", PhaseNames.display("FeS(c)"));
        assertEquals("troilite", PhaseNames.display("FeS(a)"));
        assertEquals("corundum", PhaseNames.display("AL2O3(a)"));
        // no mineral: conventional formula with Al and Cl (common practice)
        assertEquals("NaAlO2", PhaseNames.display("NaALO2(a)"));
        assertEquals("KCl", PhaseNames.display("KCL(cr)"));
        assertEquals("Ti4O7", PhaseNames.display("Ti4O7(cr)"));
        assertEquals("AlCl3", PhaseNames.display("ALCL3(cr)"));
        assertEquals("gibbsite", PhaseNames.display("AL(OH)3(a)"));
        assertEquals("Al2S3", PhaseNames.display("AL2S3(b)"));
    }

    @Test
    void variantsLiquidsGasesAndSolutionsKeepOneReadableName() {
        assertEquals("albite", PhaseNames.display("albite/B88"));
        assertEquals("iron", PhaseNames.display("iron/ds62"));
        assertEquals("iron", PhaseNames.display("Fe(c)"));
        assertEquals("FeS liquid", PhaseNames.display("FeS(L)"));
        assertEquals("Mn metal", PhaseNames.display("Mn(a)"));
        assertEquals("Fe liquid", PhaseNames.display("Fe(L)"));
        assertEquals("AlCl", PhaseNames.display("ALCL"));
        assertEquals("SiO", PhaseNames.display("SiO"));
        assertEquals("olivine", PhaseNames.display("olivine"));
        assertEquals("Ca-Tschermak pyroxene", PhaseNames.display("Ca-Tschermak pyroxene"));
        assertFalse(PhaseNames.isRenamed("forsterite"));
        assertTrue(PhaseNames.isRenamed("Mg2SiO4(cr)"));
    }

    @Test
    void piecesOfOnePhaseAreGroupedInOrderOfFirstAppearance() {
        Map<String, List<String>> g = PhaseNames.group(List.of("FeS(a)", "forsterite", "FeS(b)", "Fe(a)", "FeS(c)"));
        assertEquals(List.of("troilite", "forsterite", "iron"), List.copyOf(g.keySet()));
        assertEquals("FeS(a)+FeS(b)+FeS(c)", PhaseNames.dataIdCell(g.get("troilite")));
    }

    @Test
    void oneDisplayNameNeverCoversTwoCompositions() {
        // compared as atom proportions: ds62 writes enstatite per Mg2Si2O6, NASA per MgSiO3
        Map<String, Map<Element, Double>> byName = new HashMap<>();
        for (Species s : SpeciesDatabase.bundled().species()) {
            Map<Element, Double> shares = proportions(s.formula());
            Map<Element, Double> before = byName.putIfAbsent(PhaseNames.display(s.id()) + "|" + s.state(), shares);
            if (before != null) {
                assertEquals(before.keySet(), shares.keySet(), s.id());
                before.forEach((e, x) -> assertEquals(x, shares.get(e), 1e-12,
                        "display name of " + s.id() + " also used for another composition"));
            }
        }
    }

    private static Map<Element, Double> proportions(Formula f) {
        Map<Element, Double> shares = new HashMap<>();
        f.counts().forEach((e, n) -> shares.put(e, n / f.atoms()));
        return shares;
    }

    @Test
    void noDisplayNameOfACondensedSpeciesKeepsTheDataFileCasingOrStateTag() {
        for (Species s : SpeciesDatabase.bundled().species()) {
            String shown = PhaseNames.display(s.id());
            assertFalse(shown.matches(".*(AL|CL)(?![a-z]).*"), s.id() + " shown as " + shown);
            if (s.isCondensed()) {
                assertFalse(shown.matches(".*\\((cr|a|b|c|d|L|I|II|III|I'|IV|V|an|gr|a-qz|b-qz|b-crt)\\)$"),
                        s.id() + " shown as " + shown);
            }
        }
    }

    @Test
    void everyKeyOfTheNameTableMatchesADataId() throws IOException {
        Set<String> ids = SpeciesDatabase.bundled().species().stream().map(Species::id).collect(Collectors.toSet());
        Set<String> formulas = ids.stream().map(id -> id.replaceFirst("\\([A-Za-z0-9'-]+\\)$", "")).collect(Collectors.toSet());
        try (InputStream in = PhaseNames.class.getResourceAsStream("/org/nebulith/thermo/phase-names.csv")) {
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String key = line.split(",")[0];
                assertTrue(ids.contains(key) || formulas.contains(key), "key without a data id: " + key);
            }
        }
    }
}
