// The usual cautions of the work, in our own words. Shown before the first step of every install
// (and later on the customer's report). They remind; they do not replace local codes, the resin
// maker's instructions, the site's permits or a competent person's judgement.

export const SAFETY_REMINDERS = [
  {
    id: 'atmosphere',
    title: 'Confined space',
    text:
      'Nobody enters a manhole or pit until the atmosphere has been tested and is ventilated, with an attendant up top and rescue means ready, as ' +
      'your local confined-space rules require.',
  },
  {
    id: 'traffic',
    title: 'Traffic and public',
    text: 'Set traffic control and barriers around open access points before lifting a cover; keep the public away from hoses and the mixing place.',
  },
  {
    id: 'resin',
    title: 'Resin handling',
    text:
      'Wear chemical-resistant gloves and eye protection when mixing and wetting out; follow the resin maker\u2019s safety data sheet and keep the ' +
      'spill kit at hand.',
  },
  {
    id: 'exotherm',
    title: 'Mixed resin heats up',
    text:
      'Never leave mixed resin standing in its container: it heats as it cures and can smoke or burn. Spread leftovers thin to cure and dispose of ' +
      'them as the data sheet says.',
  },
  {
    id: 'pressure',
    title: 'Pressurised packer',
    text:
      'Nobody stands in line with a pressurised packer or its open pipe ends; stay within the packer\u2019s rated pressure and release pressure ' +
      'before any handling.',
  },
  {
    id: 'plugs',
    title: 'Flow control and plugs',
    text:
      'A plug or bypass holding back flow can blow out under back-pressure: never stand in line with a plug or in front of a plugged pipe, secure ' +
      'plugs to a fixed point, and watch the head of water behind them.',
  },
  {
    id: 'backup',
    title: 'Sewage backing up',
    text:
      'While the line is plugged or bypassed, sewage can back up into buildings upstream: warn the occupants before you plug, ask them not to use ' +
      'water, and keep watching upstream levels and the bypass until the line is open again.',
  },
  {
    id: 'hygiene',
    title: 'Sewage hygiene',
    text:
      'Sewage carries germs: wear gloves and keep cuts covered, wash hands before eating, drinking or smoking, keep clean and dirty gear apart, ' +
      'and keep vaccinations up to date as your local health rules advise.',
  },
  {
    id: 'stop',
    title: 'Stop when unsure',
    text: 'If anything is not right (gas reading, weather, flow, equipment), stop and ask. The clock never outranks safety.',
  },
] as const;

export const SAFETY_DEFERRAL =
  'These reminders do not replace your local codes, permits, the resin maker\u2019s instructions or a competent person on site.';
