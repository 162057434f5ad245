// Static rendering for the plan-page component tests: markup as the server sends it, and its text as a
// reader sees it (tags dropped, entities decoded, white space collapsed).
import { createElement, type FunctionComponent } from "react";
import { renderToStaticMarkup } from "react-dom/server";

export function markup<P extends object>(component: FunctionComponent<P>, props: P): string {
  return renderToStaticMarkup(createElement(component, props));
}

export function textOf(html: string): string {
  return html
    .replace(/<[^>]+>/g, " ")
    .replace(/&#x27;/g, "'")
    .replace(/&quot;/g, '"')
    .replace(/&lt;/g, "<")
    .replace(/&gt;/g, ">")
    .replace(/&amp;/g, "&")
    .replace(/\s+/g, " ")
    .trim();
}

/** How many times a pattern occurs in the markup. */
export function countMatches(html: string, pattern: RegExp): number {
  return [...html.matchAll(new RegExp(pattern.source, pattern.flags.includes("g") ? pattern.flags : `${pattern.flags}g`))].length;
}
