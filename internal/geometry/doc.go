// Package geometry models the test cell in plan and height: its boundary
// (the wedge-tip plane of an anechoic chamber, the inner wall face of a
// hard-walled cell or the site limit of an outdoor pad), obstacles with
// height ranges, keep-out zones, the exhaust collector and floor marks; and
// answers the containment, distance, free-path and sight-line questions that
// the planner asks about them. It knows nothing about jets' physics; it only
// places a jet's frame in the cell ([JetFrame]).
//
// # Coordinates
//
// Coordinates are planar metres in the cell frame: the origin is the cell
// datum on the floor, X and Y are in plan and Z is up. Plan points are
// [orb.Point] values {X, Y} and 3-D points are [r3.Vec] values. Angles are
// in radians; a heading is measured in plan from +X towards +Y
// (counter-clockwise seen from above). Heights are above the floor.
//
//	  Y
//	  ^        plan, seen from above
//	  |
//	  |   heading h
//	  |  /
//	  | /
//	  |/ h
//	  o-----------> X
//	datum (Z up, out of the page)
//
// # Shapes
//
// A [Footprint] is a plan shape, a simple polygon or a disc. A [Cell] has a
// boundary ring (or none, when unbounded), obstacles ([Obstacle], a footprint
// with a height range), keep-out zones ([KeepOut], full height), an optional
// [Collector] and reference [Mark]s. A [Solid] is a vertical prism for 3-D
// tests, and an [Index] finds the solids a sight line passes through, or the
// solids near a point, without testing them all.
//
// # Boundaries
//
// Every predicate counts the boundary as inside: a point on an edge or a
// vertex of a footprint or cell boundary is inside and at distance 0, and a
// sight line that touches a solid hits it. "On" means within [BoundaryTol]
// (1 nm), so that a point computed to lie on a sloping edge is treated the
// same as one typed in exactly. Signed distances are consistent with the
// predicates: Footprint.Distance(p) <= 0 exactly when Footprint.Contains(p),
// and Cell.WallDistance(p) >= 0 exactly when Cell.Contains(p).
//
// # Degenerate input
//
// These have defined answers, each documented on the function concerned:
//
//   - zero-length edges in a ring given to [Polygon] are dropped;
//   - collinear consecutive vertices are kept, and change nothing;
//   - a point exactly on an edge or a vertex is inside, at distance 0;
//   - a segment of zero length is treated as a point;
//   - a ray through a vertex stops there only if it leaves the cell there
//     ([Cell.FreeRay]); a ray along an edge runs to the end of the edge;
//   - a disc of zero radius is a single point;
//   - a point with a NaN coordinate is inside nothing, and distances to it are NaN.
//
// # Errors and panics
//
// Queries do not return errors. Data read from a file is checked first, at
// the package boundary, with [CheckRing], [CheckCircle], [Footprint.Validate],
// [Solid.Validate], [JetFrame.Validate] and [Cell.Validate]; they reject NaN
// and infinite values, naming the input, with an [*InputError] or an error
// wrapping one of the sentinel errors (ErrNotFinite, ErrNotClosed, …).
// Constructors and a few queries panic on input that validation would have
// rejected (an empty ring, a negative radius); each says so in its doc.
package geometry
