package org.nebulith.report.html;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.nebulith.files.RunInputs;
import org.nebulith.files.Table;
import org.nebulith.report.chart.ChartRenderer;

/**
 * The content of one run's report, built section by section and written as one self-contained
 * HTML file ({@link HtmlReportWriter}) and a short Markdown summary ({@link MarkdownSummaryWriter}).
 *
 * <pre>{@code
 * Report report = new Report("Keroa b: bulk composition", "nebulith planet", version, started);
 * report.section("Bulk composition").paragraph("...").table(bulk, "Molar ratios").chart(rendered, "...");
 * report.caution("Ideal solid solutions; no kinetics.");
 * report.citation("Lodders 2003", "Lodders, K. 2003, ApJ 591, 1220: solar system abundances");
 * report.inputs(context.inputs()).setting("P-bar", "1e-4", "command line");
 * run.writeText("report.html", HtmlReportWriter.write(report.finish(Instant.now())));
 * }</pre>
 */
public final class Report {

    /** A block of a section. */
    public sealed interface Block permits Paragraph, TableBlock, ChartBlock {
    }

    /** @param text plain text */
    public record Paragraph(String text) implements Block {
    }

    /**
     * @param table   the table
     * @param caption caption shown above it
     * @param summary whether the Markdown summary repeats it
     */
    public record TableBlock(Table table, String caption, boolean summary) implements Block {
    }

    /**
     * @param chart   the rendered chart (PNG embedded; SVG and PDF linked by file name)
     * @param caption caption shown below it
     */
    public record ChartBlock(ChartRenderer.Rendered chart, String caption) implements Block {
    }

    /** A titled section. */
    public static final class Section {
        private final String title;
        private final List<Block> blocks = new ArrayList<>();

        private Section(final String title) {
            this.title = Objects.requireNonNull(title);
        }

        /** @return the title */
        public String title() {
            return title;
        }

        /** @return the blocks in order */
        public List<Block> blocks() {
            return List.copyOf(blocks);
        }

        /**
         * @param text plain text
         * @return this
         */
        public Section paragraph(final String text) {
            blocks.add(new Paragraph(text));
            return this;
        }

        /**
         * @param table   a table (numbers formatted as in the CSV files)
         * @param caption caption
         * @return this
         */
        public Section table(final Table table, final String caption) {
            blocks.add(new TableBlock(table, caption, false));
            return this;
        }

        /**
         * A key table, also repeated in the Markdown summary.
         *
         * @param table   a table
         * @param caption caption
         * @return this
         */
        public Section keyTable(final Table table, final String caption) {
            blocks.add(new TableBlock(table, caption, true));
            return this;
        }

        /**
         * @param chart   a chart rendered into the run folder
         * @param caption caption
         * @return this
         */
        public Section chart(final ChartRenderer.Rendered chart, final String caption) {
            blocks.add(new ChartBlock(chart, caption));
            return this;
        }
    }

    /**
     * @param key    short key, e.g. {@code Lodders 2003}
     * @param source full reference
     */
    public record Citation(String key, String source) {
    }

    /**
     * @param key    setting name
     * @param value  value
     * @param origin where it came from
     */
    public record Setting(String key, String value, String origin) {
    }

    private final String title;
    private final String command;
    private final String toolVersion;
    private final Instant started;
    private Instant finished;
    private final List<Section> sections = new ArrayList<>();
    private final List<String> cautions = new ArrayList<>();
    private final List<Citation> citations = new ArrayList<>();
    private final List<Setting> settings = new ArrayList<>();
    private final List<String> outputFiles = new ArrayList<>();
    private RunInputs inputs = new RunInputs();

    /**
     * @param title       report title
     * @param command     the command line or command name that produced it
     * @param toolVersion the tool version
     * @param started     when the run started
     */
    public Report(final String title, final String command, final String toolVersion, final Instant started) {
        this.title = Objects.requireNonNull(title);
        this.command = Objects.requireNonNull(command);
        this.toolVersion = Objects.requireNonNull(toolVersion);
        this.started = Objects.requireNonNull(started);
    }

    /**
     * @param sectionTitle title
     * @return a new section appended to the report
     */
    public Section section(final String sectionTitle) {
        Section s = new Section(sectionTitle);
        sections.add(s);
        return s;
    }

    /**
     * @param text an assumption or caution (validity range, model limitation)
     * @return this
     */
    public Report caution(final String text) {
        cautions.add(text);
        return this;
    }

    /**
     * @param key    short key
     * @param source full reference
     * @return this
     */
    public Report citation(final String key, final String source) {
        citations.add(new Citation(key, source));
        return this;
    }

    /**
     * @param runInputs the run's input files (listed with SHA-256)
     * @return this
     */
    public Report inputs(final RunInputs runInputs) {
        this.inputs = Objects.requireNonNull(runInputs);
        return this;
    }

    /**
     * @param key    setting name
     * @param value  value
     * @param origin where it came from
     * @return this
     */
    public Report setting(final String key, final String value, final String origin) {
        settings.add(new Setting(key, value, origin));
        return this;
    }

    /**
     * @param fileName an output file of the run (listed in the report)
     * @return this
     */
    public Report outputFile(final String fileName) {
        outputFiles.add(fileName);
        return this;
    }

    /**
     * @param end when the run finished
     * @return this
     */
    public Report finish(final Instant end) {
        this.finished = end;
        return this;
    }

    /** @return the title */
    public String title() {
        return title;
    }

    /** @return the command */
    public String command() {
        return command;
    }

    /** @return the tool version */
    public String toolVersion() {
        return toolVersion;
    }

    /** @return when the run started */
    public Instant started() {
        return started;
    }

    /** @return the run time, zero until {@link #finish(Instant)} */
    public Duration runTime() {
        return finished == null ? Duration.ZERO : Duration.between(started, finished);
    }

    /** @return the sections */
    public List<Section> sections() {
        return List.copyOf(sections);
    }

    /** @return the cautions */
    public List<String> cautions() {
        return List.copyOf(cautions);
    }

    /** @return the citations */
    public List<Citation> citations() {
        return List.copyOf(citations);
    }

    /** @return the settings */
    public List<Setting> settings() {
        return List.copyOf(settings);
    }

    /** @return the listed output files */
    public List<String> outputFiles() {
        return List.copyOf(outputFiles);
    }

    /** @return the inputs */
    public RunInputs inputs() {
        return inputs;
    }
}
