package geometry

import (
	"errors"
	"slices"

	"github.com/paulmach/orb"
)

// ErrClip is returned by [IntersectRings] when the outlines touch in a way
// it does not resolve (a vertex exactly on the other outline's edge, or
// edges that overlap along a line).
var ErrClip = errors.New("geometry: cannot intersect the outlines: they touch at a vertex or along an edge")

// IntersectRings returns the part of the simple polygon subject that lies
// inside the simple polygon clip, as closed counter-clockwise rings (none
// when they do not overlap, several when clip cuts subject apart). Either
// orientation is accepted; a missing closing vertex is implied, and
// repeated consecutive vertices are dropped.
//
// The outlines' edges are split where they cross; the pieces of subject
// whose midpoints lie inside clip (or on it) and the pieces of clip whose
// midpoints lie inside subject are chained into rings. This is exact for
// outlines that only cross at interior points of their edges; when a
// vertex of one lies on an edge of the other, or two edges overlap, it
// returns [ErrClip] (the caller may fall back to the uncut subject). Cost:
// each edge of subject is tested only against the edges of clip near it.
func IntersectRings(subject, clip orb.Ring) ([]orb.Ring, error) {
	s, c := cleanRing(subject), cleanRing(clip)
	if len(s) < 4 || len(c) < 4 {
		return nil, nil
	}
	// where the outlines touch, move subject by a few nudges of at most
	// clipNudge and try again: far below any drawing or marking tolerance
	for k := 0; ; k++ {
		out, err := intersect(s, c)
		if err == nil || k == len(clipNudges) {
			return out, err
		}
		d := clipNudges[k]
		moved := make(orb.Ring, len(s))
		for i, p := range s {
			moved[i] = orb.Point{p[0] + d[0]*clipNudge, p[1] + d[1]*clipNudge}
		}
		s = moved
	}
}

// clipNudge is the size, m, of the moves IntersectRings makes to resolve
// outlines that touch: a micrometre, far below the 0.1 mm the exports are
// rounded to.
const clipNudge = 1e-6

// clipNudges are the directions of the successive moves (irregular, so
// that a move does not line a vertex up with another edge).
var clipNudges = [][2]float64{{0.6, 0.8}, {-0.28, 0.96}, {0.96, -0.28}}

// intersect is IntersectRings on clean rings, without the nudges.
func intersect(s, c orb.Ring) ([]orb.Ring, error) {
	// crossings, found once and shared by both splits so that the chained
	// pieces meet at bit-identical points
	type cut struct {
		t float64
		p orb.Point
	}
	sCuts := make([][]cut, len(s)-1)
	cCuts := make([][]cut, len(c)-1)
	ix := newRingIndex(c)
	var bad bool
	for i := 0; i+1 < len(s); i++ {
		a, b := s[i], s[i+1]
		q := orb.Bound{Min: a, Max: a}.Extend(b).Pad(indexPad)
		ix.near(q, func(j int) {
			if j+1 >= len(c) {
				return // the closing repeat
			}
			p, r := c[j], c[j+1]
			if segmentsCross(a, b, p, r) {
				d := orient(p, r, a) - orient(p, r, b)
				t := orient(p, r, a) / d
				u := orient(a, b, p) / (orient(a, b, p) - orient(a, b, r))
				x := orb.Point{a[0] + t*(b[0]-a[0]), a[1] + t*(b[1]-a[1])}
				sCuts[i] = append(sCuts[i], cut{t, x})
				cCuts[j] = append(cCuts[j], cut{u, x})
				return
			}
			if segSegDist2(a, b, p, r) <= boundaryTol2 {
				bad = true // touching, not crossing
			}
		})
	}
	if bad {
		return nil, ErrClip
	}
	type piece struct{ a, b orb.Point }
	var pieces []piece
	split := func(r orb.Ring, cuts [][]cut, keep func(orb.Point) bool) {
		for i := 0; i+1 < len(r); i++ {
			cs := cuts[i]
			slices.SortFunc(cs, func(x, y cut) int {
				switch {
				case x.t < y.t:
					return -1
				case x.t > y.t:
					return 1
				}
				return 0
			})
			from := r[i]
			for k := 0; k <= len(cs); k++ {
				to := r[i+1]
				if k < len(cs) {
					to = cs[k].p
				}
				if from != to && keep(orb.Point{(from[0] + to[0]) / 2, (from[1] + to[1]) / 2}) {
					pieces = append(pieces, piece{from, to})
				}
				from = to
			}
		}
	}
	inC := func(p orb.Point) bool { d2, in := ix.query(p); return in || d2 <= boundaryTol2 }
	split(s, sCuts, inC)
	sIx := newRingIndex(s)
	inS := func(p orb.Point) bool { d2, in := sIx.query(p); return in && d2 > boundaryTol2 }
	split(c, cCuts, inS)

	next := make(map[orb.Point][]int, len(pieces))
	for k, pc := range pieces {
		next[pc.a] = append(next[pc.a], k)
	}
	used := make([]bool, len(pieces))
	var out []orb.Ring
	for k := range pieces {
		if used[k] {
			continue
		}
		ring := orb.Ring{pieces[k].a}
		for at := k; ; {
			used[at] = true
			end := pieces[at].b
			ring = append(ring, end)
			if end == ring[0] {
				break
			}
			cand := -1
			for _, n := range next[end] {
				if !used[n] {
					cand = n
					break
				}
			}
			if cand < 0 {
				return nil, ErrClip // a dangling piece: the outlines touch
			}
			at = cand
		}
		if len(ring) >= 4 {
			out = append(out, ring)
		}
	}
	return out, nil
}

// cleanRing returns r closed and counter-clockwise, without repeated
// consecutive vertices.
func cleanRing(r orb.Ring) orb.Ring {
	out := make(orb.Ring, 0, len(r)+1)
	for _, p := range r {
		if n := len(out); n > 0 && out[n-1] == p {
			continue
		}
		out = append(out, p)
	}
	for len(out) > 1 && out[len(out)-1] == out[0] {
		out = out[:len(out)-1]
	}
	if len(out) < 3 {
		return nil
	}
	out = append(out, out[0])
	if out.Orientation() == orb.CW {
		slices.Reverse(out)
	}
	return out
}
