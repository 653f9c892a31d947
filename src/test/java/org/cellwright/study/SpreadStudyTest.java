package org.cellwright.study;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.cellwright.cell.Scenario;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** The spread study: figures that physics pins stay pinned, the others spread; seeds reproduce. */
class SpreadStudyTest {

    private static final double AMPS = 3.0;
    private static final double SECONDS = 3600;
    private static SpreadResult silver;

    @BeforeAll
    static void study() {
        silver = new SpreadStudy(StudyScenarios.library(), 2).run(StudyScenarios.silverRefining(AMPS, SECONDS), 24,
                7, StudyProgress.NONE, Cancellation.none());
    }

    @Test
    void faradaysLawHoldsInEverySampleWhileTheCellVoltageSpreads() {
        assertEquals(24, silver.ran());
        Percentiles dep = silver.figures().get(SummaryFigure.DEPOSIT);
        // source: Faraday's law, m = I t M / F for Ag+ (z = 1); a soluble silver anode keeps CE at 1 whatever
        // the kinetics, transport and conductivity: the whole 5-95 % range within 0.5 % of it
        double faraday = AMPS * SECONDS * StudyScenarios.AG_KG_PER_MOL / StudyScenarios.F;
        assertEquals(faraday, dep.p5(), 5e-3 * faraday);
        assertEquals(faraday, dep.p95(), 5e-3 * faraday);
        Percentiles v = silver.figures().get(SummaryFigure.VOLTAGE_MEAN);
        // the conductivity (sd 4 %) alone moves the ohmic drop: the range must open up
        assertTrue(v.p95() - v.p5() > 0.02 * v.p50(), v.toString());
        assertTrue(v.p5() <= v.p50() && v.p50() <= v.p95());
    }

    @Test
    void bandsFollowTheNominalOutputTimes() {
        SeriesBands b = silver.bands();
        assertEquals(silver.nominal().trace().size(), b.timeS().length);
        SeriesBands.Band dep = b.band("deposit:Ag");
        assertEquals(0, dep.p95()[0], 1e-12);
        int last = b.timeS().length - 1;
        assertTrue(dep.p5()[last] > 0.99 * silver.nominal().summary().depositKg().get("Ag"));
        SeriesBands.Band u = b.band("cell_voltage");
        for (int g = 0; g < b.timeS().length; g++) {
            assertTrue(u.p5()[g] <= u.p50()[g] && u.p50()[g] <= u.p95()[g], "ordered at " + g);
        }
        assertTrue(b.band("c:Ag+") != null && b.band("efficiency_cumulative") != null);
    }

    @Test
    void aSeedGivesTheSameRangesOnAnyNumberOfThreads() {
        Scenario sc = StudyScenarios.silverRefining(AMPS, 1800);
        SpreadResult one = new SpreadStudy(StudyScenarios.library(), 1).run(sc, 6, 99, StudyProgress.NONE,
                Cancellation.none());
        SpreadResult two = new SpreadStudy(StudyScenarios.library(), 2).run(sc, 6, 99, StudyProgress.NONE,
                Cancellation.none());
        assertEquals(one.figures(), two.figures());
        assertArrayEquals(one.bands().band("cell_voltage").p95(), two.bands().band("cell_voltage").p95());
    }

    @Test
    void cancellingKeepsWhatRanAndBadCountsAreRefused() {
        Cancellation cancel = Cancellation.none();
        SpreadResult r = new SpreadStudy(StudyScenarios.library(), 1).run(StudyScenarios.silverRefining(AMPS, 1800),
                10, 1, (done, total) -> {
                    if (done == 4) {
                        cancel.cancel();
                    }
                }, cancel);
        assertTrue(r.cancelled());
        assertEquals(4, r.ran());
        SpreadStudy s = new SpreadStudy(StudyScenarios.library(), 1);
        Scenario sc = StudyScenarios.silverRefining(AMPS, 1800);
        assertThrows(IllegalArgumentException.class, () -> s.run(sc, 0, 1, StudyProgress.NONE, Cancellation.none()));
    }
}
