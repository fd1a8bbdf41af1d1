package org.nebulith.zones;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStreamReader;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.nebulith.disk.DiskModel;
import org.nebulith.disk.DiskPresets;
import org.nebulith.disk.PowerLawDisk;
import org.nebulith.errors.InputException;

class ZoneFileReaderTest {
    private static final String H = "zone,shape,r_center_AU,half_width_AU\n";
    private final DiskModel mmsn = PowerLawDisk.mmsnHayashi1981();

    private String failure(String text) {
        return assertThrows(InputException.class,
                () -> ZoneFileReader.read(new StringReader(text), "z.csv", mmsn)).getMessage();
    }

    @Test
    void readsTheDemoSystemFromTheClasspath() throws Exception {
        DiskModel disk = DiskPresets.preset(DiskPresets.STEADY_VISCOUS_DEFAULT);
        List<FeedingZone> zones = ZoneFileReader.read(new InputStreamReader(
                getClass().getResourceAsStream("/feeding-zones/demo-system.csv"), StandardCharsets.UTF_8),
                "demo-system.csv", disk);
        assertEquals(3, zones.size());
        assertEquals(KernelShape.GAUSSIAN, zones.get(0).shape());
        assertEquals(1.4, zones.get(1).planetMassMearth().getAsDouble());
    }

    @Test
    void kernelWeights() {
        FeedingZone t = new FeedingZone("t", KernelShape.TOPHAT, 1, 0.2, java.util.OptionalDouble.empty());
        assertEquals(1.0, t.weight(1.2));
        assertEquals(0.0, t.weight(1.2000001));
        FeedingZone g = new FeedingZone("g", KernelShape.GAUSSIAN, 1, 0.2, java.util.OptionalDouble.empty());
        assertEquals(Math.exp(-0.5), g.weight(1.2), 1e-15);
        assertEquals(0.0, g.weight(1.61));
    }

    @Test
    void badZoneFilesNameFileLineAndField() {
        assertTrue(failure("zone,shape,r_center_AU\nb,tophat,1\n").startsWith("z.csv: line 1: field \"header\""));
        assertTrue(failure(H + "b,square,1,0.1\n").startsWith("z.csv: line 2: field \"shape\""));
        assertTrue(failure(H + "b,tophat,1,-0.1\n").startsWith("z.csv: line 2: field \"half_width_AU\""));
        assertTrue(failure(H + "b,tophat,1,0.1\nc,tophat,0.8,0.1\n").startsWith("z.csv: line 3: field \"r_center_AU\""));
        assertTrue(failure(H + "b,tophat,39,2\n").contains("inside the disk's range"));
        assertTrue(failure(H + "b,gaussian,0.3,0.1\n").contains("kernel reaches r <= 0"));
        assertTrue(failure(H + "b,tophat,1,0.1\nb,tophat,2,0.1\n").contains("repeated"));
        assertTrue(failure(H + "b,tophat,1\n").startsWith("z.csv: line 2: field \"row\""));
        assertTrue(failure(H + "b,tophat,x,0.1\n").startsWith("z.csv: line 2: field \"r_center_AU\""));
        assertTrue(failure(H).contains("no zones"));
        String m = failure("zone,shape,r_center_AU,half_width_AU,colour\nb,tophat,1,0.1,red\n");
        assertTrue(m.contains("planet_mass_Mearth") && !m.contains("\n"), m);
    }
}
