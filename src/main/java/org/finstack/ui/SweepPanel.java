package org.finstack.ui;

import com.formdev.flatlaf.util.UIScale;
import java.awt.BasicStroke;
import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.FlowLayout;
import java.awt.Rectangle;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.function.Consumer;
import java.util.function.Supplier;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JSpinner;
import javax.swing.SpinnerNumberModel;
import javax.swing.SwingWorker;
import org.finstack.coil.CoilCase;
import org.finstack.core.FinstackException;
import org.finstack.io.AtomicFiles;
import org.finstack.material.Material;
import org.finstack.material.Materials;
import org.finstack.study.CoilModel;
import org.finstack.study.Progress;
import org.finstack.study.Sweep;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.category.BarRenderer;
import org.jfree.chart.renderer.category.LineAndShapeRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.category.DefaultCategoryDataset;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;

/**
 * Sweeps one parameter of the selected option and plots capacity (left axis) and air pressure
 * drop (right axis) against it; the plot saves as PNG and SVG. The sweep runs in a worker with
 * progress and Cancel.
 */
final class SweepPanel extends JPanel {

    private static final long serialVersionUID = 1L;

    /** What can be swept, with the dimension its range is entered in. */
    enum Choice {
        /** Fin density (range entered as fin pitches or densities). */
        FIN_DENSITY(Sweep.Parameter.FIN_DENSITY, Dimension.FIN_PITCH),
        /** Rows. */
        ROWS(Sweep.Parameter.ROWS, Dimension.DIMENSIONLESS),
        /** Face velocity. */
        FACE_VELOCITY(Sweep.Parameter.FACE_VELOCITY, Dimension.VELOCITY),
        /** Tube wall. */
        TUBE_WALL(Sweep.Parameter.TUBE_WALL, Dimension.LENGTH),
        /** Tube material (categorical). */
        TUBE_MATERIAL(null, null),
        /** Air-side fouling. */
        AIR_FOULING(Sweep.Parameter.AIR_FOULING, Dimension.FOULING_RESISTANCE);

        private final Sweep.Parameter parameter;
        private final Dimension dim;

        Choice(Sweep.Parameter parameter, Dimension dim) {
            this.parameter = parameter;
            this.dim = dim;
        }

        @Override
        public String toString() {
            return Messages.get("sweep.parameter." + name());
        }

        /** @return the name in running text (lower case) */
        String inText() {
            return Messages.get("sweep.parameterInText." + name());
        }

        /** The default range [from, to] in the range fields' SI unit. */
        double[] defaults(CoilCase c) {
            return switch (this) {
                case FIN_DENSITY -> new double[] {Quantities.fromUnit(4, Dimension.FIN_PITCH, "fpi"),
                    Quantities.fromUnit(16, Dimension.FIN_PITCH, "fpi")};
                case ROWS -> new double[] {1, 8};
                case FACE_VELOCITY -> new double[] {1.0, 4.0};
                case TUBE_WALL -> new double[] {0.25e-3, 1.0e-3};
                case AIR_FOULING -> new double[] {0, 5e-4};
                case TUBE_MATERIAL -> new double[] {0, 0};
            };
        }
    }

    private final Supplier<CoilCase> base;
    private final Supplier<CoilModel> model;
    private final Supplier<UnitSystem> units;
    private final JComboBox<Choice> choice = new JComboBox<>(Choice.values());
    private final JPanel rangePanel = new JPanel(new FlowLayout(FlowLayout.LEFT, 4, 0));
    private final JSpinner count = new JSpinner(new SpinnerNumberModel(9, 2, 40, 1));
    private final JButton run = new JButton(Messages.get("sweep.run"));
    private final JButton cancel = new JButton(Messages.get("sweep.cancel"));
    private final JButton savePng = new JButton(Messages.get("sweep.savePng"));
    private final JButton saveSvg = new JButton(Messages.get("sweep.saveSvg"));
    private final JProgressBar progress = new JProgressBar(0, 100);
    private final ChartPanel chartPanel = new ChartPanel(null);
    private QuantityField from;
    private QuantityField to;
    private JFreeChart chart;
    private SwingWorker<List<Sweep.Point>, Void> worker;
    private Consumer<Throwable> onFailure = t -> { };

    SweepPanel(Supplier<CoilCase> base, Supplier<CoilModel> model, Supplier<UnitSystem> units) {
        super(new BorderLayout());
        this.base = base;
        this.model = model;
        this.units = units;
        choice.setName("sweep.parameter");
        run.setName("sweep.run");
        cancel.setName("sweep.cancel");
        savePng.setName("sweep.savePng");
        saveSvg.setName("sweep.saveSvg");
        count.setName("sweep.count");
        progress.setName("sweep.progress");
        cancel.setEnabled(false);
        savePng.setEnabled(false);
        saveSvg.setEnabled(false);
        JPanel first = new JPanel(new FlowLayout(FlowLayout.LEFT, UIScale.scale(6), UIScale.scale(4)));
        first.add(new JLabel(Messages.get("sweep.parameter")));
        first.add(choice);
        first.add(rangePanel);
        first.add(new JLabel(Messages.get("sweep.count")));
        first.add(count);
        JPanel second = new JPanel(new FlowLayout(FlowLayout.LEFT, UIScale.scale(6), UIScale.scale(4)));
        second.add(run);
        second.add(cancel);
        second.add(progress);
        second.add(savePng);
        second.add(saveSvg);
        JPanel controls = new JPanel(new java.awt.GridLayout(2, 1));
        controls.add(first);
        controls.add(second);
        add(controls, BorderLayout.NORTH);
        chartPanel.setName("sweep.chart");
        chartPanel.setMouseWheelEnabled(true);
        add(chartPanel, BorderLayout.CENTER);
        choice.addActionListener(e -> rebuildRange());
        run.addActionListener(e -> run());
        cancel.addActionListener(e -> {
            if (worker != null) {
                worker.cancel(true);
            }
        });
        savePng.addActionListener(e -> choose(".png", this::writePng));
        saveSvg.addActionListener(e -> choose(".svg", this::writeSvg));
        rebuildRange();
    }

    /** @param handler receives failures that are not input errors */
    void onFailure(Consumer<Throwable> handler) {
        onFailure = handler;
    }

    private void rebuildRange() {
        rangePanel.removeAll();
        Choice c = (Choice) choice.getSelectedItem();
        if (c != Choice.TUBE_MATERIAL) {
            double[] d = c.defaults(base.get());
            from = new QuantityField("sweep.from", c.dim, c == Choice.ROWS);
            to = new QuantityField("sweep.to", c.dim, c == Choice.ROWS);
            from.setColumns(8);
            to.setColumns(8);
            from.show(d[0], units.get());
            to.show(d[1], units.get());
            rangePanel.add(new JLabel(Messages.get("sweep.from")));
            rangePanel.add(from);
            rangePanel.add(new JLabel(Messages.get("sweep.to")));
            rangePanel.add(to);
        } else {
            from = null;
            to = null;
            rangePanel.add(new JLabel(Messages.get("sweep.allTubeMaterials")));
        }
        count.setEnabled(c != Choice.TUBE_MATERIAL && c != Choice.ROWS);
        rangePanel.revalidate();
        rangePanel.repaint();
    }

    /** Converts the range fields and the plot to the current unit system. */
    void convertUnits() {
        if (from != null) {
            from.convert(units.get());
            to.convert(units.get());
        }
        if (last != null) {
            plot(lastChoice, last);
        }
    }

    /** @param c the parameter to sweep (for tests and menus) */
    void select(Choice c) {
        choice.setSelectedItem(c);
    }

    private List<Sweep.Point> last;
    private Choice lastChoice;

    /** Starts the sweep. */
    void run() {
        Choice c = (Choice) choice.getSelectedItem();
        CoilCase b = base.get();
        CoilModel m = model.get();
        double[] values;
        List<Material> tubes = Materials.library().materials().stream().filter(Material::forTubes).toList();
        try {
            values = c == Choice.TUBE_MATERIAL ? new double[0] : values(c);
        } catch (FinstackException e) {
            (from.error() != null ? from : to).showError(e.getMessage());
            return;
        }
        if (worker != null && !worker.isDone()) {
            worker.cancel(true);
        }
        SwingWorker<List<Sweep.Point>, Void> w = new SwingWorker<>() {
            @Override
            protected List<Sweep.Point> doInBackground() {
                Progress p = new Progress() {
                    @Override
                    public void step(int done, int total) {
                        setProgress(done * 100 / Math.max(1, total));
                    }

                    @Override
                    public boolean cancelled() {
                        return isCancelled();
                    }
                };
                return c == Choice.TUBE_MATERIAL ? Sweep.overTubeMaterials(b, tubes, m, p)
                        : Sweep.over(b, c.parameter, values, m, p);
            }

            @Override
            protected void done() {
                if (worker != this) {
                    return;
                }
                running(false);
                if (isCancelled()) {
                    progress.setValue(0);
                    return;
                }
                try {
                    last = get();
                    lastChoice = c;
                    plot(c, last);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (CancellationException e) {
                    progress.setValue(0);
                } catch (ExecutionException e) {
                    onFailure.accept(e.getCause());
                }
            }
        };
        w.addPropertyChangeListener(e -> {
            if ("progress".equals(e.getPropertyName())) {
                progress.setValue((Integer) e.getNewValue());
            }
        });
        worker = w;
        running(true);
        w.execute();
    }

    /** @return whether a sweep is under way */
    boolean running() {
        return worker != null && !worker.isDone();
    }

    private void running(boolean on) {
        run.setEnabled(!on);
        cancel.setEnabled(on);
    }

    private double[] values(Choice c) {
        from.clearError();
        to.clearError();
        double a;
        double b;
        try {
            a = from.read();
        } catch (FinstackException e) {
            from.showError(e.getMessage());
            throw e;
        }
        try {
            b = to.read();
        } catch (FinstackException e) {
            to.showError(e.getMessage());
            throw e;
        }
        if (c == Choice.ROWS) {
            int lo = (int) Math.min(a, b);
            int hi = (int) Math.max(a, b);
            double[] v = new double[Math.max(1, hi - lo + 1)];
            for (int i = 0; i < v.length; i++) {
                v[i] = lo + i;
            }
            return v;
        }
        int n = (Integer) count.getValue();
        if (c == Choice.FIN_DENSITY) {
            return Sweep.range(1 / a, 1 / b, n);
        }
        return Sweep.range(a, b, n);
    }

    private double x(Choice c, double v, UnitSystem u) {
        return switch (c) {
            case FIN_DENSITY -> Quantities.toUnit(1 / v, Dimension.FIN_PITCH, u == UnitSystem.US ? "fpi" : "fins/m");
            case ROWS, TUBE_MATERIAL -> v;
            default -> Quantities.toUnit(v, c.dim, Quantities.defaultUnit(c.dim, u));
        };
    }

    private String xLabel(Choice c, UnitSystem u) {
        String unit = switch (c) {
            case FIN_DENSITY -> u == UnitSystem.US ? "fpi" : "fins/m";
            case ROWS, TUBE_MATERIAL -> "";
            default -> Quantities.defaultUnit(c.dim, u);
        };
        return c + (unit.isEmpty() ? "" : " [" + unit + "]");
    }

    private void plot(Choice c, List<Sweep.Point> points) {
        UnitSystem u = units.get();
        String capUnit = Quantities.defaultUnit(Dimension.HEAT_FLOW, u);
        String dpUnit = Quantities.defaultUnit(Dimension.PRESSURE_DIFFERENCE, u);
        String capLabel = Messages.get("sweep.capacity") + " [" + capUnit + "]";
        String dpLabel = Messages.get("sweep.pressureDrop") + " [" + dpUnit + "]";
        Color capColor = Theme.color("Finstack.chart.capacity", new Color(0x2E7FA8));
        Color dpColor = Theme.color("Finstack.chart.pressureDrop", new Color(0xC4573A));
        JFreeChart ch;
        if (c == Choice.TUBE_MATERIAL) {
            DefaultCategoryDataset cap = new DefaultCategoryDataset();
            DefaultCategoryDataset dp = new DefaultCategoryDataset();
            for (Sweep.Point p : points) {
                if (p.rated()) {
                    cap.addValue(Quantities.toUnit(p.rating().capacity(), Dimension.HEAT_FLOW, capUnit), capLabel, p.label());
                    dp.addValue(Quantities.toUnit(p.rating().airPressureDrop(), Dimension.PRESSURE_DIFFERENCE, dpUnit),
                            dpLabel, p.label());
                }
            }
            CategoryPlot plot = new CategoryPlot(cap, new CategoryAxis(c.toString()), new NumberAxis(capLabel),
                    new BarRenderer());
            plot.getRenderer().setSeriesPaint(0, capColor);
            ((BarRenderer) plot.getRenderer()).setShadowVisible(false);
            ((BarRenderer) plot.getRenderer()).setBarPainter(new org.jfree.chart.renderer.category.StandardBarPainter());
            NumberAxis right = new NumberAxis(dpLabel);
            plot.setRangeAxis(1, right);
            plot.setDataset(1, dp);
            plot.mapDatasetToRangeAxis(1, 1);
            LineAndShapeRenderer lr = new LineAndShapeRenderer();
            lr.setSeriesPaint(0, dpColor);
            plot.setRenderer(1, lr);
            ((NumberAxis) plot.getRangeAxis()).setAutoRangeIncludesZero(false);
            right.setAutoRangeIncludesZero(false);
            ch = new JFreeChart(Messages.format("sweep.title", c.inText()), JFreeChart.DEFAULT_TITLE_FONT, plot, true);
        } else {
            XYSeries cap = new XYSeries(capLabel);
            XYSeries dp = new XYSeries(dpLabel);
            for (Sweep.Point p : points) {
                if (p.rated()) {
                    double xv = x(c, p.value(), u);
                    cap.add(xv, Quantities.toUnit(p.rating().capacity(), Dimension.HEAT_FLOW, capUnit));
                    dp.add(xv, Quantities.toUnit(p.rating().airPressureDrop(), Dimension.PRESSURE_DIFFERENCE, dpUnit));
                }
            }
            NumberAxis xAxis = new NumberAxis(xLabel(c, u));
            xAxis.setAutoRangeIncludesZero(false);
            NumberAxis left = new NumberAxis(capLabel);
            left.setAutoRangeIncludesZero(false);
            XYLineAndShapeRenderer r0 = new XYLineAndShapeRenderer(true, true);
            r0.setSeriesPaint(0, capColor);
            r0.setSeriesStroke(0, new BasicStroke(2f));
            XYPlot plot = new XYPlot(new XYSeriesCollection(cap), xAxis, left, r0);
            NumberAxis right = new NumberAxis(dpLabel);
            right.setAutoRangeIncludesZero(false);
            plot.setRangeAxis(1, right);
            plot.setDataset(1, new XYSeriesCollection(dp));
            plot.mapDatasetToRangeAxis(1, 1);
            XYLineAndShapeRenderer r1 = new XYLineAndShapeRenderer(true, true);
            r1.setSeriesPaint(0, dpColor);
            r1.setSeriesStroke(0, new BasicStroke(2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 1f,
                    new float[] {6f, 4f}, 0f));
            plot.setRenderer(1, r1);
            ch = new JFreeChart(Messages.format("sweep.title", c.inText()), JFreeChart.DEFAULT_TITLE_FONT, plot, true);
        }
        Color bg = Theme.color("Finstack.chart.background", Color.WHITE);
        Color fg = Theme.color("Finstack.chart.foreground", Color.DARK_GRAY);
        ch.setBackgroundPaint(bg);
        ch.getTitle().setPaint(fg);
        ch.getLegend().setBackgroundPaint(bg);
        ch.getLegend().setItemPaint(fg);
        ch.getPlot().setBackgroundPaint(Theme.color("Finstack.chart.plotBackground", Color.WHITE));
        chart = ch;
        chartPanel.setChart(ch);
        savePng.setEnabled(true);
        saveSvg.setEnabled(true);
    }

    /** @return the chart shown, or null before the first sweep */
    JFreeChart chart() {
        return chart;
    }

    /** @return the points of the last sweep, or null */
    List<Sweep.Point> points() {
        return last;
    }

    /**
     * @param file where to save the plot as PNG (atomically)
     * @throws IOException when it cannot be written
     */
    void writePng(Path file) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ChartUtils.writeChartAsPNG(out, chart, 900, 560);
        AtomicFiles.write(file, out.toByteArray());
    }

    /**
     * @param file where to save the plot as SVG (atomically)
     * @throws IOException when it cannot be written
     */
    void writeSvg(Path file) throws IOException {
        SVGGraphics2D g = new SVGGraphics2D(900, 560);
        chart.draw(g, new Rectangle(0, 0, 900, 560));
        AtomicFiles.write(file, g.getSVGDocument().getBytes(StandardCharsets.UTF_8));
    }

    private interface Writer {
        void write(Path p) throws IOException;
    }

    private void choose(String ext, Writer w) {
        JFileChooser fc = new JFileChooser();
        fc.setSelectedFile(new java.io.File("sweep" + ext));
        if (fc.showSaveDialog(this) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path p = fc.getSelectedFile().toPath();
        if (!p.getFileName().toString().toLowerCase(java.util.Locale.ROOT).endsWith(ext)) {
            p = p.resolveSibling(p.getFileName() + ext);
        }
        try {
            w.write(p);
        } catch (IOException e) {
            JOptionPane.showMessageDialog(this, Messages.format("sweep.saveFailed", p, e.getMessage()),
                    Messages.get("app.title"), JOptionPane.ERROR_MESSAGE);
        }
    }
}
