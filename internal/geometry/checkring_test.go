package geometry

import (
	"encoding/binary"
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/paulmach/orb"
)

func TestCheckRing(t *testing.T) {
	// Hand-computed verdicts; wantText are substrings the message must hold.
	tests := []struct {
		name     string
		ring     orb.Ring
		wantErr  error
		wantText []string
	}{
		{"unit square", unitSquare, nil, nil},
		{"clockwise square", reversed(unitSquare), nil, nil},
		{"L room", lRoom, nil, nil},
		{"collinear vertex kept", orb.Ring{{0, 0}, {0.5, 0}, {1, 0}, {1, 1}, {0, 1}, {0, 0}}, nil, nil},
		{"triangle", orb.Ring{{0, 0}, {1, 0}, {0, 1}, {0, 0}}, nil, nil},
		{"empty", orb.Ring{}, ErrTooFewVertices, []string{"empty"}},
		{"open ring", orb.Ring{{0, 0}, {1, 0}, {1, 1}}, ErrNotClosed,
			[]string{"not closed: last vertex (1, 1) differs from first (0, 0)"}},
		{"open by a hair", orb.Ring{{0, 0}, {1, 0}, {1, 1}, {0, 1}, {0, 1e-12}}, ErrNotClosed,
			[]string{"last vertex (0, 1e-12) differs from first (0, 0)"}},
		{"two distinct vertices", orb.Ring{{0, 0}, {1, 0}, {0, 0}}, ErrTooFewVertices, []string{"got 2 distinct, want at least 3"}},
		{"one point", orb.Ring{{2, 2}}, ErrTooFewVertices, []string{"got 1 distinct"}},
		{"repeated vertex", orb.Ring{{0, 0}, {1, 0}, {1, 0}, {1, 1}, {0, 1}, {0, 0}}, ErrZeroLengthEdge,
			[]string{"vertex 3 (1, 0) repeats vertex 2 (1, 0)"}},
		{"doubled closing vertex", orb.Ring{{0, 0}, {1, 0}, {1, 1}, {0, 1}, {0, 0}, {0, 0}}, ErrZeroLengthEdge,
			[]string{"vertex 5 (0, 0) repeats the first vertex"}},
		{"NaN vertex", orb.Ring{{0, 0}, {math.NaN(), 0}, {1, 1}, {0, 0}}, ErrNotFinite, []string{"vertex 2 is (NaN, 0)"}},
		{"Inf vertex", orb.Ring{{0, 0}, {1, 0}, {1, math.Inf(1)}, {0, 0}}, ErrNotFinite, []string{"vertex 3 is (1, +Inf)"}},
		{"vertex too far", orb.Ring{{0, 0}, {2e5, 0}, {1, 1}, {0, 0}}, ErrOutOfRange, []string{"vertex 2 (200000, 0)"}},
		{"collinear only", orb.Ring{{0, 0}, {1, 0}, {2, 0}, {0, 0}}, ErrZeroArea, []string{"collinear"}},
		{"collinear only, sloped", orb.Ring{{0, 0}, {0.1, 0.3}, {0.2, 0.6}, {0, 0}}, ErrZeroArea, []string{"collinear"}},
		{"bow-tie", orb.Ring{{0, 0}, {1, 1}, {1, 0}, {0, 1}, {0, 0}}, ErrSelfIntersecting,
			[]string{"edge 1-2 from (0, 0) to (1, 1)", "meets edge 3-4 from (1, 0) to (0, 1)"}},
		{"vertex touching another edge", orb.Ring{{0, 0}, {2, 0}, {2, 2}, {1, 0}, {0, 2}, {0, 0}}, ErrSelfIntersecting,
			[]string{"edge 1-2", "edge 3-4"}},
		{"repeated vertex, not consecutive", orb.Ring{{0, 0}, {2, 0}, {1, 1}, {2, 2}, {0, 2}, {1, 1}, {0, 0}}, ErrSelfIntersecting,
			[]string{"edge 2-3", "edge 5-6"}},
		{"spike folding back", orb.Ring{{0, 0}, {2, 0}, {1, 0}, {1, 1}, {0, 0}}, ErrSelfIntersecting,
			[]string{"edge 1-2", "edge 2-3"}},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			err := CheckRing(tt.ring)
			if tt.wantErr == nil {
				if err != nil {
					t.Fatalf("got %v, want nil", err)
				}
				return
			}
			if !errors.Is(err, tt.wantErr) {
				t.Fatalf("got %v, want an error wrapping %v", err, tt.wantErr)
			}
			for _, s := range tt.wantText {
				if !strings.Contains(err.Error(), s) {
					t.Errorf("got message %q, want it to contain %q", err, s)
				}
			}
		})
	}
}

// encodeRing packs a ring as little-endian float64 pairs, for fuzz seeds.
func encodeRing(r orb.Ring) []byte {
	b := make([]byte, 0, 16*len(r))
	for _, p := range r {
		b = binary.LittleEndian.AppendUint64(b, math.Float64bits(p[0]))
		b = binary.LittleEndian.AppendUint64(b, math.Float64bits(p[1]))
	}
	return b
}

// decodeRing unpacks encodeRing's format; trailing bytes are ignored and the
// ring is capped at 64 vertices.
func decodeRing(b []byte) orb.Ring {
	r := orb.Ring{}
	for len(b) >= 16 && len(r) < 64 {
		x := math.Float64frombits(binary.LittleEndian.Uint64(b))
		y := math.Float64frombits(binary.LittleEndian.Uint64(b[8:]))
		r = append(r, orb.Point{x, y})
		b = b[16:]
	}
	return r
}

func FuzzCheckRing(f *testing.F) {
	for _, r := range []orb.Ring{
		unitSquare, lRoom, reversed(lRoom),
		{{0, 0}, {1, 1}, {1, 0}, {0, 1}, {0, 0}},
		{{0, 0}, {1, 0}, {2, 0}, {0, 0}},
		{{0, 0}, {1, 0}, {1, 1}},
		{{0, 0}, {1, 0}, {1, 0}, {1, 1}, {0, 0}},
		{{0, 0}, {math.NaN(), 0}, {1, 1}, {0, 0}},
		{{0, 0}, {2, 0}, {2, 2}, {1, 0}, {0, 2}, {0, 0}},
		{{1e300, 0}, {-1e300, 1e300}, {0, -1e300}, {1e300, 0}},
	} {
		f.Add(encodeRing(r))
	}
	sentinels := []error{ErrNotFinite, ErrOutOfRange, ErrTooFewVertices, ErrNotClosed, ErrZeroLengthEdge, ErrZeroArea, ErrSelfIntersecting}
	f.Fuzz(func(t *testing.T, data []byte) {
		r := decodeRing(data)
		err := CheckRing(r)
		errRev := CheckRing(reversed(r))
		if (err == nil) != (errRev == nil) {
			t.Fatalf("ring %v: got %v, reversed %v; want the same verdict", r, err, errRev)
		}
		if err != nil {
			found := false
			for _, s := range sentinels {
				found = found || errors.Is(err, s)
			}
			if !found {
				t.Fatalf("ring %v: got %v, want an error wrapping a sentinel", r, err)
			}
			return
		}
		// An accepted ring makes a polygon whose vertices are on its boundary
		// and whose area is positive.
		fp := Polygon(r)
		if fp.Area() <= 0 {
			t.Fatalf("ring %v accepted: got area %g, want > 0", r, fp.Area())
		}
		if len(fp.Ring) != len(r) {
			t.Fatalf("ring %v accepted: Polygon has %d vertices, want %d (nothing dropped)", r, len(fp.Ring), len(r))
		}
		for _, p := range r {
			if d := fp.Distance(p); d != 0 {
				t.Fatalf("ring %v accepted: vertex %v got Distance %g, want 0", r, p, d)
			}
		}
	})
}
