import type { GetInputPropsReturnType } from '@mantine/form';

/** One form field handed to a shared fields component: `{ key: form.key(path), ...form.getInputProps(path) }`. */
export type BoundField = { key: string } & GetInputPropsReturnType;
