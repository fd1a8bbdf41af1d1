package org.nebulith.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.nebulith.thermo.Formula;

/** Formulas as mineralogists write them (common practice) and phase names as readers see them. */
class FormulaTextTest {

    @Test
    void mineralFormulasInConventionalOrder() {
        assertEquals("CaMgSi2O6", FormulaText.conventional(Formula.parse("O:6 Mg:1 Si:2 Ca:1")));
        assertEquals("Mg2SiO4", FormulaText.conventional(Formula.parse("Mg:2 Si:1 O:4")));
        assertEquals("CaAl12O19", FormulaText.conventional(Formula.parse("O:19 Al:12 Ca:1")));
        assertEquals("FeS", FormulaText.conventional(Formula.parse("S:1 Fe:1")));
        assertEquals("H2O", FormulaText.conventional(Formula.parse("O:1 H:2")));
        assertEquals("NaAlSi3O8", FormulaText.conventional(Formula.parse("Na:1 Al:1 Si:3 O:8")));
    }

    @Test
    void polymorphsShareOneName() {
        assertEquals("troilite", PhaseLabels.display("FeS(a)"));
        assertEquals(PhaseLabels.display("FeS(b)"), PhaseLabels.display("FeS(c)"));
        assertEquals("olivine", PhaseLabels.display("olivine"));
    }
}
