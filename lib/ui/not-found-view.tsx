import { AuthFrame } from './auth-frame';
import { Text } from './text';
import { TextLink } from './text-link';

/** Any address the app does not know. */
export function NotFoundView() {
  return (
    <AuthFrame title="Page not found">
      <Text>There is no page at this address. It may have moved, or the link may be mistyped.</Text>
      <TextLink href="/" label="Go to the start page" />
    </AuthFrame>
  );
}
