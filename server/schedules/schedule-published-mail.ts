import { analysisMethodLabels } from '@shared/analysis/analysis-method';
import { estimateCaution, type ScheduleVersion } from '@shared/analysis/schedule-version';
import type { OutgoingMail } from '../mail/mailer';

/** The e-mail a client of the study gets when a schedule version is published. */
export function schedulePublishedMail(options: {
  to: { email: string; name: string };
  version: ScheduleVersion;
  link: string;
}): OutgoingMail {
  const { version } = options;
  const correction = version.replacesId
    ? 'It corrects an earlier version, which stays available for reference.'
    : 'It is the first version of this schedule.';
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
