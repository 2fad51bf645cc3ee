import { mulberry32 } from '@shared/estimation/random/mulberry32';
import { qualityThresholds } from '@shared/field-sync/quality/quality-thresholds';
import { tooShortFlag } from '@shared/field-sync/quality/too-short-flag';
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
 * supervisor reviewed and accepted, so the flag filter has something to do; that flag is raised by
 * the live check on a duration below the live limit, so the demo reads as the app judges.
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
      const answeredBlocks = Object.keys(answers).length;
      const finishedAt = new Date(
        startedAt.getTime() + (flagged ? rushedSeconds(answeredBlocks) : minutes * 60) * 1000,
      );
      const flag = tooShortFlag(startedAt.toISOString(), finishedAt.toISOString(), answeredBlocks);
      interviews.push({
        id,
        site,
        questionnaire: shop ? 'shelf' : 'household',
        answers,
        flags: flagged && flag ? [flag] : [],
        startedAt,
        finishedAt,
      });
    }
  }
  return interviews;
}

/** Three quarters of the live limit per block: clearly too quick, yet a plausible rush. */
function rushedSeconds(answeredBlocks: number): number {
  return Math.round(answeredBlocks * qualityThresholds.minSecondsPerAnsweredBlock * 0.75);
}
