import { mulberry32 } from '@shared/estimation/random/mulberry32';
import { householdAnswers, shelfAnswers } from './lantern-answers';
import { lanternSites, type LanternSite } from './lantern-sites';
import { lanternFieldwork } from './lantern-study';
import { lanternTruths } from './lantern-truths';
import { seededUuid } from './seeded-uuid';

/** One demo interview before it is tied to the database's ids. */
export interface LanternInterview {
  readonly id: string;
  readonly site: LanternSite;
  readonly questionnaire: 'shelf' | 'household';
  readonly answers: Record<string, unknown>;
  readonly flags: unknown[];
  readonly startedAt: Date;
  readonly finishedAt: Date;
}

/**
 * Every demo interview, drawn from the truths with a seeded generator: the same interviews,
 * ids and answers on every machine. One household in 25 carries a "too short" flag that a
 * supervisor reviewed and accepted, so the flag filter has something to do.
 */
export function lanternInterviews(): LanternInterview[] {
  const uniform = mulberry32(lanternTruths.seed);
  const interviews: LanternInterview[] = [];
  let households = 0;
  for (const site of lanternSites) {
    for (let k = 0; k < site.interviews; k++) {
      const shop = site.kind === 'shop';
      const id = seededUuid(uniform);
      const answers = shop
        ? shelfAnswers(uniform, site.region)
        : householdAnswers(uniform, site.region, households);
      const minutes = shop ? 3 + uniform() * 3 : 8 + uniform() * 10;
      const flagged = !shop && households % 25 === 24;
      if (!shop) households++;
      const day = Math.floor(uniform() * lanternFieldwork.days);
      const startedAt = new Date(
        Date.parse(`${lanternFieldwork.start}T08:00:00Z`) +
          day * 86_400_000 +
          uniform() * 8 * 3_600_000,
      );
      interviews.push({
        id,
        site,
        questionnaire: shop ? 'shelf' : 'household',
        answers,
        flags: flagged ? [tooShort(minutes)] : [],
        startedAt,
        finishedAt: new Date(startedAt.getTime() + (flagged ? 2 : minutes) * 60_000),
      });
    }
  }
  return interviews;
}

function tooShort(minutes: number) {
  const seconds = Math.round(Math.min(minutes, 2) * 60);
  return {
    kind: 'too-short',
    durationSeconds: seconds,
    answeredBlocks: 8,
    secondsPerBlock: seconds / 8,
    minSecondsPerBlock: 20,
  };
}
