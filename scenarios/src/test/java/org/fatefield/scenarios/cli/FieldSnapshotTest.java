package org.fatefield.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import javax.xml.parsers.DocumentBuilderFactory;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.hipparchus.special.Erf;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

/**
 * The field snapshots of {@code run --snapshots --vtk} against the exact transient of a
 * flux-fed gradient: a constant inflow J at x = 0 into a medium of diffusivity D, without decay,
 * initially empty, gives {@code c(x, t) = (2J/D) [sqrt(D t / pi) exp(-x^2 / 4Dt) - (x/2)
 * erfc(x / (2 sqrt(D t)))]} (Carslaw and Jaeger 1959, Conduction of Heat in Solids, section
 * 2.9). The tissue is 40 diffusion lengths long, so its far wall does not matter; the CSV table
 * must match within 1% of c(0, t), and the VTK image data must hold the same numbers.
 */
class FieldSnapshotTest {

    private static final double D = 100;
    private static final double J = 5;

    @TempDir
    Path tmp;

    @Test
    void fieldTableFollowsTheFluxTransientAndTheVtkFileHoldsTheSameValues() throws Exception {
        Path scenario = tmp.resolve("flux.toml");
        Files.writeString(scenario, String.join("\n",
                "[scenario]", "name = \"flux-transient\"",
                "[run]", "duration = 4.0", "step = 0.01", "record_every = 1.0",
                "[tissue]", "width = 800.0", "height = 8.0", "founders = 4", "cell_radius = 1.0",
                "[division]", "cycle = \"none\"",
                "[circuit]", "type = \"self-activating-switch\"", "noise = \"none\"",
                "[morphogen]", "diffusion = " + D, "decay = 0.0", "grid_spacing = 2.0",
                "left_wall = \"flux\"", "left_value = " + J,
                "[fates]", "default = \"progenitor\"", "predicted_cells = 0",
                "[[fates.rule]]", "name = \"high\"", "above = { A = 0.6 }", ""));
        Path out = tmp.resolve("run");
        StringWriter err = new StringWriter();
        int code = FatefieldCommand.execute(new PrintWriter(new StringWriter()), new PrintWriter(err, true), "run",
                scenario.toString(), "--out", out.toString(), "--quiet", "--snapshots", "--vtk");
        assertEquals(0, code, err.toString());
        Path snapshots = out.resolve("snapshots");
        double t = 4.0;
        List<CSVRecord> rows;
        try (var reader = Files.newBufferedReader(snapshots.resolve("fields-00000400.csv"))) {
            rows = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).build().parse(reader).getRecords();
        }
        double surface = 2 * J / D * Math.sqrt(D * t / Math.PI);
        Map<String, Double> table = new HashMap<>();
        int compared = 0;
        for (CSVRecord row : rows) {
            assertEquals(t, Double.parseDouble(row.get("time_h")), 1e-12);
            double x = Double.parseDouble(row.get("x_um"));
            double c = Double.parseDouble(row.get("concentration"));
            table.put(row.get("x_um") + "," + row.get("y_um"), c);
            double exact = 2 * J / D * (Math.sqrt(D * t / Math.PI) * Math.exp(-x * x / (4 * D * t))
                    - x / 2 * Erf.erfc(x / (2 * Math.sqrt(D * t))));
            assertEquals(exact, c, 0.01 * surface, "x = " + x);
            compared++;
        }
        assertEquals(400 * 4, compared, "every grid square of the 800 x 8 µm field at 2 µm");

        Document vti = DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(snapshots.resolve("morphogen-00000400.vti").toFile());
        Element image = (Element) vti.getElementsByTagName("ImageData").item(0);
        assertEquals("0 399 0 3 0 0", image.getAttribute("WholeExtent"));
        assertEquals("1.0000000000000000 1.0000000000000000 0", image.getAttribute("Origin"));
        String[] values = null;
        for (int k = 0; k < vti.getElementsByTagName("DataArray").getLength(); k++) {
            Element array = (Element) vti.getElementsByTagName("DataArray").item(k);
            if (array.getAttribute("Name").equals("TimeValue")) {
                assertEquals(t, Double.parseDouble(array.getTextContent().trim()), 1e-12);
            } else if (array.getAttribute("Name").equals("morphogen")) {
                values = array.getTextContent().trim().split("\\s+");
            }
        }
        assertTrue(values != null && values.length == 1600, "one value per grid square");
        for (int j = 0; j < 4; j++) {
            for (int i = 0; i < 400; i++) {
                String key = rows.get(j * 400 + i).get("x_um") + "," + rows.get(j * 400 + i).get("y_um");
                assertEquals(table.get(key), Double.parseDouble(values[j * 400 + i]), 1e-9 * surface, key);
            }
        }
    }
}
