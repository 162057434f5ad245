// Any unknown page: a friendly 404 inside the app shell.
export function loader() {
  throw new Response("Not found", { status: 404 });
}

export default function NotFound() {
  return null;
}
