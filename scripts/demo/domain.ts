// The app's own domain code the demo builder (build.cjs, CommonJS for sequelize-cli) computes with, so the
// demo's plans, clocks and invoices are what the app itself would compute. domain.cjs compiles this entry.
export { timeFactor } from '@/lib/cure/time-factor';
export { resinClockSpec } from '@/lib/cure/resin-spec';
export { dayInZone } from '@/lib/time/dates';
export { invoiceTotals } from '@/lib/invoice/money';
export { patchLength } from '@/lib/sizing/patch-length';
