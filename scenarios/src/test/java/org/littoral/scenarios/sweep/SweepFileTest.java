package org.littoral.scenarios.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.input.UserInputException;

class SweepFileTest {

    static final String BASE = """
            base:
              kind: linear
              coast: {latitude_deg: 40.0, bearing_land_to_sea_deg: 270.0}
              ambient_wind: {from_deg: 270.0, speed_m_per_s: 0.0}
              heating: {peak_flux_difference_W_per_m2: 250.0}
              atmosphere: {buoyancy_frequency_per_s: 0.01}
              surface:
                segments:
                  - {name: sea, kind: water, sst_K: 291.0}
                  - {name: bay, kind: water, sst_K: 293.0}
                  - {name: land, kind: land, bowen_ratio: 1.0}
            """;

    @TempDir
    Path tmp;

    SweepSpec read(String body) throws Exception {
        Path f = tmp.resolve("s.yaml");
        Files.writeString(f, BASE + body);
        return SweepFile.read(f, ScenarioSource.filesAndBuiltins());
    }

    String error(String body) {
        return assertThrows(UserInputException.class, () -> read(body)).getMessage();
    }

    @Test
    void cartesianAxesGiveEveryCombinationWithTheFirstAxisSlowest() throws Exception {
        SweepSpec s = read("""
                axes:
                  ambient_wind.from_deg: [90, 270]
                  ambient_wind.speed_m_per_s: {from: 0, to: 4, step: 2}
                """);
        List<Member> m = MemberExpander.expand(s);
        assertEquals(6, m.size());
        assertEquals("ambient_wind.from_deg=90, ambient_wind.speed_m_per_s=0", m.get(0).describe());
        assertEquals("ambient_wind.from_deg=90, ambient_wind.speed_m_per_s=2", m.get(1).describe());
        assertEquals("ambient_wind.from_deg=270, ambient_wind.speed_m_per_s=4", m.get(5).describe());
        assertEquals(4.0, m.get(5).document().get("ambient_wind").get("speed_m_per_s").asDouble());
        assertEquals(270.0, s.base().get("ambient_wind").get("from_deg").asDouble(), "the base document is not modified");
        assertEquals("m0005", m.get(5).id());
    }

    @Test
    void zipAxesAdvanceTogether() throws Exception {
        SweepSpec s = read("""
                mode: zip
                axes:
                  ambient_wind.from_deg: [90, 180, 270]
                  ambient_wind.speed_m_per_s: [1, 3, 5]
                """);
        List<Member> m = MemberExpander.expand(s);
        assertEquals(3, m.size());
        assertEquals("ambient_wind.from_deg=180, ambient_wind.speed_m_per_s=3", m.get(1).describe());
    }

    @Test
    void aDecimalRangeStepsExactlyAndIncludesItsEnd() throws Exception {
        SweepSpec s = read("""
                axes:
                  atmosphere.buoyancy_frequency_per_s: {from: 0.006, to: 0.012, step: 0.002}
                """);
        List<String> labels = s.axes().get(0).values().stream().map(AxisValue::label).toList();
        assertEquals(List.of("0.006", "0.008", "0.01", "0.012"), labels);
    }

    @Test
    void namedChoicesSweepWholeSubDocumentsSuchAsCoastLayouts() throws Exception {
        SweepSpec s = read("""
                axes:
                  surface.segments:
                    choices:
                      sea-land: [{name: sea, kind: water, sst_K: 291.0}, {name: land, kind: land, bowen_ratio: 1.0}]
                      sea-bay-land: [{name: sea, kind: water, sst_K: 291.0}, {name: bay, kind: water, sst_K: 294.0}, {name: land, kind: land, bowen_ratio: 1.0}]
                """);
        List<Member> m = MemberExpander.expand(s);
        assertEquals(2, m.size());
        assertEquals("sea-bay-land", m.get(1).settings().get(0).value().label());
        assertEquals(3, m.get(1).document().get("surface").get("segments").size());
    }

    @Test
    void aSegmentIsSelectedByName() throws Exception {
        SweepSpec s = read("""
                axes:
                  surface.segments[name=bay].sst_K: [290, 296]
                """);
        Member m = MemberExpander.expand(s).get(1);
        assertEquals(296, m.document().get("surface").get("segments").get(1).get("sst_K").asInt());
        assertEquals(291.0, m.document().get("surface").get("segments").get(0).get("sst_K").asDouble());
    }

    @Test
    void anUnknownTopLevelKeyIsNamedWithTheAllowedKeys() {
        String e = error("axis:\n  ambient_wind.from_deg: [90]\n");
        assertTrue(e.contains("s.yaml:12:1: unknown key 'axis' (did you mean 'axes'?)"), e);
    }

    @Test
    void aMisspeltKeyPathIsNamedWithTheKeysThatExist() {
        String e = error("axes:\n  ambient_wind.speed_m_per_sec: [1, 2]\n");
        assertTrue(e.contains("s.yaml:13:33: axes.ambient_wind.speed_m_per_sec") && e.contains("no key 'speed_m_per_sec'")
                && e.contains("from_deg, speed_m_per_s"), e);
    }

    @Test
    void aValueOutsideItsRangeIsNamedWithKeyValueAndRange() {
        String e = error("axes:\n  ambient_wind.speed_m_per_s: [2, 55]\n");
        assertTrue(e.contains("axes.ambient_wind.speed_m_per_s[1]: 55 is outside the allowed range") && e.contains("give 0 to 40 m/s"), e);
        String lat = error("axes:\n  coast.latitude_deg: {from: 30, to: 100, step: 10}\n");
        assertTrue(lat.contains("coast.latitude_deg (value 100 of the range)") && lat.contains("-90 to 90"), lat);
    }

    @Test
    void aValueOfTheWrongTypeIsRejected() {
        String e = error("axes:\n  ambient_wind.from_deg: [west]\n");
        assertTrue(e.contains("axes.ambient_wind.from_deg[0]: 'west' is not a number; give a number"), e);
    }

    @Test
    void zipAxesOfDifferentLengthsAreRejected() {
        String e = error("mode: zip\naxes:\n  ambient_wind.from_deg: [90, 180]\n  ambient_wind.speed_m_per_s: [1]\n");
        assertTrue(e.contains("axes.ambient_wind.speed_m_per_s") && e.contains("same number of values"), e);
    }

    @Test
    void aBadModeAndABadRangeAreNamed() {
        assertTrue(error("mode: grid\naxes:\n  ambient_wind.from_deg: [90]\n").contains("mode: value 'grid' is not allowed; use"));
        String e = error("axes:\n  ambient_wind.speed_m_per_s: {from: 1, to: 5, step: 0}\n");
        assertTrue(e.contains("axes.ambient_wind.speed_m_per_s.step: 0 is not above 0; give a positive step"), e);
        String k = error("axes:\n  ambient_wind.speed_m_per_s: {from: 1, to: 5, stride: 1}\n");
        assertTrue(k.contains("unknown key 'axes.ambient_wind.speed_m_per_s.stride'"), k);
    }

    @Test
    void aSelectorThatMatchesNothingListsTheNamesThere() {
        String e = error("axes:\n  surface.segments[name=lagoon].sst_K: [290]\n");
        assertTrue(e.contains("lagoon") && e.contains("[sea, bay, land]"), e);
    }

    @Test
    void ensembleDrawsAreReproducibleFromTheSeedAndIndependentOfTheMemberCount() throws Exception {
        String ens = """
                ensemble:
                  members: %d
                  seed: %d
                  draws:
                    ambient_wind.speed_m_per_s: {normal: {mean: 4, sd: 2, min: 0, max: 10}}
                    ambient_wind.from_deg: {uniform: {from: 180, to: 360}}
                    heating.peak_flux_difference_W_per_m2: {choice: [200, 300, 400], weights: [1, 2, 1]}
                """;
        List<Member> a = MemberExpander.expand(read(ens.formatted(10, 42)));
        List<Member> b = MemberExpander.expand(read(ens.formatted(10, 42)));
        List<Member> longer = MemberExpander.expand(read(ens.formatted(20, 42)));
        List<Member> other = MemberExpander.expand(read(ens.formatted(10, 43)));
        for (int i = 0; i < 10; i++) {
            assertEquals(a.get(i).inputsSha256(), b.get(i).inputsSha256());
            assertEquals(a.get(i).inputsSha256(), longer.get(i).inputsSha256(), "member " + i + " does not depend on the count");
        }
        assertNotEquals(a.get(0).inputsSha256(), other.get(0).inputsSha256());
        for (Member m : longer) {
            double v = m.document().get("ambient_wind").get("speed_m_per_s").asDouble();
            assertTrue(v >= 0 && v <= 10, "truncated normal stays inside [min, max]: " + v);
        }
    }

    @Test
    void ensembleDrawsCombineWithAxesUsingTheSameDrawsAtEveryAxisPoint() throws Exception {
        SweepSpec s = read("""
                axes:
                  ambient_wind.from_deg: [90, 270]
                ensemble:
                  members: 3
                  seed: 7
                  draws:
                    heating.peak_flux_difference_W_per_m2: {uniform: {from: 150, to: 350}}
                """);
        List<Member> m = MemberExpander.expand(s);
        assertEquals(6, m.size());
        for (int e = 0; e < 3; e++) {
            assertEquals(m.get(e).settings().get(1).value().value(), m.get(3 + e).settings().get(1).value().value());
        }
    }

    @Test
    void badDistributionsAreNamedWithTheirKeyPath() {
        String ens = "ensemble:\n  members: 5\n  seed: 1\n  draws:\n    %s\n";
        String a = error(ens.formatted("ambient_wind.speed_m_per_s: {normal: {mean: 4, sd: -1}}"));
        assertTrue(a.contains("ensemble.draws.ambient_wind.speed_m_per_s.normal.sd: -1 is not above 0"), a);
        String b = error(ens.formatted("ambient_wind.speed_m_per_s: {uniform: {from: 0, to: 60}}"));
        assertTrue(b.contains("uniform.to: 60 is outside the allowed range") && b.contains("0 to 40"), b);
        String c = error(ens.formatted("ambient_wind.speed_m_per_s: {gamma: {k: 2}}"));
        assertTrue(c.contains("unknown distribution 'gamma'; use uniform, normal or choice"), c);
        String d = error(ens.formatted("ambient_wind.speed_m_per_s: {normal: {mean: 30, sd: 1, min: 0, max: 5}}"));
        assertTrue(d.contains("lies in [0.0, 5.0]"), d);
        String seed = error("ensemble:\n  members: 5\n  draws:\n    ambient_wind.speed_m_per_s: {uniform: {from: 0, to: 5}}\n");
        assertTrue(seed.contains("ensemble.seed"), seed);
    }

    @Test
    void theBaseScenarioCanBeAFileNextToTheSweepFile() throws Exception {
        ObjectNode base = (ObjectNode) ScenarioSource.yaml().readTree(BASE).get("base");
        Files.writeString(tmp.resolve("coast.yaml"), ScenarioSource.yaml().writeValueAsString(base));
        Path f = tmp.resolve("by-path.yaml");
        Files.writeString(f, "base: coast.yaml\naxes:\n  ambient_wind.from_deg: [0, 90]\n");
        SweepSpec s = SweepFile.read(f, ScenarioSource.filesAndBuiltins());
        assertEquals("coast.yaml", s.baseLabel());
        assertEquals(2, s.memberCount());
        Files.writeString(f, "base: nowhere.yaml\naxes:\n  ambient_wind.from_deg: [0, 90]\n");
        String e = assertThrows(UserInputException.class, () -> SweepFile.read(f, ScenarioSource.filesAndBuiltins())).getMessage();
        assertTrue(e.contains("by-path.yaml:1:7: base:") && e.contains("nowhere.yaml"), e);
    }
}
