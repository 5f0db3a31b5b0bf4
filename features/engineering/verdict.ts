// How a check's verdict is said and coloured, the same on the form and on the request.
import { colors } from '../ui/theme';

export const verdictWords: Record<string, { title: string; fg: string; bg: string }> = {
  acceptable: { title: 'Acceptable by these checks', fg: colors.ok, bg: colors.okBg },
  not_acceptable: { title: 'Not acceptable by these checks', fg: colors.danger, bg: colors.dangerBg },
  for_review: { title: 'For the reviewers to judge', fg: colors.slate, bg: colors.slateLight },
};

export function verdictOf(verdict: unknown) {
  return typeof verdict === 'string' ? (verdictWords[verdict] ?? { title: verdict, fg: colors.ink, bg: colors.surface }) : null;
}
