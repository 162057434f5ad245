// Unknown API paths answer JSON, never an HTML page.
function notFound() {
  return Response.json({ error: { message: "No such API endpoint." } }, { status: 404 });
}

export const loader = notFound;
export const action = notFound;
