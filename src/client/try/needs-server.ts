// The try page opened from a folder: browsers do not run its module script
// from file:// (nor let it fetch the catalogue), so say so and how to serve
// it, instead of a page that waits for ever. A classic script: it must run there.
function needsServer(doc: Document): void {
  if (doc.location.protocol !== "file:") return;
  const notice = doc.getElementById("try-needs-server");
  const page = doc.getElementById("try");
  if (notice) notice.hidden = false;
  // Removed rather than hidden: its stylesheet sets a display that would beat [hidden].
  page?.remove();
}

needsServer(document);
