import { samplingPointKindLabels } from '@shared/sampling/sampling-point-kind';
import type { FieldRoute, StudyEnumerator } from '@shared/routes/field-route';
import type { OutgoingMail } from '../mail/mailer';

const interviews = (n: number) => `${n} interview${n === 1 ? '' : 's'}`;

/** The e-mail an enumerator gets when a route is assigned to them: dates, stops, and the link. */
export function routeAssignedMail(options: {
  to: StudyEnumerator;
  route: FieldRoute;
  studyName: string;
  assignedBy: string;
  link: string;
}): OutgoingMail {
  const { route } = options;
  const total = route.stops.reduce((sum, stop) => sum + stop.quota, 0);
  const stops = route.stops.map(
    (stop) =>
      `${stop.position}. ${stop.code} · ${stop.name} (${samplingPointKindLabels[stop.kind]}, ${stop.stratum}) — ${interviews(stop.quota)}`,
  );
  return {
    to: options.to.email,
    subject: `Route "${route.name}" is assigned to you`,
    text: [
      `Hello ${options.to.name},`,
      '',
      `${options.assignedBy} has assigned you the route "${route.name}" of the study "${options.studyName}".`,
      '',
      `Dates: ${route.windowStart} to ${route.windowEnd}`,
      `Stops, in visiting order (${interviews(total)} in all):`,
      ...stops,
      '',
      'Open the route in Fieldcurve:',
      options.link,
    ].join('\n'),
  };
}

/** The e-mail the previous enumerator gets when a route moves to someone else or is taken back. */
export function routeWithdrawnMail(options: {
  to: StudyEnumerator;
  route: FieldRoute;
  studyName: string;
}): OutgoingMail {
  return {
    to: options.to.email,
    subject: `Route "${options.route.name}" is no longer assigned to you`,
    text: [
      `Hello ${options.to.name},`,
      '',
      `The route "${options.route.name}" of the study "${options.studyName}" is no longer assigned to you.`,
      'Interviews you already recorded on it are kept. You need not visit its remaining stops.',
    ].join('\n'),
  };
}
