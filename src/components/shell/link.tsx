"use client";

import NextLink from "next/link";
import { useRouter } from "next/navigation";
import type { ComponentProps } from "react";

type Props = Omit<ComponentProps<typeof NextLink>, "href" | "prefetch"> & { href: string };

/**
 * The app's link: Next's own, prefetched when a person points at it, focuses it or touches it,
 * not whenever it scrolls into view. Every page is dynamic (signed in), so a prefetch is a request
 * the server renders: a schedule page in view of a dozen links made two dozen of them while its
 * 5,000 rows were loading, on the same cores as the page's own work. A pointer reaches a link
 * 100–300 ms before the click, which is time enough for the prefetch.
 */
export function Link({ href, onMouseEnter, onFocus, onTouchStart, ...rest }: Props) {
  const router = useRouter();
  /** The handler given, after the prefetch of an address in the app. */
  const warming =
    <E,>(given?: (e: E) => void) =>
    (e: E) => {
      if (href.startsWith("/")) router.prefetch(href);
      given?.(e);
    };
  return <NextLink {...rest} href={href} prefetch={false} onMouseEnter={warming(onMouseEnter)} onFocus={warming(onFocus)} onTouchStart={warming(onTouchStart)} />;
}
