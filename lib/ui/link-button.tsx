import { Link, type Href } from 'expo-router';
import type { ComponentProps } from 'react';
import { Button } from './button';

type LinkButtonProps = Omit<ComponentProps<typeof Button>, 'onPress'> & { href: Href };

/** A button that navigates: an anchor on the web, so it can be opened in a new tab. */
export function LinkButton({ href, ...button }: LinkButtonProps) {
  return (
    <Link href={href} asChild>
      <Button role="link" accessibilityRole="link" {...button} />
    </Link>
  );
}
