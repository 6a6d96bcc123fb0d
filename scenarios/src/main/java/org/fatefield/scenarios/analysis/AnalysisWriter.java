package org.fatefield.scenarios.analysis;

import java.awt.Color;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.csv.CSVPrinter;
import org.fatefield.circuits.analysis.QuasiPotential;
import org.fatefield.circuits.analysis.SteadyState;
import org.fatefield.circuits.analysis.Switching;
import org.fatefield.circuits.analysis.SwitchingSettings;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.BranchPoint;
import org.fatefield.circuits.analysis.continuation.FoldCurveContinuation.FoldCurve;
import org.fatefield.circuits.analysis.continuation.FoldCurveContinuation.FoldPoint;
import org.fatefield.circuits.analysis.continuation.SpecialPoint;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.circuits.study.AnalysisPlan;
import org.fatefield.circuits.study.AnalysisResult;
import org.fatefield.circuits.study.CircuitAnalysis;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.scenarios.output.RunFolder;
import org.fatefield.scenarios.output.RunTables;
import org.fatefield.viz.analysis.BifurcationDiagramChart;
import org.fatefield.viz.analysis.BistableRegionChart;
import org.fatefield.viz.analysis.GridMapChart;
import org.fatefield.viz.analysis.PhasePortraitChart;
import org.fatefield.viz.chart.ChartFiles;
import org.fatefield.viz.chart.FigureFormat;
import org.fatefield.viz.palette.FatePalette;
import org.hipparchus.complex.Complex;
import org.jfree.chart.JFreeChart;

/** Writes the tables and figures of {@code fatefield analyze} into a folder. */
public final class AnalysisWriter {


    private final RunFolder folder;
    private final ReactionNetwork network;
    private final AnalysisPlan plan;
    private final List<String> species;
    private final List<String> written = new ArrayList<>();
    private final FateClassifier fates;
    private final FigureFormat format;

    /**
     * A writer into {@code folder}; attractors are named and coloured by the fate {@code fates}
     * gives them, and figures are written in {@code format}.
     */
    public AnalysisWriter(RunFolder folder, ReactionNetwork network, AnalysisPlan plan, FateClassifier fates,
            FigureFormat format) {
        this.folder = folder;
        this.fates = fates;
        this.format = format;
        this.network = network;
        this.plan = plan;
        this.species = network.speciesNames();
    }

    /** Files written so far. */
    public List<String> written() {
        return written;
    }

    /** Writes every table and figure of {@code result}. */
    public void write(AnalysisResult result, CircuitAnalysis analysis) throws IOException {
        steadyStates(result.steadyStates());
        branches(result.branches());
        if (plan.hasSecond()) {
            foldCurves(result.foldCurves());
        }
        firstPassages(result);
        String xName = species.get(plan.xSpecies());
        figure("bifurcation", BifurcationDiagramChart.create(result.branches(), plan.xSpecies(), plan.parameter(), xName));
        if (plan.hasSecond()) {
            figure("bistable-region", BistableRegionChart.create(result.foldCurves(), plan.parameter(), plan.second()));
        }
        if (!plan.hasPlane()) {
            return;
        }
        basins(result);
        landscape(result);
        commitment(result);
        String yName = species.get(plan.ySpecies());
        double[] upper = analysis.upperCorner();
        figure("phase-portrait", PhasePortraitChart.create(network, analysis.parametersAt(plan.at()),
                new double[species.size()], plan.xSpecies(), plan.ySpecies(), new double[2],
                new double[] {upper[plan.xSpecies()], upper[plan.ySpecies()]}, result.steadyStates()));
        var attractors = result.basins().attractors();
        String[] names = new String[attractors.size()];
        Color[] colours = new Color[attractors.size()];
        for (int k = 0; k < names.length; k++) {
            int fate = fates.classify(attractors.get(k).state());
            names[k] = fates.fateNames().get(fate) + " " + describe(attractors.get(k).state());
            colours[k] = FatePalette.fate(fate, fates.fateCount());
        }
        String where = plan.parameter() + " = " + RunTables.number(plan.at())
                + (plan.at() == 0.5 * (plan.min() + plan.max()) ? " (middle of the range)" : "");
        figure("basins", GridMapChart.basins(result.basins().xs(), result.basins().ys(), result.basins().attractor(),
                names, colours, xName + " (concentration)", yName + " (concentration)"));
        figure("landscape", GridMapChart.landscape(result.landscape().xs(), result.landscape().ys(),
                result.landscape().u(), GridMapChart.LANDSCAPE_CEILING, xName + " (concentration)",
                yName + " (concentration)", "Landscape at " + where));
        double[][] along = new double[result.parameterValues().length][];
        for (int k = 0; k < along.length; k++) {
            along[k] = result.alongParameter().get(k).u()[0];
        }
        figure("landscape-along-parameter", GridMapChart.landscape(result.alongParameter().get(0).xs(),
                result.parameterValues(), along, GridMapChart.LANDSCAPE_CEILING, xName + " (concentration)", plan.parameter(),
                "Landscape along " + plan.parameter() + " (one row per value)"));
    }

    private String describe(double[] state) {
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < state.length; i++) {
            parts.add(species.get(i) + " " + RunTables.number(Math.round(state[i] * 1000) / 1000.0));
        }
        return "attractor (" + String.join(", ", parts) + ")";
    }

    private void steadyStates(List<SteadyState> states) throws IOException {
        List<String> header = new ArrayList<>(List.of(plan.parameter()));
        header.addAll(species);
        header.addAll(List.of("type", "stable"));
        header.addAll(eigenvalueHeader());
        table("steady-states.csv", header, rows -> {
            for (SteadyState s : states) {
                List<String> row = new ArrayList<>(List.of(RunTables.number(plan.at())));
                for (double v : s.state()) {
                    row.add(RunTables.number(v));
                }
                row.addAll(List.of(s.type().label(), Boolean.toString(s.isStable())));
                row.addAll(eigenvalues(s.eigenvalues()));
                rows.add(row);
            }
        });
    }

    private void branches(List<Branch> branches) throws IOException {
        List<String> header = new ArrayList<>(List.of("branch", "point", plan.parameter()));
        header.addAll(species);
        header.addAll(List.of("stable", "leading_eigenvalue_re_per_h", "leading_eigenvalue_im_per_h"));
        table("branches.csv", header, rows -> {
            for (Branch b : branches) {
                int k = 0;
                for (BranchPoint p : b.points()) {
                    List<String> row = new ArrayList<>(List.of(Integer.toString(b.id()), Integer.toString(k++),
                            RunTables.number(p.parameter())));
                    for (double v : p.state()) {
                        row.add(RunTables.number(v));
                    }
                    row.addAll(List.of(Boolean.toString(p.stable()), RunTables.number(p.eigenvalues()[0].getReal()),
                            RunTables.number(p.eigenvalues()[0].getImaginary())));
                    rows.add(row);
                }
            }
        });
        List<String> special = new ArrayList<>(List.of("branch", "type", plan.parameter()));
        special.addAll(species);
        // The imaginary part of the critical eigenvalue pair at a Hopf point: an angular frequency.
        special.addAll(List.of("frequency_rad_per_h", "criticality", "normal_form_coefficient"));
        special.addAll(eigenvalueHeader());
        table("special-points.csv", special, rows -> {
            for (Branch b : branches) {
                for (SpecialPoint s : b.specials()) {
                    List<String> row = new ArrayList<>(List.of(Integer.toString(b.id()), s.type().label(),
                            RunTables.number(s.parameter())));
                    for (double v : s.state()) {
                        row.add(RunTables.number(v));
                    }
                    row.addAll(List.of(RunTables.number(s.frequency()), s.criticality().label(),
                            RunTables.number(s.coefficient())));
                    row.addAll(eigenvalues(s.eigenvalues()));
                    rows.add(row);
                }
            }
        });
    }

    private void foldCurves(List<FoldCurve> curves) throws IOException {
        List<String> header = new ArrayList<>(List.of("curve", "kind", plan.parameter(), plan.second()));
        header.addAll(species);
        table("fold-curve.csv", header, rows -> {
            for (int c = 0; c < curves.size(); c++) {
                for (String kind : List.of("saddle-node", "cusp")) {
                    List<FoldPoint> points = kind.equals("cusp") ? curves.get(c).cusps() : curves.get(c).points();
                    for (FoldPoint p : points) {
                        List<String> row = new ArrayList<>(List.of(Integer.toString(c), kind,
                                RunTables.number(p.mu()), RunTables.number(p.nu())));
                        for (double v : p.state()) {
                            row.add(RunTables.number(v));
                        }
                        rows.add(row);
                    }
                }
            }
        });
    }

    private void basins(AnalysisResult result) throws IOException {
        var map = result.basins();
        List<String> header = new ArrayList<>(List.of(species.get(plan.xSpecies()), species.get(plan.ySpecies()),
                "attractor"));
        for (String s : species) {
            header.add("attractor_" + s);
        }
        table("basins.csv", header, rows -> {
            for (int j = 0; j < map.ys().length; j++) {
                for (int i = 0; i < map.xs().length; i++) {
                    int a = map.attractor()[j][i];
                    List<String> row = new ArrayList<>(List.of(RunTables.number(map.xs()[i]),
                            RunTables.number(map.ys()[j]), a < 0 ? RunTables.MISSING : Integer.toString(a)));
                    for (int s = 0; s < species.size(); s++) {
                        row.add(a < 0 ? RunTables.MISSING : RunTables.number(map.attractors().get(a).state()[s]));
                    }
                    rows.add(row);
                }
            }
        });
    }

    private void landscape(AnalysisResult result) throws IOException {
        String x = species.get(plan.xSpecies());
        String y = species.get(plan.ySpecies());
        QuasiPotential plane = result.landscape();
        table("landscape.csv", List.of(plan.parameter(), x, y, "visits", "U"), rows -> {
            for (int j = 0; j < plane.ys().length; j++) {
                for (int i = 0; i < plane.xs().length; i++) {
                    rows.add(List.of(RunTables.number(plan.at()), RunTables.number(plane.xs()[i]),
                            RunTables.number(plane.ys()[j]), Long.toString(plane.counts()[j][i]),
                            RunTables.number(plane.u()[j][i])));
                }
            }
        });
        table("landscape-along-parameter.csv", List.of(plan.parameter(), x, "visits", "U"), rows -> {
            for (int k = 0; k < result.parameterValues().length; k++) {
                QuasiPotential q = result.alongParameter().get(k);
                for (int j = 0; j < q.ys().length; j++) {
                    for (int i = 0; i < q.xs().length; i++) {
                        rows.add(List.of(RunTables.number(result.parameterValues()[k]), RunTables.number(q.xs()[i]),
                                Long.toString(q.counts()[j][i]), RunTables.number(q.u()[j][i])));
                    }
                }
            }
        });
    }

    private void firstPassages(AnalysisResult result) throws IOException {
        SwitchingSettings switching = plan.switching();
        table("switching.csv", List.of("system_size", "mean_first_passage_h", "sd_h", "ci95_low_h", "ci95_high_h",
                "arrived", "censored", "method", "step_h", "arrival_fraction", "limit_h"), rows -> {
                    for (int k = 0; k < result.passages().size(); k++) {
                        Switching.FirstPassage f = result.passages().get(k);
                        rows.add(List.of(RunTables.number(result.systemSizes()[k]), RunTables.number(f.mean()),
                                RunTables.number(f.standardDeviation()), RunTables.number(f.low95()),
                                RunTables.number(f.high95()), Integer.toString(f.arrived()),
                                Integer.toString(f.censored()), switching.method().word(),
                                RunTables.number(switching.step()), RunTables.number(switching.arrivalFraction()),
                                RunTables.number(switching.passageLimit())));
                    }
                });
    }

    private void commitment(AnalysisResult result) throws IOException {
        double[] upper = new double[] {result.basins().xs()[result.basins().xs().length - 1],
            result.basins().ys()[result.basins().ys().length - 1]};
        table("commitment.csv", List.of(species.get(plan.xSpecies()), species.get(plan.ySpecies()), "probability"),
                rows -> {
                    double[][] c = result.commitment();
                    for (int j = 0; j < c.length; j++) {
                        for (int i = 0; i < c[j].length; i++) {
                            rows.add(List.of(RunTables.number(upper[0] * i / (c[j].length - 1)),
                                    RunTables.number(upper[1] * j / (c.length - 1)), RunTables.number(c[j][i])));
                        }
                    }
                });
    }

    /** {@code eigenvalue_<k>_re_per_h, eigenvalue_<k>_im_per_h} for k = 1 to the number of species. */
    private List<String> eigenvalueHeader() {
        List<String> out = new ArrayList<>();
        for (int k = 1; k <= species.size(); k++) {
            out.add("eigenvalue_" + k + "_re_per_h");
            out.add("eigenvalue_" + k + "_im_per_h");
        }
        return out;
    }

    /** The Jacobian's eigenvalues in 1/h, largest real part first (ties: larger imaginary part first). */
    private static List<String> eigenvalues(Complex[] values) {
        Complex[] sorted = values.clone();
        Arrays.sort(sorted, (a, b) -> a.getReal() != b.getReal() ? Double.compare(b.getReal(), a.getReal())
                : Double.compare(b.getImaginary(), a.getImaginary()));
        List<String> out = new ArrayList<>();
        for (Complex c : sorted) {
            out.add(RunTables.number(c.getReal()));
            out.add(RunTables.number(c.getImaginary()));
        }
        return out;
    }

    private interface Rows {
        void fill(List<List<String>> rows);
    }

    private void table(String name, List<String> header, Rows rows) throws IOException {
        List<List<String>> body = new ArrayList<>();
        rows.fill(body);
        folder.writeText(name, (Writer w) -> {
            CSVPrinter printer = RunTables.printer(w);
            printer.printRecord(header);
            for (List<String> row : body) {
                printer.printRecord(row);
            }
            printer.flush();
        });
        written.add(name);
    }

    private void figure(String name, JFreeChart chart) throws IOException {
        folder.write(name + ".png", out -> ChartFiles.png(chart, 960, 640, format, out));
        folder.write(name + ".svg", out -> ChartFiles.svg(chart, 960, 640, format, out));
        written.addAll(Arrays.asList(name + ".png", name + ".svg"));
    }
}
