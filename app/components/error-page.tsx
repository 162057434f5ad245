import { isRouteErrorResponse, Link } from "react-router";

const TEXT: Record<number, { title: string; body: string }> = {
  400: { title: "Kitwright could not use what was sent", body: "Part of the request was not in a form Kitwright accepts. Go back, check it and try again." },
  401: { title: "Please sign in", body: "This page needs you to be signed in." },
  403: {
    title: "Not open to your account",
    body: "Your account does not have access to this page. If you think it should, ask your team's owner or the service admin.",
  },
  404: { title: "Nothing here", body: "We could not find that page. It may have moved, or the link may be mistyped." },
  413: { title: "Too large to accept", body: "What was sent is larger than Kitwright accepts; nothing was saved." },
  503: { title: "Briefly unavailable", body: "Kitwright cannot reach its database right now. Please try again in a moment." },
};

export function ErrorPage({ error }: { error: unknown }) {
  const status = isRouteErrorResponse(error) ? error.status : 500;
  const text = TEXT[status] ?? { title: "Something went wrong", body: "An unexpected error stopped this page. It has been logged; please try again." };
  const detail = isRouteErrorResponse(error) && typeof error.data === "string" && error.data && status !== 404 ? error.data : null;
  return (
    <div className="mx-auto max-w-xl py-16 text-center">
      <p className="figures text-5xl font-semibold text-copper">{status}</p>
      <h1 className="mt-3 text-2xl font-semibold">{text.title}</h1>
      <p className="mt-2 text-ink-soft">{detail ?? text.body}</p>
      <Link to="/" className="mt-6 inline-block rounded-md bg-copper px-4 py-2 font-medium text-sheet hover:bg-copper-dark">
        Back to the start page
      </Link>
    </div>
  );
}
