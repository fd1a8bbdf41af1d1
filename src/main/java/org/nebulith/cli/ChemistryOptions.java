package org.nebulith.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import java.util.Optional;
import org.nebulith.composition.AbundanceFileReader;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.AbundanceSet;
import org.nebulith.composition.CarbonToOxygen;
import org.nebulith.composition.DustEnrichment;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.equilibrium.SystemSpec;
import org.nebulith.errors.InputException;

import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * The options shared by every command that builds a gas composition and a chemical system:
 * composition (preset, file or inline), dust enrichment, C/O, and the {@link SystemOptions} (data
 * set, alternative mineral rows, user species, species restrictions and solutions).
 */
public final class ChemistryOptions {

    @Option(names = "--composition", paramLabel = "NAME|FILE",
            description = "Gas composition: a preset name (see 'nebulith presets': protosolar-lodders2003, "
                    + "photosphere-asplund2009, ci-chondrite, star-tessaly) or an abundance file. Default: "
                    + "protosolar-lodders2003 (planet: the invented demo star star-tessaly).")
    private String composition;

    private String defaultComposition = AbundancePresets.PROTOSOLAR_LODDERS2003;

    /** @param preset the composition used when neither --composition nor --elements is given */
    public void defaultComposition(String preset) {
        this.defaultComposition = preset;
    }

    private String compositionArg() {
        return composition != null ? composition : defaultComposition;
    }

    @Option(names = "--elements", paramLabel = "X=n,...",
            description = "Inline composition in moles, such as H=1,O=5e-4 (replaces --composition).")
    private String elements;

    @Option(names = "--dust-enrichment", paramLabel = "F", defaultValue = "1",
            description = "Add (F-1) times the CI-chondrite dust per Si of the gas; 1 means none, at most 100000. Default: ${DEFAULT-VALUE}.")
    private double dustEnrichment;

    /** Largest dust enrichment accepted (the gas is then essentially evaporated CI dust). */
    static final double MAX_DUST_ENRICHMENT = 100_000;

    @Option(names = "--C-O", paramLabel = "RATIO",
            description = "Set the C/O atom ratio by changing C only.")
    private Double carbonToOxygen;

    @Mixin
    private SystemOptions system = new SystemOptions();

    @Option(names = "--ci-reference", paramLabel = "NAME",
            description = "CI-chondrite composition of the dust (--dust-enrichment) and of the comparisons: "
                    + "lodders-palme-gail2009 (Lodders, Palme & Gail 2009; the only CI table here with C, N, O, Cl) "
                    + "or palme-oneill2014 (Palme & O'Neill 2014; no C, N, Cl). Default: ${DEFAULT-VALUE}.")
    private String ciReference = org.nebulith.composition.CiReference.DEFAULT.optionName();

    /**
     * @param context the run (inputs are registered with it)
     * @return the gas composition after dust enrichment and C/O override [mol]
     */
    public ElementAbundances composition(RunContext context) {
        ElementAbundances base = baseComposition(context).abundances();
        if (base.asMap().values().stream().allMatch(v -> v == 0)) {
            throw elements != null
                    ? InputException.atOption("--elements", elements, "every amount is zero", "at least one amount > 0")
                    : InputException.atOption("--composition", compositionArg(), "every amount is zero",
                            "a composition with at least one amount > 0");
        }
        if (!(dustEnrichment >= 1) || dustEnrichment > MAX_DUST_ENRICHMENT) {
            throw InputException.atOption("--dust-enrichment", Double.toString(dustEnrichment),
                    dustEnrichment > MAX_DUST_ENRICHMENT ? "more than " + (long) MAX_DUST_ENRICHMENT + " times the CI dust"
                            : "enrichment below 1 would remove dust", "a factor from 1 to " + (long) MAX_DUST_ENRICHMENT);
        }
        if (dustEnrichment > 1) {
            String ci = ciReference().preset();
            base = DustEnrichment.enrich(base, namedComposition(context, ci, "dust composition")
                    .map(AbundanceSet::abundances).orElseGet(() -> ciReference().abundances()), dustEnrichment);
        }
        if (carbonToOxygen != null) {
            if (!(carbonToOxygen > 0) || Double.isInfinite(carbonToOxygen)) {
                throw InputException.atOption("--C-O", carbonToOxygen.toString(), "not a positive ratio",
                        "a number > 0");
            }
            base = CarbonToOxygen.withCarbonToOxygen(base, carbonToOxygen);
        }
        return base;
    }

    /** @param context the run @return the composition as given, with its provenance */
    public AbundanceSet baseComposition(RunContext context) {
        resolvedBase = resolveBase(context);
        return resolvedBase;
    }

    /** The composition last resolved by {@link #baseComposition}, kept so that citing it registers nothing again. */
    private AbundanceSet resolvedBase;

    private AbundanceSet resolveBase(RunContext context) {
        try {
            if (elements != null) {
                return AbundancePresets.resolve(elements);
            }
            String arg = compositionArg();
            Optional<AbundanceSet> named = namedComposition(context, arg, "composition");
            if (named.isPresent()) {
                return named.get();
            }
            Path p = Path.of(arg);
            if (Files.exists(p)) {
                context.input(p, "composition");
            }
            return AbundancePresets.resolve(arg);
        } catch (IOException e) {
            throw InputException.atOption("--composition", compositionArg(), "cannot be read (" + e.getMessage() + ")",
                    "a preset name, a readable abundance file, or Element=amount pairs");
        } catch (IllegalArgumentException e) {
            throw InputException.atOption(elements != null ? "--elements" : "--composition",
                    elements != null ? elements : compositionArg(), e.getMessage(),
                    "a preset (" + String.join(", ", AbundancePresets.NAMES) + "), an abundance file, or "
                            + "Element=amount pairs such as H=1,O=4.9e-4");
        }
    }

    /**
     * @param context the run
     * @return the composition's reference for a report: its name and the provenance of its file
     */
    public String citeComposition(RunContext context) {
        AbundanceSet set = resolvedBase != null ? resolvedBase : baseComposition(context);
        String text = String.join(" ", set.provenance()).strip();
        return set.name() + (text.isEmpty() ? "" : ": " + text);
    }

    /**
     * @param context the run (the preset is registered with its checksum)
     * @param name    a preset name
     * @param role    what it is for
     * @return the composition of the working folder's presets/NAME.csv, else of the built-in copy
     */
    private static Optional<AbundanceSet> namedComposition(RunContext context, String name, String role) {
        Optional<PresetCatalogue.Entry> e = PresetCatalogue.here().find(PresetCatalogue.Kind.COMPOSITION, name);
        if (e.isEmpty()) {
            return Optional.empty();
        }
        context.namedInput(e.get(), role + " preset");
        try {
            return Optional.of(AbundanceFileReader.read(new java.io.StringReader(e.get().text()), e.get().shown()));
        } catch (IOException ex) {
            throw new java.io.UncheckedIOException(ex);
        }
    }

    /** @return a one-line description of the composition options, for reports */
    public String describeComposition() {
        StringBuilder sb = new StringBuilder(elements != null ? "inline " + elements : compositionArg());
        if (dustEnrichment != 1) {
            sb.append("; dust enrichment ").append(dustEnrichment).append(" (CI chondrite of ")
                    .append(ciReference().citation()).append(')');
        }
        if (carbonToOxygen != null) {
            sb.append("; C/O set to ").append(carbonToOxygen);
        }
        return sb.toString();
    }

    /**
     * @param context the run (list and species files are registered as inputs)
     * @return the system specification
     * @throws IOException if a list or species file cannot be read
     */
    public SystemSpec systemSpec(RunContext context) throws IOException {
        return system.systemSpec(context);
    }

    /**
     * @return the CI-chondrite reference of the run (dust and comparisons)
     * @throws InputException for an unknown name
     */
    public org.nebulith.composition.CiReference ciReference() {
        try {
            return org.nebulith.composition.CiReference.fromOptionName(ciReference);
        } catch (IllegalArgumentException e) {
            throw InputException.atOption("--ci-reference", ciReference, "unknown CI reference",
                    org.nebulith.composition.CiReference.accepted());
        }
    }
}
