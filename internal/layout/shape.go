package layout

import (
	"fmt"
	"strings"

	"github.com/paulmach/orb"
	"go.yaml.in/yaml/v3"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
)

// coords reads a point written as a list of dims lengths, [x, y] or
// [x, y, z], m. line is where a wrong shape is reported. Each coordinate
// must be at most MaxLength from the datum.
func (d *decoder) coords(n *yaml.Node, field string, line, dims int) ([]float64, bool) {
	want := "a point [x, y]"
	if dims == 3 {
		want = "a point [x, y, z]"
	}
	items, ok := d.list(n, field, line, want)
	if !ok {
		return nil, false
	}
	if len(items) != dims {
		d.errorf(ErrWrongType, line, field, "want %s, got a list of %d", want, len(items))
		return nil, false
	}
	out := make([]float64, dims)
	good := true
	for i, it := range items {
		f := index(field, i)
		v, ok := d.length(it, f) // refuses more than MaxLength
		good = good && ok
		out[i] = v
	}
	return out, good
}

// planPoint reads [x, y], m.
func (d *decoder) planPoint(n *yaml.Node, field string, line int) (orb.Point, bool) {
	c, ok := d.coords(n, field, line, 2)
	if !ok {
		return orb.Point{}, false
	}
	return orb.Point{c[0], c[1]}, true
}

// spacePoint reads [x, y, z], m; z is the height above the floor.
func (d *decoder) spacePoint(n *yaml.Node, field string, line int) (r3.Vec, bool) {
	c, ok := d.coords(n, field, line, 3)
	if !ok {
		return r3.Vec{}, false
	}
	return r3.Vec{X: c[0], Y: c[1], Z: c[2]}, true
}

// ring reads a closed outline: a list of [x, y] points, m, the first
// repeated last, checked with geometry.CheckRing (closed, at least three
// corners, no zero-length edge, some area, no self-intersection).
func (d *decoder) ring(n *yaml.Node, field string, line int) (orb.Ring, bool) {
	const want = "a closed outline, a list of [x, y] points with the first repeated last"
	items, ok := d.list(n, field, line, want)
	if !ok {
		return nil, false
	}
	r := make(orb.Ring, 0, len(items))
	good := true
	for i, it := range items {
		p, ok := d.planPoint(it, index(field, i), it.Line)
		good = good && ok
		r = append(r, p)
	}
	if !good {
		return nil, false
	}
	if len(r) < 3 {
		d.errorf(ErrInvalid, line, field, "want at least 3 corners and the first repeated last, got %d points", len(r))
		return nil, false
	}
	if err := geometry.CheckRing(r); err != nil {
		d.add(ErrInvalid, err, line, field, strings.TrimPrefix(err.Error(), "geometry: "))
		return nil, false
	}
	return r, true
}

var (
	shapeKeys  = []string{"polygon", "circle"}
	circleKeys = []string{"centre", "radius"}
)

// footprint reads the shape of an obstacle or keep-out zone from s: exactly
// one of polygon (a closed outline) or circle ({centre: [x, y], radius}).
func (d *decoder) footprint(s *section) (geometry.Footprint, bool) {
	switch {
	case s.has("polygon") && s.has("circle"):
		d.errorf(ErrInvalid, s.keyLine("circle"), s.field("circle"), "give polygon or circle, not both")
		return geometry.Footprint{}, false
	case s.has("polygon"):
		r, ok := d.ring(s.get("polygon"), s.field("polygon"), s.keyLine("polygon"))
		if !ok {
			return geometry.Footprint{}, false
		}
		return geometry.Polygon(r), true
	case s.has("circle"):
		c := s.sub("circle", circleKeys)
		var (
			at       orb.Point
			okC, okR bool
			radius   float64
		)
		if n := c.need("centre", "the centre, [x, y]"); n != nil {
			at, okC = d.planPoint(n, c.field("centre"), c.keyLine("centre"))
		}
		if n := c.need("radius", "the radius, a length such as 0.3 m"); n != nil {
			radius, okR = d.positiveLength(n, c.field("radius"), "the radius")
		}
		if !okC || !okR {
			return geometry.Footprint{}, false
		}
		if err := geometry.CheckCircle(at, radius); err != nil {
			d.add(ErrInvalid, err, c.line, c.path, strings.TrimPrefix(err.Error(), "geometry: "))
			return geometry.Footprint{}, false
		}
		return geometry.Circle(at, radius), true
	}
	if s.isMap {
		d.errorf(ErrMissing, s.line, s.field("polygon"), "missing; want polygon (a closed outline) or circle ({centre: [x, y], radius: …})")
	}
	return geometry.Footprint{}, false
}

// nameSet checks that the names of one list are unique.
type nameSet struct {
	d    *decoder
	seen map[string]int // name → line of its first use
}

func (d *decoder) nameSet() *nameSet { return &nameSet{d: d, seen: map[string]int{}} }

// add records name, used at line by field, and reports a repeat.
func (u *nameSet) add(name string, line int, field string) {
	if first, dup := u.seen[name]; dup {
		u.d.errorf(ErrDuplicateName, line, field, "the name %q is already used at line %d", name, first)
		return
	}
	u.seen[name] = line
}

// has reports whether name was added.
func (u *nameSet) has(name string) bool { _, ok := u.seen[name]; return ok }

// list returns the names added, in no order.
func (u *nameSet) list() []string {
	out := make([]string, 0, len(u.seen))
	for n := range u.seen {
		out = append(out, n)
	}
	return out
}

// name reads the required name of a list item; what names the item
// ("obstacle") for the message. The name is added to set when set is not nil.
func (d *decoder) name(s *section, what string, set *nameSet) (string, bool) {
	n := s.need("name", fmt.Sprintf("a name for this %s", what))
	if n == nil {
		return "", false
	}
	v, ok := d.text(n, s.field("name"))
	if !ok {
		return "", false
	}
	if strings.TrimSpace(v) == "" {
		d.errorf(ErrInvalid, n.Line, s.field("name"), "want a name for this %s, got an empty text", what)
		return "", false
	}
	if !d.checkLabel(v, n.Line, s.field("name"), MaxNameLength) {
		return "", false
	}
	if set != nil {
		set.add(v, n.Line, s.field("name"))
	}
	return v, true
}
