package org.nebulith.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nebulith.composition.SolarReference;
import org.nebulith.thermo.Element;

/** Catalogue input: the demo catalogue, and one clear line per bad-input problem. */
class CatalogueReaderTest {

    @TempDir
    Path dir;

    private static final SurveySettings SETTINGS = new SurveySettings(10, 1, SolarReference.ASPLUND2009, null, null);

    @Test
    void demoCatalogueHasTwentyInventedStarsSomeLackingElements() throws IOException {
        List<StarRow> rows = SurveyTestData.demoRows();
        assertEquals(20, rows.size());
        assertTrue(rows.stream().anyMatch(r -> !r.abundances().containsKey(Element.Al)));
        assertTrue(rows.stream().allMatch(r -> r.abundances().get(Element.Fe).dex() >= -0.5
                && r.abundances().get(Element.Fe).dex() <= 0.4));
        assertTrue(rows.stream().flatMap(r -> r.abundances().values().stream())
                .allMatch(m -> m.error() >= 0.02 && m.error() <= 0.1));
        assertTrue(Files.readString(SurveyTestData.DEMO).contains("INVENTED"));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        // header, row, expected line, expected field, expected words
        "star,Fe_H,Fe_H_err,Zz_H,Zz_H_err|A,0.1,0.05,0.1,0.05|1|Zz_H|unknown element 'Zz'",
        "star,Fe_H,Fe_H_err,Xy|A,0.1,0.05,3|1|Xy|unknown column",
        "Fe_H,Fe_H_err|0.1,0.05|1|star|no star column",
        "star,Fe_H,Fe_H_err,Mg_H_err|A,0.1,0.05,0.05|1|Mg_H_err|an error column without a value column",
        "star,Fe_H,Fe_H_err,Mg_H,Mg_H_err|A,0.1,0.05,,0.05|2|Mg_H|an error without a value",
        "star,Fe_H,Fe_H_err,Mg_H,Mg_H_err|A,0.1,0.05,0.1,|2|Mg_H_err|a value without an error",
        "star,Fe_H,Fe_H_err,Mg_H,Mg_H_err|A,0.1,0.05,high,0.05|2|Mg_H|value \"high\"",
        "star,Fe_H,Fe_H_err,Mg_H,Mg_H_err|A,0.1,0.05,0.1,-0.05|2|Mg_H_err|negative value",
        "star,Fe_H,Fe_H_err,Mg_H,Mg_H_err|A,0.1,0.05,NaN,0.05|2|Mg_H|out of range",
        "star,Fe_H,Fe_H_err,Mg_H,Mg_H_err|A,0.1,0.05,7.6,0.05|2|Mg_H|out of range",
        "star,Fe_H,Fe_H_err|A,,|2|Fe_H|no [Fe/H] value",
        "star,Fe_H,Fe_H_err|A,0.1|2|(row)|2 cells for 3 columns",
        "star,Fe_H,Fe_H_err,err_corr|A,0.1,0.05,1.5|2|err_corr|out of range",
        "star,Fe_H,Fe_H_err,H_H,H_H_err|A,0.1,0.05,0,0|1|H_H|not accepted",
    })
    void badInputGivesOneLineWithRowAndColumn(String header, String row, long line, String field, String words)
            throws IOException {
        Path file = dir.resolve("bad.csv");
        Files.writeString(file, header + "\n" + row + "\n");
        CatalogueCheck check = CatalogueCheck.run(file, SETTINGS, new EstimatorCache(s -> new FullyCondensedEstimator()));
        assertFalse(check.problems().isEmpty());
        CatalogueProblem p = check.problems().get(0);
        String text = p.text("bad.csv");
        assertEquals(line, p.line(), text);
        assertEquals(field, p.column(), text);
        assertTrue(text.contains(words), text);
        assertTrue(text.startsWith("bad.csv: line " + line + ": field \"" + field + "\": "), text);
        assertTrue(text.contains("; accepted: "), text);
        assertFalse(text.contains("\n"), text);
    }

    @Test
    void duplicateStarsAndCommentsKeepTrueLineNumbers() throws IOException {
        Path file = dir.resolve("dup.csv");
        Files.writeString(file, "# invented\nstar,Fe_H,Fe_H_err\n\nA,0.1,0.05\nB,0.0,0.05\n# note\nA,0.2,0.05\n");
        CatalogueCheck check = CatalogueCheck.run(file, SETTINGS, new EstimatorCache(s -> new FullyCondensedEstimator()));
        assertEquals(1, check.problems().size());
        assertEquals(7, check.problems().get(0).line());
        assertTrue(check.problems().get(0).text("dup.csv").contains("duplicate star (first at line 4)"));
        assertEquals(2, check.goodRows());
        assertTrue(check.skippable());
    }

    @Test
    void everyProblemOfARowIsListed() throws IOException {
        Path file = dir.resolve("many.csv");
        Files.writeString(file, "star,Fe_H,Fe_H_err,Mg_H,Mg_H_err\nA,x,0.05,0.1,-1\n");
        CatalogueCheck check = CatalogueCheck.run(file, SETTINGS, new EstimatorCache(s -> new FullyCondensedEstimator()));
        assertEquals(List.of("Fe_H", "Mg_H_err"), check.problems().stream().map(CatalogueProblem::column).toList());
    }
}
