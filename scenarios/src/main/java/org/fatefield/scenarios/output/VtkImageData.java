package org.fatefield.scenarios.output;

import java.io.IOException;
import java.io.Writer;
import java.util.Locale;
import org.fatefield.engine.field.MorphogenField;

/**
 * One field at one time as a VTK XML image-data file ({@code .vti}, ASCII; the open VTK file
 * format, "VTK File Formats", Kitware, VTK User's Guide ch. 19): one point per grid square at
 * its centre, x running fastest, z a single layer, with the simulated time as the field-data
 * array {@code TimeValue} that viewers read as the time of a series. Values are written with
 * 17 significant digits, so they read back exactly.
 */
public final class VtkImageData {

    private VtkImageData() {
    }

    /**
     * The file name of field number {@code index} named {@code name} at step {@code step}:
     * {@code <name>-<step>.vti}, with every character of the name other than letters, digits,
     * '-' and '_' replaced by '_' (a field name is scenario text and must not make a path), and
     * the index added when that changed the name, so two fields never share a file.
     */
    public static String fileName(int index, String name, String step) {
        String safe = name.replaceAll("[^A-Za-z0-9_-]", "_");
        if (!safe.equals(name) || safe.isEmpty()) {
            safe = safe + "_" + index;
        }
        return safe + "-" + step + ".vti";
    }

    /** Writes {@code field} at simulated time {@code time} (h). */
    public static void write(MorphogenField field, double time, Writer out) throws IOException {
        int nx = field.columns();
        int ny = field.rows();
        int nz = field.layers();
        double h = field.spacing();
        String extent = "0 " + (nx - 1) + " 0 " + (ny - 1) + " 0 " + (nz - 1);
        String name = escape(field.spec().name());
        out.write("<?xml version=\"1.0\"?>\n");
        out.write("<VTKFile type=\"ImageData\" version=\"1.0\" byte_order=\"LittleEndian\">\n");
        out.write("  <ImageData WholeExtent=\"" + extent + "\" Origin=\"" + number(h / 2) + " " + number(h / 2)
                + " " + (field.threeD() ? number(h / 2) : "0") + "\" Spacing=\"" + number(h) + " " + number(h) + " "
                + number(h) + "\">\n");
        out.write("    <FieldData>\n");
        out.write("      <DataArray type=\"Float64\" Name=\"TimeValue\" NumberOfTuples=\"1\" format=\"ascii\">"
                + number(time) + "</DataArray>\n");
        out.write("    </FieldData>\n");
        out.write("    <Piece Extent=\"" + extent + "\">\n");
        out.write("      <PointData Scalars=\"" + name + "\">\n");
        out.write("        <DataArray type=\"Float64\" Name=\"" + name + "\" format=\"ascii\">\n");
        for (int l = 0; l < nz; l++) {
            for (int j = 0; j < ny; j++) {
                StringBuilder line = new StringBuilder("         ");
                for (int i = 0; i < nx; i++) {
                    line.append(' ').append(number(field.value(i, j, l)));
                }
                out.write(line.append('\n').toString());
            }
        }
        out.write("        </DataArray>\n");
        out.write("      </PointData>\n");
        out.write("      <CellData>\n      </CellData>\n");
        out.write("    </Piece>\n");
        out.write("  </ImageData>\n");
        out.write("</VTKFile>\n");
    }

    private static String number(double v) {
        return String.format(Locale.ROOT, "%.17g", v);
    }

    private static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
