package org.littoral.scenarios.demo;

import java.nio.file.Path;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.output.OutputFolder;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code littoral make-demo-data}: regenerates the INVENTED demo campaign from its seed. */
@Command(name = "make-demo-data", mixinStandardHelpOptions = true,
        description = "Write the INVENTED demo campaign (Quillmarsh Reach): coast, days, true passages, binned and "
                + "raw profiles. Invented data for demonstration; not observations.")
public final class MakeDemoDataCommand implements Callable<Integer> {

    @Option(names = "--out", required = true, description = "Output directory (e.g. demo-data).")
    Path out;

    @Option(names = "--seed", description = "Campaign seed (default ${DEFAULT-VALUE}).")
    long seed = DemoCampaign.DEFAULT_SEED;

    @Option(names = "--raw-days", split = ",", paramLabel = "DAY[:SITE]",
            description = "Site-days to write as raw 10 Hz files: ISO dates (both sites), DATE:SITE (one site), "
                    + "'all' or 'none' (default: the bay-shore site on the first bay-breeze-first day).")
    List<String> rawDays;

    @Override
    public Integer call() throws Exception {
        OutputFolder.usable(out);
        DemoCampaign campaign = DemoCampaign.generate(seed);
        DemoDataWriter writer = new DemoDataWriter(campaign);
        List<DemoDataWriter.RawSiteDay> raw = rawDays == null ? writer.defaultRawSiteDays() : parseRawDays(campaign, rawDays);
        writer.writeAll(out, raw);
        System.out.println("wrote INVENTED demo campaign (" + campaign.days().size() + " days, raw: " + raw.size()
                + " site-days) to " + out);
        return 0;
    }

    static List<DemoDataWriter.RawSiteDay> parseRawDays(DemoCampaign campaign, List<String> values) {
        List<DemoDataWriter.RawSiteDay> out = new ArrayList<>();
        for (String v : values) {
            String s = v.trim();
            if (s.equals("none")) {
                continue;
            }
            List<LocalDate> dates = new ArrayList<>();
            String siteName = null;
            if (s.equals("all")) {
                campaign.days().forEach(d -> dates.add(d.date()));
            } else {
                String[] parts = s.split(":", 2);
                siteName = parts.length == 2 ? parts[1] : null;
                try {
                    LocalDate date = LocalDate.parse(parts[0]);
                    campaign.day(date);
                    dates.add(date);
                } catch (DateTimeParseException e) {
                    throw new UserInputException("--raw-days: '" + s + "' is not an ISO date; give dates like 2031-06-20, "
                            + "2031-06-20:marsh-4km, 'all' or 'none'");
                } catch (IllegalArgumentException e) {
                    throw new UserInputException("--raw-days: " + e.getMessage());
                }
            }
            for (LocalDate date : dates) {
                for (int i = 0; i < DemoCoast.SITES.size(); i++) {
                    if (siteName == null || DemoCoast.SITES.get(i).name().equals(siteName)) {
                        out.add(new DemoDataWriter.RawSiteDay(date, i));
                    }
                }
            }
            if (siteName != null && DemoCoast.SITES.stream().noneMatch(x -> x.name().equals(v.trim().split(":", 2)[1]))) {
                throw new UserInputException("--raw-days: unknown site in '" + s + "'; the sites are marsh-4km and plain-25km");
            }
        }
        return out;
    }
}
