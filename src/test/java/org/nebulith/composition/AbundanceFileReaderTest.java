package org.nebulith.composition;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;

import org.junit.jupiter.api.Test;
import org.nebulith.errors.InputException;
import org.nebulith.thermo.Element;

class AbundanceFileReaderTest {

    private static AbundanceSet read(String text) throws Exception {
        return AbundanceFileReader.read(new StringReader(text), "test.csv");
    }

    private static String failure(String text) {
        return assertThrows(InputException.class, () -> read(text)).getMessage();
    }

    @Test
    void readsUnitsAndProvenance() throws Exception {
        AbundanceSet s = read("# my table\n# second line\nelement,value,unit\nMg,50,wt_pct\nSi,50,wt_pct\n");
        assertEquals(2, s.provenance().size());
        assertEquals(50 / 24.305, s.abundances().moles(Element.Mg), 1e-15);
        AbundanceSet l = read("element,value,unit\nH,12,log_eps\nFe,7.5,log_eps\n");
        assertEquals(7.5, l.abundances().logEps(Element.Fe), 1e-12);
    }

    @Test
    void badFilesGiveOneLineNamingFileLineAndField() {
        String m = failure("element,val,unit\nH,1,mol\n");
        assertTrue(m.startsWith("test.csv: line 1: field \"header\""), m);
        m = failure("element,value,unit\nH,1,mol\nQq,2,mol\n");
        assertTrue(m.startsWith("test.csv: line 3: field \"element\"") && m.contains("Qq"), m);
        m = failure("element,value,unit\nH,1,mol\nO,abc,mol\n");
        assertTrue(m.startsWith("test.csv: line 3: field \"value\""), m);
        m = failure("element,value,unit\nH,1,mol\nO,2,log_eps\n");
        assertTrue(m.startsWith("test.csv: line 3: field \"unit\""), m);
        m = failure("element,value,unit\nH,1,mol\nH,2,mol\n");
        assertTrue(m.contains("twice"), m);
        m = failure("element,value,unit\nH,-1,mol\n");
        assertTrue(m.startsWith("test.csv: line 2: field \"value\""), m);
        m = failure("element,value,unit\nH,1,parsecs\n");
        assertTrue(m.contains("log_eps"), m);
        m = failure("# only comments\n");
        assertTrue(m.contains("no data rows"), m);
        assertTrue(!m.contains("\n"));
    }
}
