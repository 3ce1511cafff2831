package org.annalist.analysis.breaks;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * When a large step and the stepped regime's own line read as a fall (or rise) that moved back: the
 * climb along the stepped line must go beyond what the old line's slope would have carried. The
 * breaks are invented, shaped like a fitted fall-and-return on a rising monthly series.
 */
class RegimesEpisodesTest {

    private static final Regimes REGIMES = new Regimes(new double[0], BaiPerron.Model.LEVEL_AND_SLOPE, 12, false,
            0.05);

    /** A break as the regimes' fit describes it; only what {@link Regimes#episodes} reads is set. */
    private static BreakSearch.Break fitted(int start, double before, double after, double slopeBefore,
                                            double slopeAfter, int end, double endLevel) {
        return new BreakSearch.Break(start, start, start, before, after, 100 * (after - before) / before,
                Optional.empty(), false, slopeBefore, slopeAfter, 0, Optional.empty(), end, endLevel, Optional.empty());
    }

    @Test
    void aFallThatClimbsBackFarFasterThanTheOldLineRoseIsAnEpisodeThoughALaterStepTakesSomeBack() {
        // rising 1.3 % a year to 67,000; at 120 a fall to 22,500, climbing back along its own line to
        // 67,000 at the instant of the next break (its level before); then a step down of 9.6 % whose
        // regime ends at 66,700, below the climb's end
        BreakSearch.Break fall = fitted(120, 67_000, 22_500, 73, 2_120, 140, 67_000 - 2_120 / 2.0);
        BreakSearch.Break stepDown = fitted(141, 67_000, 60_600, 2_120, 90, 189, 66_700);
        List<BreakSearch.Episode> episodes = REGIMES.episodes(List.of(fall, stepDown), -10, 3);
        assertThat(episodes).hasSize(1);
        BreakSearch.Episode e = episodes.get(0);
        assertThat(e.start()).isEqualTo(120);
        assertThat(e.rise()).isFalse();
        assertThat(e.returnStart()).isEmpty();   // the stepped line moved back by itself
        assertThat(e.asOf()).isEqualTo(140);
        assertThat(e.returnedShare()).isEqualTo(1.0);   // (67,000 − 22,500) / (67,000 − 22,500)
    }

    @Test
    void aReturnOnARegimeALaterBreakEndsIsReadAtThatBreakNotHalfAPeriodBefore() {
        // a fall at 120 from 10,000 to 4,000 whose line climbs 300 a period: at the middle of its last
        // period, 139, it stands at 4,000 + 300 × 19.5 = 9,850; at the next break's instant, 10,000
        // (derived in the test), the level the next break prints just before it
        BreakSearch.Break fall = fitted(120, 10_000, 4_000, 0, 300, 139, 4_000 + 300 * 19.5);
        BreakSearch.Break bend = fitted(140, 4_000 + 300 * 20, 4_000 + 300 * 20, 300, 0, 179, 10_000);
        BreakSearch.Episode e = REGIMES.episodes(List.of(fall, bend), -10, 3).get(0);
        assertThat(e.asOf()).isEqualTo(139);
        assertThat(e.returnedLevel()).isEqualTo(bend.levelBefore());
        assertThat(e.returnedShare()).isEqualTo(1.0);   // (10,000 − 4,000) / (10,000 − 4,000)
    }

    @Test
    void aSteppedLineThatOnlyCarriesOnTheOldRiseIsNoReturn() {
        // rising 200 a period to 10,000; a fall to 6,000 whose line rises 200 a period too (in
        // units) and, in a second case, at the old rate of 2 % a period from its lower level
        BreakSearch.Break sameUnits = fitted(60, 10_000, 6_000, 200, 200, 79, 6_000 + 200 * 19.5);
        BreakSearch.Break sameRate = fitted(60, 10_000, 6_000, 200, 120, 79, 6_000 + 120 * 19.5);
        for (BreakSearch.Break fall : List.of(sameUnits, sameRate)) {
            assertThat(REGIMES.episodes(List.of(fall), -10, 3)).as("slope after %s", fall.slopeAfter()).isEmpty();
        }
    }

    @Test
    void aSteppedLineThatClimbsBackWhileTheOldOneFellIsAnEpisodeAsBefore() {
        // falling 20 a period; a fall from 10,000 to 6,000, its line then climbing 100 a period
        BreakSearch.Break fall = fitted(60, 10_000, 6_000, -20, 100, 79, 6_000 + 100 * 19.5);
        assertThat(REGIMES.episodes(List.of(fall), -10, 3)).hasSize(1);
    }
}
