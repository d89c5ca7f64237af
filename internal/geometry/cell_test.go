package geometry

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"
)

func TestCellContainsWallDistance(t *testing.T) {
	lCell := &Cell{Boundary: lRoom, Ceiling: 3}
	lCellCW := &Cell{Boundary: reversed(lRoom), Ceiling: 3}
	open := &Cell{Kind: OutdoorPad, Ceiling: math.Inf(1)}
	// Hand-computed: WallDistance is minus the footprint distance (positive inside).
	tests := []struct {
		name   string
		c      *Cell
		p      orb.Point
		wantIn bool
		want   float64
	}{
		{"L corner square centre", lCell, orb.Point{0.5, 0.5}, true, 0.5},
		{"L near reflex corner", lCell, orb.Point{0.9, 0.9}, true, math.Sqrt(0.02)},
		{"L in the notch", lCell, orb.Point{1.5, 1.5}, false, -0.5},
		{"L on reflex corner", lCell, orb.Point{1, 1}, true, 0},
		{"L on outer edge", lCell, orb.Point{2, 0.5}, true, 0},
		{"L outside left", lCell, orb.Point{-0.25, 1}, false, -0.25},
		{"L clockwise boundary, same answer", lCellCW, orb.Point{0.5, 1.75}, true, 0.25},
		{"unbounded", open, orb.Point{1e4, -1e4}, true, math.Inf(1)},
		{"NaN point", lCell, orb.Point{math.NaN(), 0}, false, math.NaN()},
		{"NaN point, unbounded", open, orb.Point{0, math.NaN()}, false, math.NaN()},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := tt.c.Contains(tt.p); got != tt.wantIn {
				t.Errorf("Contains(%v): got %v, want %v", tt.p, got, tt.wantIn)
			}
			if got := tt.c.WallDistance(tt.p); !near(got, tt.want, 1e-12) {
				t.Errorf("WallDistance(%v): got %.15g, want %.15g", tt.p, got, tt.want)
			}
		})
	}
}

func TestCellExtent(t *testing.T) {
	// Hand-computed bounds.
	bounded := &Cell{Boundary: lRoom, Obstacles: []Obstacle{{Name: "far", Footprint: Circle(orb.Point{10, 10}, 1)}}}
	if got, want := bounded.Extent(), (orb.Bound{Min: orb.Point{0, 0}, Max: orb.Point{2, 2}}); got != want {
		t.Errorf("bounded: got %v, want %v", got, want)
	}
	open := &Cell{
		Obstacles: []Obstacle{{Name: "rig", Footprint: Polygon(box(2, 1, 3, 4))}},
		KeepOuts:  []KeepOut{{Name: "path", Footprint: Circle(orb.Point{-5, 0}, 1)}},
		Collector: &Collector{Inlet: r3.Vec{X: 12, Y: 0, Z: 1}, Diameter: 2},
		Marks:     []Mark{{Name: "pin", At: orb.Point{0, -3}}},
	}
	if got, want := open.Extent(), (orb.Bound{Min: orb.Point{-6, -3}, Max: orb.Point{13, 4}}); got != want {
		t.Errorf("unbounded: got %v, want %v", got, want)
	}
	if got, want := (&Cell{}).Extent(), (orb.Bound{}); got != want {
		t.Errorf("empty unbounded: got %v, want the datum %v", got, want)
	}
}

func TestCellSolidsAndCollectorAxis(t *testing.T) {
	c := &Cell{Obstacles: []Obstacle{
		{Name: "a", Footprint: Circle(orb.Point{1, 1}, 0.5), ZMin: 0, ZMax: 2},
		{Name: "b", Footprint: Polygon(unitSquare), ZMin: 1, ZMax: 3},
	}}
	s := c.Solids()
	if len(s) != 2 || s[0].Name != "a" || s[1].Name != "b" || s[1].ZMin != 1 || s[1].ZMax != 3 {
		t.Errorf("Solids: got %+v, want obstacles a and b as prisms", s)
	}
	// Hand-computed: heading π/2 points along +Y.
	ax := (Collector{Heading: math.Pi / 2}).Axis()
	if !near(ax.X, 0, 1e-15) || !near(ax.Y, 1, 1e-15) || ax.Z != 0 {
		t.Errorf("Collector.Axis at π/2: got %v, want (0, 1, 0)", ax)
	}
}

func validCell() *Cell {
	return &Cell{
		Kind:           Anechoic,
		Boundary:       box(-5, -4, 15, 4),
		Ceiling:        6,
		Floor:          Treated,
		TreatmentDepth: 0.9,
		Obstacles:      []Obstacle{{Name: "rig", Footprint: Polygon(box(-2, -1, 0, 1)), ZMin: 0, ZMax: 1.5}},
		KeepOuts:       []KeepOut{{Name: "door", Footprint: Circle(orb.Point{14, 3}, 1)}},
		Collector:      &Collector{Inlet: r3.Vec{X: 12, Z: 1.5}, Diameter: 1.2},
		Marks:          []Mark{{Name: "datum", At: orb.Point{}}},
	}
}

func TestCellValidate(t *testing.T) {
	tests := []struct {
		name      string
		edit      func(c *Cell)
		wantField string // "" for no error
		wantErr   error
		wantText  string
	}{
		{"valid", func(c *Cell) {}, "", nil, ""},
		{"valid unbounded open sky", func(c *Cell) { c.Boundary = nil; c.Ceiling = math.Inf(1) }, "", nil, ""},
		{"bad kind", func(c *Cell) { c.Kind = 7 }, "Kind", ErrOutOfRange, "undefined cell kind 7"},
		{"bad floor", func(c *Cell) { c.Floor = -1 }, "Floor", ErrOutOfRange, "undefined floor surface"},
		{"open boundary", func(c *Cell) { c.Boundary = c.Boundary[:4] }, "Boundary", ErrNotClosed, "not closed: last vertex (-5, 4) differs from first (-5, -4)"},
		{"zero ceiling", func(c *Cell) { c.Ceiling = 0 }, "Ceiling", ErrOutOfRange, "greater than 0"},
		{"NaN ceiling", func(c *Cell) { c.Ceiling = math.NaN() }, "Ceiling", ErrNotFinite, "got NaN"},
		{"negative treatment", func(c *Cell) { c.TreatmentDepth = -0.1 }, "TreatmentDepth", ErrOutOfRange, "-0.1 m"},
		{"Inf treatment", func(c *Cell) { c.TreatmentDepth = math.Inf(1) }, "TreatmentDepth", ErrNotFinite, "+Inf"},
		{"obstacle unnamed", func(c *Cell) { c.Obstacles[0].Name = "" }, "Obstacles[0].Name", ErrOutOfRange, "empty name"},
		{"obstacle duplicate", func(c *Cell) { c.Obstacles = append(c.Obstacles, c.Obstacles[0]) }, "Obstacles[1].Name", ErrDuplicateName, `"rig" is also the name of Obstacles[0]`},
		{"obstacle NaN top", func(c *Cell) { c.Obstacles[0].ZMax = math.NaN() }, "Obstacles[0].ZMax", ErrNotFinite, "NaN"},
		{"obstacle Inf top", func(c *Cell) { c.Obstacles[0].ZMax = math.Inf(1) }, "Obstacles[0].ZMax", ErrNotFinite, "+Inf"},
		{"obstacle inverted", func(c *Cell) { c.Obstacles[0].ZMin = 2 }, "Obstacles[0].ZMax", ErrOutOfRange, "below bottom"},
		{"obstacle bow-tie", func(c *Cell) {
			c.Obstacles[0].Footprint = Footprint{Ring: orb.Ring{{0, 0}, {1, 1}, {1, 0}, {0, 1}, {0, 0}}}
		}, "Obstacles[0].Footprint.Ring", ErrSelfIntersecting, "edge 1-2"},
		{"keep-out negative radius", func(c *Cell) { c.KeepOuts[0].Footprint.Radius = -1 }, "KeepOuts[0].Footprint.Radius", ErrOutOfRange, "negative"},
		{"keep-out NaN centre", func(c *Cell) { c.KeepOuts[0].Footprint.Center[1] = math.NaN() }, "KeepOuts[0].Footprint.Center.Y", ErrNotFinite, "NaN"},
		{"collector zero diameter", func(c *Cell) { c.Collector.Diameter = 0 }, "Collector.Diameter", ErrOutOfRange, "greater than 0"},
		{"collector NaN inlet", func(c *Cell) { c.Collector.Inlet.Z = math.NaN() }, "Collector.Inlet.Z", ErrNotFinite, "NaN"},
		{"collector Inf heading", func(c *Cell) { c.Collector.Heading = math.Inf(-1) }, "Collector.Heading", ErrNotFinite, "-Inf"},
		{"mark NaN", func(c *Cell) { c.Marks[0].At[0] = math.NaN() }, "Marks[0].At.X", ErrNotFinite, "NaN"},
		{"mark too far", func(c *Cell) { c.Marks[0].At[1] = -3e5 }, "Marks[0].At.Y", ErrOutOfRange, "exceeds"},
		{"mark duplicate", func(c *Cell) { c.Marks = append(c.Marks, Mark{Name: "datum"}) }, "Marks[1].Name", ErrDuplicateName, "Marks[0]"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			c := validCell()
			tt.edit(c)
			err := c.Validate()
			if tt.wantField == "" {
				if err != nil {
					t.Fatalf("got %v, want nil", err)
				}
				return
			}
			var ie *InputError
			if !errors.As(err, &ie) {
				t.Fatalf("got %v (%T), want an *InputError", err, err)
			}
			if ie.Field != tt.wantField {
				t.Errorf("field: got %q, want %q", ie.Field, tt.wantField)
			}
			if !errors.Is(err, tt.wantErr) {
				t.Errorf("got %v, want an error wrapping %v", err, tt.wantErr)
			}
			if !strings.Contains(err.Error(), tt.wantText) {
				t.Errorf("got message %q, want it to contain %q", err, tt.wantText)
			}
		})
	}
}

func TestSolidAndFrameValidate(t *testing.T) {
	tests := []struct {
		name      string
		err       error
		wantField string
		wantErr   error
	}{
		{"solid full height", Solid{Footprint: Circle(orb.Point{}, 1), ZMin: 0, ZMax: math.Inf(1)}.Validate(), "", nil},
		{"solid NaN bottom", Solid{Footprint: Circle(orb.Point{}, 1), ZMin: math.NaN()}.Validate(), "ZMin", ErrNotFinite},
		{"solid bad ring", Solid{Footprint: Footprint{Ring: orb.Ring{{0, 0}, {1, 0}}}}.Validate(), "Footprint.Ring", ErrNotClosed},
		{"frame ok", JetFrame{Exit: r3.Vec{X: 1, Y: 2, Z: 1}, Heading: 3}.Validate(), "", nil},
		{"frame NaN exit", JetFrame{Exit: r3.Vec{Y: math.NaN()}}.Validate(), "Exit.Y", ErrNotFinite},
		{"frame Inf heading", JetFrame{Heading: math.Inf(1)}.Validate(), "Heading", ErrNotFinite},
		{"circle ok", CheckCircle(orb.Point{1, 1}, 0), "", nil},
		{"circle NaN radius", CheckCircle(orb.Point{1, 1}, math.NaN()), "Radius", ErrNotFinite},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if tt.wantField == "" {
				if tt.err != nil {
					t.Fatalf("got %v, want nil", tt.err)
				}
				return
			}
			var ie *InputError
			if !errors.As(tt.err, &ie) || ie.Field != tt.wantField || !errors.Is(tt.err, tt.wantErr) {
				t.Errorf("got %v, want an *InputError for %q wrapping %v", tt.err, tt.wantField, tt.wantErr)
			}
		})
	}
}

// TestSegmentInside checks sight lines against an L-shaped room
// (hand-computed): a line across the reflex corner leaves the room, one
// along an inner wall stays in, and an open site keeps everything inside.
func TestSegmentInside(t *testing.T) {
	l := &Cell{Boundary: orb.Ring{{0, 0}, {20, 0}, {20, 8}, {8, 8}, {8, 20}, {0, 20}, {0, 0}}}
	tests := []struct {
		name string
		a, b orb.Point
		want bool
	}{
		{"across the reflex corner", orb.Point{12, 4}, orb.Point{4, 16}, false},
		{"inside the long arm", orb.Point{2, 2}, orb.Point{18, 6}, true},
		{"along the inner wall", orb.Point{8, 10}, orb.Point{8, 18}, true},
		{"grazing the reflex vertex", orb.Point{12, 4}, orb.Point{4, 12}, true},
		{"end outside", orb.Point{2, 2}, orb.Point{25, 2}, false},
	}
	for _, tt := range tests {
		if got := l.SegmentInside(tt.a, tt.b); got != tt.want {
			t.Errorf("%s: got %v, want %v", tt.name, got, tt.want)
		}
	}
	if !(&Cell{}).SegmentInside(orb.Point{0, 0}, orb.Point{1e4, 1e4}) {
		t.Error("open site: got outside")
	}
}
