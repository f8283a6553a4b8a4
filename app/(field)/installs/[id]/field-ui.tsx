// The field primitives live in components/field; the install steps still import them from here.
export { Callout } from '@/components/field/callout';
export { FieldInput } from '@/components/field/field-input';
export { PrimaryAction } from '@/components/field/primary-action';
export { StepCard } from '@/components/field/step-card';
