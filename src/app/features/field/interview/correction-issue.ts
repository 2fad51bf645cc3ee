import type { FieldIssue } from '@shared/http/api-error';
import type { Block } from '@shared/questionnaire/block';

/**
 * A server's reason for returning or refusing an interview, for the enumerator: an issue about
 * an answer (`answers.<block id>…`) is led by that block's question rather than its path.
 */
export function correctionIssueText(issue: FieldIssue, blocks: readonly Block[]): string {
  const [root, blockId] = issue.path.split('.');
  const block = root === 'answers' ? blocks.find((b) => b.id === blockId) : undefined;
  if (block) return `${block.prompt} — ${issue.message}`;
  return issue.path ? `${issue.path}: ${issue.message}` : issue.message;
}
