package org.advecta.cli;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.Paint;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.awt.image.RenderedImage;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import javax.xml.transform.OutputKeys;
import javax.xml.transform.Transformer;
import javax.xml.transform.TransformerException;
import javax.xml.transform.TransformerFactory;
import javax.xml.transform.dom.DOMSource;
import javax.xml.transform.stream.StreamResult;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYDataImageAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.PaintScale;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.apache.batik.svggen.ImageHandlerBase64Encoder;
import org.apache.batik.svggen.SVGGeneratorContext;
import org.apache.batik.svggen.SVGGraphics2D;
import org.apache.batik.svggen.SVGGraphics2DIOException;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

/**
 * Charts of profiles, breakthrough curves and plan views, drawn by JFreeChart off-screen and
 * written as SVG (through Batik's SVG generator) or PNG.
 */
final class Plots {

    /** The image format of the plots. */
    enum Format {
        /** Scalable vector graphics. */
        SVG,
        /** Portable network graphics. */
        PNG;

        /**
         * Returns the file extension.
         *
         * @return "svg" or "png"
         */
        String extension() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }

        /**
         * Reads the value of the {@code --plots} option.
         *
         * @param text "svg" or "png", any case
         * @return the format
         * @throws UserError for any other word
         */
        static Format parse(String text) {
            switch (text.strip().toLowerCase(java.util.Locale.ROOT)) {
                case "svg":
                    return SVG;
                case "png":
                    return PNG;
                default:
                    throw new UserError("--plots " + text + ": must be svg or png");
            }
        }
    }

    private static final String SVG_NAMESPACE = "http://www.w3.org/2000/svg";
    private static final String XMLNS = "http://www.w3.org/2000/xmlns/";

    /** Width of every plot, in pixels. */
    static final int WIDTH = 800;
    /** Height of every plot, in pixels. */
    static final int HEIGHT = 500;

    /** Series colours, distinguishable for the common forms of colour blindness. */
    private static final Color[] COLOURS = {
        new Color(0x00, 0x72, 0xB2), new Color(0xD5, 0x5E, 0x00), new Color(0x00, 0x9E, 0x73),
        new Color(0xCC, 0x79, 0xA7), new Color(0xE6, 0x9F, 0x00), new Color(0x56, 0xB4, 0xE9),
        new Color(0x00, 0x00, 0x00), new Color(0xF0, 0xE4, 0x42)};

    private Plots() {
    }

    /**
     * Builds a chart of curves.
     *
     * @param title the title
     * @param xLabel the horizontal axis label
     * @param yLabel the vertical axis label
     * @param names one name per curve
     * @param x the abscissae, shared by every curve
     * @param y one row of ordinates per curve; non-finite values are left out
     * @param level a horizontal line to draw, or null
     * @param levelLabel its label
     * @return the chart
     */
    static JFreeChart curves(String title, String xLabel, String yLabel, List<String> names,
                             double[] x, double[][] y, Double level, String levelLabel) {
        final XYSeriesCollection data = new XYSeriesCollection();
        for (int s = 0; s < names.size(); s++) {
            final XYSeries series = new XYSeries(names.get(s), false, true);
            for (int i = 0; i < x.length; i++) {
                if (Double.isFinite(y[s][i])) {
                    series.add(x[i], y[s][i]);
                }
            }
            data.addSeries(series);
        }
        final NumberAxis xAxis = new NumberAxis(xLabel);
        xAxis.setAutoRangeIncludesZero(false);
        final NumberAxis yAxis = new NumberAxis(yLabel);
        final XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setDrawSeriesLineAsPath(true);
        for (int s = 0; s < names.size(); s++) {
            renderer.setSeriesPaint(s, COLOURS[s % COLOURS.length]);
            renderer.setSeriesStroke(s, new BasicStroke(2f));
        }
        final XYPlot plot = new XYPlot(data, xAxis, yAxis, renderer);
        style(plot);
        if (level != null) {
            final ValueMarker marker = new ValueMarker(level, Color.GRAY,
                new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                    new float[] {6f, 4f}, 0f));
            marker.setLabel(levelLabel);
            marker.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
            marker.setLabelAnchor(org.jfree.chart.ui.RectangleAnchor.TOP_RIGHT);
            marker.setLabelTextAnchor(org.jfree.chart.ui.TextAnchor.BOTTOM_RIGHT);
            plot.addRangeMarker(marker);
        }
        return chart(title, plot, true);
    }

    /**
     * Builds a chart of measured points against fitted curves: for each curve its data as
     * markers and the fitted model as a line, in the same colour.
     *
     * @param title the title
     * @param xLabel the horizontal axis label
     * @param yLabel the vertical axis label
     * @param names one name per curve
     * @param dataX the data's abscissae, one array per curve
     * @param dataY the data's ordinates, as many
     * @param lineX the fitted line's abscissae, one array per curve (empty for no line)
     * @param lineY the fitted line's ordinates, as many; non-finite values are left out
     * @return the chart
     */
    static JFreeChart fit(String title, String xLabel, String yLabel, List<String> names,
                          List<double[]> dataX, List<double[]> dataY, List<double[]> lineX,
                          List<double[]> lineY) {
        final XYSeriesCollection lines = new XYSeriesCollection();
        final XYSeriesCollection points = new XYSeriesCollection();
        for (int s = 0; s < names.size(); s++) {
            final XYSeries line = new XYSeries("fit, " + names.get(s), false, true);
            for (int i = 0; i < lineX.get(s).length; i++) {
                if (Double.isFinite(lineY.get(s)[i])) {
                    line.add(lineX.get(s)[i], lineY.get(s)[i]);
                }
            }
            lines.addSeries(line);
            final XYSeries data = new XYSeries("data, " + names.get(s), false, true);
            for (int i = 0; i < dataX.get(s).length; i++) {
                data.add(dataX.get(s)[i], dataY.get(s)[i]);
            }
            points.addSeries(data);
        }
        final NumberAxis xAxis = new NumberAxis(xLabel);
        xAxis.setAutoRangeIncludesZero(false);
        final NumberAxis yAxis = new NumberAxis(yLabel);
        final XYLineAndShapeRenderer lineRenderer = new XYLineAndShapeRenderer(true, false);
        lineRenderer.setDrawSeriesLineAsPath(true);
        final XYLineAndShapeRenderer pointRenderer = new XYLineAndShapeRenderer(false, true);
        final java.awt.Shape marker = new java.awt.geom.Ellipse2D.Double(-3, -3, 6, 6);
        for (int s = 0; s < names.size(); s++) {
            final Color colour = COLOURS[s % COLOURS.length];
            lineRenderer.setSeriesPaint(s, colour);
            lineRenderer.setSeriesStroke(s, new BasicStroke(2f));
            pointRenderer.setSeriesPaint(s, colour);
            pointRenderer.setSeriesShape(s, marker);
            pointRenderer.setSeriesShapesFilled(s, false);
        }
        final XYPlot plot = new XYPlot(points, xAxis, yAxis, pointRenderer);
        plot.setDataset(1, lines);
        plot.setRenderer(1, lineRenderer);
        style(plot);
        return chart(title, plot, true);
    }

    /**
     * Builds a plan view: c over an x–y grid as coloured cells with a colour scale.
     *
     * @param title the title
     * @param xLabel the x axis label
     * @param yLabel the y axis label
     * @param cLabel the colour scale's label
     * @param x the x grid
     * @param y the y grid
     * @param c c[j][i] at (x_i, y_j)
     * @return the chart
     */
    static JFreeChart plan(String title, String xLabel, String yLabel, String cLabel, Grid x,
                           Grid y, double[][] c) {
        double max = 0;
        for (double[] row : c) {
            for (double v : row) {
                if (v > max && Double.isFinite(v)) {
                    max = v;
                }
            }
        }
        final Ramp scale = new Ramp(max > 0 ? max : 1.0);
        // One pixel per cell, row 0 at the largest y; the image is placed over the cells'
        // extent in data coordinates, so an SVG holds one embedded image, not a rectangle
        // per cell.
        final BufferedImage image = new BufferedImage(x.points(), y.points(),
            BufferedImage.TYPE_INT_RGB);
        for (int j = 0; j < y.points(); j++) {
            for (int i = 0; i < x.points(); i++) {
                image.setRGB(i, y.points() - 1 - j, ((Color) scale.getPaint(c[j][i])).getRGB());
            }
        }
        final double dx = (x.to() - x.from()) / (x.points() - 1);
        final double dy = (y.to() - y.from()) / (y.points() - 1);
        final NumberAxis xAxis = new NumberAxis(xLabel);
        xAxis.setRange(x.from() - dx / 2, x.to() + dx / 2);
        final NumberAxis yAxis = new NumberAxis(yLabel);
        yAxis.setRange(y.from() - dy / 2, y.to() + dy / 2);
        final XYPlot plot = new XYPlot(null, xAxis, yAxis, new XYLineAndShapeRenderer());
        style(plot);
        plot.setDomainGridlinesVisible(false);
        plot.setRangeGridlinesVisible(false);
        plot.addAnnotation(new XYDataImageAnnotation(image, x.from() - dx / 2,
            y.from() - dy / 2, x.to() - x.from() + dx, y.to() - y.from() + dy, true));
        final JFreeChart chart = chart(title, plot, false);
        final NumberAxis scaleAxis = new NumberAxis(cLabel);
        scaleAxis.setRange(0, scale.getUpperBound());
        final PaintScaleLegend legend = new PaintScaleLegend(scale, scaleAxis);
        legend.setPosition(RectangleEdge.RIGHT);
        legend.setMargin(new RectangleInsets(10, 10, 10, 10));
        legend.setStripWidth(15);
        legend.setSubdivisionCount(64);
        legend.setBackgroundPaint(Color.WHITE);
        chart.addSubtitle(legend);
        return chart;
    }

    /**
     * Writes a chart to a file atomically.
     *
     * @param chart the chart
     * @param file the file
     * @param format SVG or PNG
     */
    static void write(JFreeChart chart, Path file, Format format) {
        AtomicOutput.write(file, out -> write(chart, out, format));
    }

    private static void write(JFreeChart chart, OutputStream out, Format format)
            throws IOException {
        if (format == Format.PNG) {
            ChartUtils.writeChartAsPNG(out, chart, WIDTH, HEIGHT);
            return;
        }
        final Document document;
        try {
            document = DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .getDOMImplementation().createDocument(SVG_NAMESPACE, "svg", null);
        } catch (ParserConfigurationException e) {
            throw new IOException("no XML document builder: " + e.getMessage(), e);
        }
        final SVGGeneratorContext context = SVGGeneratorContext.createDefault(document);
        // Coordinates to 0.01 px keep the file small; no generator comment, no time stamp:
        // the same chart gives the same file.
        context.setPrecision(2);
        context.setComment(null);
        context.setEmbeddedFontsOn(false);
        context.setImageHandler(new PngDataUri());
        final SVGGraphics2D g2 = new SVGGraphics2D(context, false);
        g2.setSVGCanvasSize(new Dimension(WIDTH, HEIGHT));
        chart.draw(g2, new Rectangle2D.Double(0, 0, WIDTH, HEIGHT));
        // Written by the JDK's serializer rather than Batik's, which adds an SVG 1.0 DOCTYPE
        // whose external DTD a validating reader would fetch.
        final Element root = g2.getRoot();
        root.setAttributeNS(XMLNS, "xmlns", SVG_NAMESPACE);
        root.setAttributeNS(XMLNS, "xmlns:xlink", "http://www.w3.org/1999/xlink");
        try {
            final Transformer serializer = TransformerFactory.newInstance().newTransformer();
            serializer.setOutputProperty(OutputKeys.ENCODING, "UTF-8");
            final Writer writer = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            serializer.transform(new DOMSource(root), new StreamResult(writer));
            writer.write('\n');
            writer.flush();
        } catch (TransformerException e) {
            throw new IOException("cannot write the SVG document: " + e.getMessage(), e);
        }
    }

    private static void style(XYPlot plot) {
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xDD, 0xDD, 0xDD));
        plot.setRangeGridlinePaint(new Color(0xDD, 0xDD, 0xDD));
        plot.setOutlinePaint(Color.GRAY);
    }

    private static JFreeChart chart(String title, XYPlot plot, boolean legend) {
        final JFreeChart chart = new JFreeChart(title,
            new Font(Font.SANS_SERIF, Font.BOLD, 15), plot, legend);
        chart.setBackgroundPaint(Color.WHITE);
        chart.setAntiAlias(true);
        return chart;
    }

    /**
     * Embeds an image (the plan view's cells) as a base64 PNG written by ImageIO; Batik's own
     * encoder looks for a PNG writer in a module not bundled here.
     */
    private static final class PngDataUri extends ImageHandlerBase64Encoder {
        @Override
        public void encodeImage(RenderedImage image, OutputStream out)
                throws SVGGraphics2DIOException {
            try {
                if (!ImageIO.write(image, "png", out)) {
                    throw new SVGGraphics2DIOException("no PNG writer in ImageIO");
                }
                out.flush();
            } catch (IOException e) {
                throw new SVGGraphics2DIOException(e);
            }
        }
    }

    /**
     * A colour ramp from white (0) through blue, green and yellow to red (the maximum), linear in
     * c; values above the maximum take the top colour.
     */
    private static final class Ramp implements PaintScale {
        private static final Color[] STOPS = {
            Color.WHITE, new Color(0x9E, 0xCA, 0xE1), new Color(0x31, 0x82, 0xBD),
            new Color(0x31, 0xA3, 0x54), new Color(0xFE, 0xD9, 0x76), new Color(0xF0, 0x3B, 0x20)};

        private final double upper;

        Ramp(double upper) {
            this.upper = upper;
        }

        @Override
        public double getLowerBound() {
            return 0.0;
        }

        @Override
        public double getUpperBound() {
            return upper;
        }

        @Override
        public Paint getPaint(double value) {
            final double u = Math.max(0.0, Math.min(1.0, value / upper));
            if (!(u >= 0)) {
                return STOPS[0];
            }
            final double pos = u * (STOPS.length - 1);
            final int k = Math.min((int) pos, STOPS.length - 2);
            final double f = pos - k;
            final Color a = STOPS[k];
            final Color b = STOPS[k + 1];
            return new Color(mix(a.getRed(), b.getRed(), f), mix(a.getGreen(), b.getGreen(), f),
                mix(a.getBlue(), b.getBlue(), f));
        }

        private static int mix(int a, int b, double f) {
            return (int) Math.round(a + (b - a) * f);
        }
    }
}
