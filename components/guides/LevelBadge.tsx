import type { GuideLevel } from '@/lib/guides/frontmatter';

const STYLE: Record<GuideLevel, string> = {
  'first build': 'border-moss text-moss-600 dark:text-moss-300',
  'working system': 'border-creek-400 text-creek-600 dark:text-creek-200',
  advanced: 'border-clay text-clay-600 dark:text-clay-300',
};

export function LevelBadge({ level }: { level: GuideLevel }) {
  return (
    <span className={`rounded-full border px-2 py-0.5 font-sans text-xs font-semibold ${STYLE[level]}`}>{level}</span>
  );
}
