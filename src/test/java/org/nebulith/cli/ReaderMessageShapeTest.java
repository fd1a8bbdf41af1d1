package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.nebulith.composition.AbundanceFileReader;
import org.nebulith.composition.SolarReference;
import org.nebulith.condensation.PressurePathReader;
import org.nebulith.disk.DiskParameterReader;
import org.nebulith.disk.DiskPresets;
import org.nebulith.disk.TabulatedDiskReader;
import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;
import org.nebulith.measured.PlanetsFileReader;
import org.nebulith.survey.CatalogueCheck;
import org.nebulith.survey.EstimatorCache;
import org.nebulith.survey.FullyCondensedEstimator;
import org.nebulith.survey.SurveySettings;
import org.nebulith.thermo.DataSet;
import org.nebulith.thermo.SpeciesDatabase;
import org.nebulith.thermo.SpeciesListReader;
import org.nebulith.thermo.audit.AcceptedFindings;
import org.nebulith.thermo.source.Corrections;
import org.nebulith.zones.ZoneFileReader;

/**
 * Every reader of a user file reports a malformed line in the one shape
 * {@code file: line N: field "F": value "V": what is wrong; accepted: ...}, on one line, with the
 * value cut to 80 characters (its full length noted).
 */
class ReaderMessageShapeTest {

    private static final Pattern SHAPE = Pattern.compile(
            "^bad\\.csv: line (\\d+): field \"([^\"]+)\": value \"([^\"\\n]*)\": [^\\n]+; accepted: [^\\n]+$");
    private static final String LONG = "x".repeat(120);

    @TempDir
    Path dir;

    /** A reader fed a text named {@code bad.csv}; returns the one-line message it gave. */
    interface Reader {
        String message(String text, Path dir) throws IOException;
    }

    static Stream<Arguments> readers() {
        return Stream.of(
                Arguments.of("species file", (Reader) (t, d) -> thrown(() -> SpeciesDatabase.load("bad.csv",
                        () -> new java.io.ByteArrayInputStream(t.getBytes(StandardCharsets.UTF_8)))),
                        "# source MINE: my lab\nid,state,formula,source,source_row,role,variant,form,"
                                + "T_min_K,T_max_K,params\nmine,solid,Mg:1 O:1,MINE,t,primary,,hp,"
                                + LONG + ",,a=1;b=0;c=0;d=0;H0=-6e5;S0=27;V0=1.1\n",
                        3, "T_min_K"),
                Arguments.of("species list", (Reader) (t, d) -> thrown(() -> SpeciesListReader.read(
                        new StringReader(t), "bad.csv", DataSet.named(DataSet.DEFAULT), true)),
                        "# gases\nH2\n" + LONG + "\n", 3, "species id"),
                Arguments.of("abundance file", (Reader) (t, d) -> thrown(() -> AbundanceFileReader.read(
                        new StringReader(t), "bad.csv")), "element,value,unit\nH,1,mol\nO," + LONG + ",mol\n",
                        3, "value"),
                Arguments.of("disk parameters", (Reader) (t, d) -> thrown(() -> DiskParameterReader.read(
                        new StringReader(t), "bad.csv")), "parameter,value\nmodel,power-law\nT1_K," + LONG + "\n",
                        3, "T1_K"),
                Arguments.of("disk table", (Reader) (t, d) -> thrown(() -> TabulatedDiskReader.read(
                        new StringReader(t), "bad.csv")),
                        TabulatedDiskReader.HEADER + "\n1,300,1e-5,100\n2," + LONG + ",1e-6,50\n", 3, "T_K"),
                Arguments.of("disk file of either kind", (Reader) (t, d) -> thrown(() -> DiskPresets.read(
                        new StringReader(t), "bad.csv")), "# a disk\n" + LONG + "\n", 2, "header"),
                Arguments.of("zone file", (Reader) (t, d) -> thrown(() -> ZoneFileReader.read(new StringReader(t),
                        "bad.csv", DiskPresets.preset(DiskPresets.MMSN_HAYASHI1981))),
                        "zone,shape,r_center_AU,half_width_AU\nb,tophat,1,0.1\nc," + LONG + ",2,0.1\n", 3, "shape"),
                Arguments.of("pressure path", (Reader) (t, d) -> thrown(() -> PressurePathReader.read(
                        new StringReader(t), "bad.csv")), PressurePathReader.HEADER + "\n1500,1e-4\n" + LONG + ",1e-4\n",
                        3, "T_K"),
                Arguments.of("preset file", (Reader) (t, d) -> thrown(() -> PresetFile.parse(Path.of("bad.csv"),
                        new StringReader(t))), "# settings\nT-K = 1500\nT-K = " + LONG + "\n", 3, "T-K"),
                Arguments.of("measured planets", (Reader) (t, d) -> thrown(() -> PlanetsFileReader.read(
                        new StringReader(t), "bad.csv")), PlanetsFileReader.HEADER + "\nb,NDC Alder," + LONG
                        + ",0.1,1,0.05\n", 2, "mass_Mearth"),
                Arguments.of("data corrections", (Reader) (t, d) -> thrown(() -> Corrections.read(new StringReader(t),
                        "bad.csv")), "species,field,file_value,corrected_value,source,reason\nSiO," + LONG
                        + ",1,2,a source,a reason\n", 2, "field"),
                Arguments.of("accepted audit findings", (Reader) (t, d) -> thrown(() -> AcceptedFindings.read(
                        new StringReader(t), "bad.csv")), "check,subject,max_value,reason\njump,SiO," + LONG
                        + ",a reason\n", 2, "max_value"),
                Arguments.of("star catalogue", (Reader) ReaderMessageShapeTest::catalogue,
                        "star,Fe_H,Fe_H_err,Mg_H,Mg_H_err\nA,0.1,0.05,0.1,0.05\nB,0.1,0.05," + LONG + ",0.05\n",
                        3, "Mg_H"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("readers")
    void malformedLineGivesTheOneShape(String what, Reader reader, String text, int line, String field)
            throws IOException {
        String message = reader.message(text, dir);
        Matcher m = SHAPE.matcher(message);
        assertTrue(m.matches(), what + ": " + message);
        assertEquals(line, Integer.parseInt(m.group(1)), message);
        assertEquals(field, m.group(2), message);
        assertTrue(m.group(3).startsWith("x".repeat(InputException.VALUE_SHOWN) + "... ("), "the long value, cut: "
                + message);
    }

    private static String thrown(org.junit.jupiter.api.function.Executable read) {
        InputException e = assertThrows(InputException.class, read);
        assertEquals(Messages.BAD_INPUT_FIELD, e.key(), e.getMessage());
        return e.getMessage();
    }

    private static String catalogue(String text, Path dir) throws IOException {
        Path file = Files.writeString(dir.resolve("bad.csv"), text);
        CatalogueCheck check = CatalogueCheck.run(file, new SurveySettings(10, 1, SolarReference.ASPLUND2009, null,
                null), new EstimatorCache(s -> new FullyCondensedEstimator()));
        List<String> texts = check.problems().stream().map(p -> p.text("bad.csv")).toList();
        assertEquals(1, texts.size(), texts.toString());
        return texts.get(0);
    }
}
