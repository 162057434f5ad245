// The friendly error pages as the root ErrorBoundary renders them (app/root.tsx passes the thrown
// value straight to <ErrorPage>): a thrown Error becomes the 500 page, with no internals shown.
import { createElement } from "react";
import { renderToString } from "react-dom/server";
import { MemoryRouter, UNSAFE_ErrorResponseImpl as ErrorResponse } from "react-router";
import { describe, expect, it } from "vitest";
import { ErrorPage } from "~/components/error-page";
import { textOf } from "../plans/render";

function render(error: unknown) {
  const html = renderToString(createElement(MemoryRouter, null, createElement(ErrorPage, { error })));
  return { html, text: textOf(html) };
}

describe("ErrorPage", () => {
  it("shows the 500 page for an unexpected error, without its message", () => {
    const { html, text } = render(new Error("relation quote_lines does not exist at pg.Pool"));
    expect(text).toBe("500 Something went wrong An unexpected error stopped this page. It has been logged; please try again. Back to the start page");
    expect(html).toMatch(/<h1[^>]*>Something went wrong<\/h1>/);
    expect(html).toMatch(/<a[^>]*href="\/"[^>]*>Back to the start page<\/a>/);
  });

  it("treats a thrown value that is not an Error the same way", () => {
    expect(render("boom").text).toContain("500 Something went wrong");
    expect(render(undefined).text).toContain("500 Something went wrong");
  });

  it("shows the 404 page without the response's own text", () => {
    const { text } = render(new ErrorResponse(404, "Not Found", "Not found"));
    expect(text).toBe("404 Nothing here We could not find that page. It may have moved, or the link may be mistyped. Back to the start page");
  });

  it("shows the 403 page with the guard's reason when it gives one", () => {
    expect(render(new ErrorResponse(403, "Forbidden", "Only the team's owner can do this.")).text).toBe(
      "403 Not open to your account Only the team's owner can do this. Back to the start page",
    );
    expect(render(new ErrorResponse(403, "Forbidden", "")).text).toContain("Your account does not have access to this page.");
  });

  it("falls back to the 500 wording for a status it has no words for", () => {
    expect(render(new ErrorResponse(418, "I'm a teapot", null)).text).toMatch(/^418 Something went wrong/);
  });
});
