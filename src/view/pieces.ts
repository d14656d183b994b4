// The results as a tree of HTML strings: each piece is one element, either a
// leaf (its whole HTML) or a container (its start and end tags) whose children
// are pieces again, each with a key unique among its siblings. The page keeps
// one DOM element per piece and touches only the pieces whose strings changed
// (render.ts); pieceHtml gives the same markup as one string, for the tests.

export type Piece = Leaf | Container;
export type Leaf = { readonly key: string; readonly html: string };
export type Container = {
  readonly key: string;
  readonly open: string;
  readonly close: string;
  readonly children: readonly Piece[];
};

export function pieceHtml(piece: Piece): string {
  return "html" in piece ? piece.html : `${piece.open}${piece.children.map(pieceHtml).join("")}${piece.close}`;
}
