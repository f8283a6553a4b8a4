/** The one source of the product's name and description (metadata, manifest, shells). */
export const siteConfig = {
  name: 'Setline',
  shortName: 'Setline',
  description: 'Point-repair jobs, install clocks and repair reports.',
  /** Where the installed app opens: the crew's list of the day. */
  startUrl: '/today',
  /** Palette (tailwind.config.ts): brand-700 for the browser chrome, slate-900 like the shells' header bar. */
  themeColor: '#115e59',
  backgroundColor: '#0f172a',
} as const;
