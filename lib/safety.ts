// The usual cautions of the work, in our own words. Shown before the first step of every install
// (and later on the customer's report). They remind; they do not replace local codes, the resin
// maker's instructions, the site's permits or a competent person's judgement.

export const SAFETY_REMINDERS = [
  {
    id: 'atmosphere',
    title: 'Confined space',
    text: 'Nobody enters a manhole or pit until the atmosphere has been tested and is ventilated, with an attendant up top and rescue means ready, as your local confined-space rules require.',
  },
  {
    id: 'traffic',
    title: 'Traffic and public',
    text: 'Set traffic control and barriers around open access points before lifting a cover; keep the public away from hoses and the mixing place.',
  },
  {
    id: 'resin',
    title: 'Resin handling',
    text: 'Wear chemical-resistant gloves and eye protection when mixing and wetting out; follow the resin maker\u2019s safety data sheet and keep the spill kit at hand.',
  },
  {
    id: 'exotherm',
    title: 'Mixed resin heats up',
    text: 'Never leave mixed resin standing in its container: it heats as it cures and can smoke or burn. Spread leftovers thin to cure and dispose of them as the data sheet says.',
  },
  {
    id: 'pressure',
    title: 'Pressurised packer',
    text: 'Nobody stands in line with a pressurised packer or its open pipe ends; stay within the packer\u2019s rated pressure and release pressure before any handling.',
  },
  {
    id: 'stop',
    title: 'Stop when unsure',
    text: 'If anything is not right (gas reading, weather, flow, equipment), stop and ask. The clock never outranks safety.',
  },
] as const;

export const SAFETY_DEFERRAL =
  'These reminders do not replace your local codes, permits, the resin maker\u2019s instructions or a competent person on site.';
