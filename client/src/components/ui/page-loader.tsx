import { Center, Loader } from '@mantine/core';

export function PageLoader() {
  return (
    <Center h="60vh">
      <Loader color="moss" aria-label="Loading" />
    </Center>
  );
}
