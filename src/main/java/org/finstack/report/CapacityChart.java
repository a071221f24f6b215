package org.finstack.report;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.renderer.category.LineAndShapeRenderer;
import org.jfree.data.category.DefaultCategoryDataset;

/**
 * The summary's chart: capacity per option as bars on the left axis, air pressure drop as points
 * joined by a line on the right axis, drawn by JFreeChart with its stock look.
 */
public final class CapacityChart {

    private CapacityChart() {
    }

    /**
     * @param d the chart's data
     * @return the chart
     */
    public static JFreeChart of(Summary.ChartData d) {
        DefaultCategoryDataset capacity = new DefaultCategoryDataset();
        DefaultCategoryDataset drop = new DefaultCategoryDataset();
        String capKey = "Capacity (" + d.capacityUnit() + ")";
        String dpKey = "Air pressure drop (" + d.pressureUnit() + ")";
        for (int i = 0; i < d.labels().size(); i++) {
            capacity.addValue(d.capacity().get(i), capKey, d.labels().get(i));
            drop.addValue(d.pressureDrop().get(i), dpKey, d.labels().get(i));
        }
        JFreeChart chart = ChartFactory.createBarChart(null, "Option", capKey, capacity);
        CategoryPlot plot = chart.getCategoryPlot();
        NumberAxis right = new NumberAxis(dpKey);
        plot.setRangeAxis(1, right);
        plot.setDataset(1, drop);
        plot.mapDatasetToRangeAxis(1, 1);
        plot.setRenderer(1, new LineAndShapeRenderer(true, true));
        plot.setDatasetRenderingOrder(DatasetRenderingOrder.FORWARD);
        return chart;
    }

    /**
     * @param d      the chart's data
     * @param width  image width [px]
     * @param height image height [px]
     * @return the chart as PNG bytes
     */
    public static byte[] png(Summary.ChartData d, int width, int height) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            ChartUtils.writeChartAsPNG(out, of(d), width, height);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot draw the chart", e);
        }
        return out.toByteArray();
    }
}
