import { analysisMethodLabels } from '@shared/analysis/analysis-method';
import { estimateCaution, type ScheduleVersion } from '@shared/analysis/schedule-version';
import type { OutgoingMail } from '../mail/mailer';

/**
 * The e-mail a client of the study gets when a schedule version is published. Version numbers
 * run through the whole study, so the mail says which version a correction replaces, and that
 * a version replacing none starts a schedule of its own.
 */
export function schedulePublishedMail(options: {
  to: { email: string; name: string };
  version: ScheduleVersion;
  /** The number of the version this one replaces, when it replaces one. */
  replacedVersion: number | null;
  link: string;
}): OutgoingMail {
  const { version, replacedVersion } = options;
  const correction =
    replacedVersion !== null
      ? `It replaces version ${replacedVersion}, which stays available for reference.`
      : version.version === 1
        ? 'It is the first version of this schedule.'
        : 'It starts a new schedule for this study; the schedules published before stay as they were.';
  return {
    to: options.to.email,
    subject: `New demand schedule for "${version.studyName}": ${version.title} (version ${version.version})`,
    text: [
      `Hello ${options.to.name},`,
      '',
      `${version.publishedByName} has published version ${version.version} of a demand schedule for the study "${version.studyName}" (${version.productName}).`,
      correction,
      '',
      `Method: ${analysisMethodLabels[version.method]}`,
      `Respondents: ${version.n}; prices in ${version.currency}; ${Math.round(version.confidenceLevel * 100)} % intervals.`,
      '',
      'Open it in your Fieldcurve portal to see the chart and download CSV, XLSX or PDF:',
      options.link,
      '',
      estimateCaution,
    ].join('\n'),
  };
}
