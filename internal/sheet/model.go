package sheet

import (
	"math"
	"strconv"
	"time"
)

// Pt is a point on the page, mm from the top-left corner, x right, y down.
type Pt struct{ X, Y float64 }

// Rect is a rectangle on the page, mm: top-left corner (X, Y), width W and
// height H.
type Rect struct{ X, Y, W, H float64 }

// Right returns the x of the right edge, mm.
func (r Rect) Right() float64 { return r.X + r.W }

// Bottom returns the y of the bottom edge, mm.
func (r Rect) Bottom() float64 { return r.Y + r.H }

// Overlaps reports whether r and o share an area wider and taller than gap
// (mm): rectangles that only touch, or overlap by at most gap, do not
// overlap.
func (r Rect) Overlaps(o Rect, gap float64) bool {
	return r.X+gap < o.Right() && o.X+gap < r.Right() && r.Y+gap < o.Bottom() && o.Y+gap < r.Bottom()
}

// Contains reports whether o lies inside r; edges count as inside.
func (r Rect) Contains(o Rect) bool {
	return o.X >= r.X && o.Y >= r.Y && o.Right() <= r.Right() && o.Bottom() <= r.Bottom()
}

// inset returns r shrunk by d on every side (mm).
func (r Rect) inset(d float64) Rect { return Rect{r.X + d, r.Y + d, r.W - 2*d, r.H - 2*d} }

// ShapeKind is the kind of a drawn shape.
type ShapeKind string

// Shape kinds.
const (
	// Polyline is an open line through Points.
	Polyline ShapeKind = "polyline"
	// Polygon is the closed ring Points with optional Holes; fills and
	// hatching follow the even-odd rule.
	Polygon ShapeKind = "polygon"
	// Circle is the circle of centre Points[0] and radius R.
	Circle ShapeKind = "circle"
)

// Shape is one drawn item in page millimetres. Its Style names the pen,
// fill and hatching (see [Styles]).
type Shape struct {
	Kind   ShapeKind `json:"kind"`
	Style  Style     `json:"style"`
	Points []Pt      `json:"points"`
	Holes  [][]Pt    `json:"holes,omitempty"`
	R      float64   `json:"r,omitempty"` // circle radius, mm
	// Clip, when it has three points or more, is a polygon the shape is
	// drawn inside of (a zone is cut at the walls of a bounded cell).
	Clip []Pt `json:"clip,omitempty"`
}

// Text is one line of text: its baseline starts at (X, Y), mm.
type Text struct {
	X, Y  float64
	Size  float64 // pt
	Bold  bool    `json:",omitempty"`
	Color Tone    `json:",omitempty"`
	Text  string
}

// Tone is a text colour.
type Tone string

// Text colours: black (the zero value), grey for secondary text and red for
// cautions.
const (
	Black Tone = ""
	Grey  Tone = "grey"
	Red   Tone = "red"
)

// LabelKind says what a label labels.
type LabelKind string

// Label kinds.
const (
	StationLabel   LabelKind = "station"   // a station ID beside its mark
	NumberLabel    LabelKind = "number"    // a key number standing for a station ID
	AngleLabel     LabelKind = "angle"     // a polar angle beside an arc tick
	FeatureLabel   LabelKind = "feature"   // a name of an obstacle, mark, zone, …
	DimensionLabel LabelKind = "dimension" // a dimension or coordinate callout
	RangeLabel     LabelKind = "range"     // "N-20…N-35": a run of neighbouring stations too close to label one by one
)

// Label is a placed text in a view: its box (X, Y, W, H) in mm, kept free of
// every other label and of the marks, and the point it labels. A leader line
// joins Anchor to the box when the label had to move away from its mark.
type Label struct {
	Text       string
	Kind       LabelKind
	For        string // the station ID or feature name
	X, Y, W, H float64
	Size       float64 // pt
	Anchor     Pt
	Leader     bool `json:",omitempty"`
	Line       []Pt `json:",omitempty"` // the leader, from the mark's edge to the box
	View       string
}

// Box returns the label's box.
func (l Label) Box() Rect { return Rect{l.X, l.Y, l.W, l.H} }

// Column is one column of a table.
type Column struct {
	Heading []string // heading lines
	W       float64  // width, mm
	Right   bool     `json:",omitempty"` // right-aligned (numbers)
}

// Row is one row of a table: each cell's lines, and the row's height (mm).
type Row struct {
	Cells [][]string
	H     float64
}

// Table is one part of a table on one page: a title, the heading and the
// rows that fit. A table that continues from the previous page repeats its
// heading with Continued set.
type Table struct {
	Name      string // which table: "stations", "points", "absorption", "key"
	Title     string
	X, Y      float64 // top-left corner of the title line, mm
	Size      float64 // pt
	Line      float64 // line height, mm
	TitleH    float64 // height of the title line, mm
	HeadH     float64 // height of the heading row, mm
	Columns   []Column
	Rows      []Row
	Continued bool `json:",omitempty"`
}

// W returns the table's width, mm.
func (t *Table) W() float64 {
	w := 0.0
	for _, c := range t.Columns {
		w += c.W
	}
	return w
}

// H returns the table's height with its title, mm.
func (t *Table) H() float64 {
	h := t.TitleH + t.HeadH
	for _, r := range t.Rows {
		h += r.H
	}
	return h
}

// View is a drawing clipped to its frame: the plan, the elevation, the
// clearance view or a detail.
type View struct {
	Name  string // "plan", "elevation", "clearance" or "detail …"
	Frame Rect
	Scale int // denominator
	// VScale is the vertical scale's denominator where it differs from
	// Scale (a stated vertical exaggeration in a side view); 0 otherwise.
	VScale int `json:",omitempty"`
	Shapes []Shape
}

// ScaleBar is the graphic scale of the plan view.
type ScaleBar struct {
	X, Y       float64 // left end of the bar's top edge, mm
	LengthMM   float64 // drawn length, mm: RealLength·1000/Scale
	RealLength float64 // the length it stands for, m
	Divisions  int
	Ticks      []string // labels at the division marks, left to right
	Label      string   // the full length with its unit, "5 m" or "20 ft"
}

// KeyEntry pairs a key number printed on the plan with a station ID.
type KeyEntry struct {
	Number int
	ID     string
}

// Page is one sheet of the set.
type Page struct {
	Number     int
	Frame      Rect // the drawing border, mm
	TitleBlock Rect // the title block, bottom right, mm
	Views      []View
	Shapes     []Shape
	Texts      []Text
	Labels     []Label
	Tables     []Table
	Panels     []Panel `json:",omitempty"`
}

// Model is a laid-out sheet set, ready to render: everything the PDF shows,
// in page millimetres.
type Model struct {
	Paper          Paper
	Scale          int // plan scale denominator
	ElevationScale int // elevation scale denominator
	Units          string
	Convention     string
	Governing      string // the operating point whose zones are drawn
	IssueDate      string // as printed in the title block
	Created        time.Time
	Title          string
	ScaleBar       ScaleBar
	// Key lists the key numbers printed on the plan instead of station IDs
	// that had no room.
	Key []KeyEntry
	// Unlabelled lists the stations that got neither an ID nor a key number
	// on the plan (their positions are in the station table).
	Unlabelled []string
	// Warnings are the lines of the warnings panel on sheet 1, each with
	// the plan's warnings it stands for.
	Warnings []WarningLine `json:",omitempty"`
	Pages    []Page
}

// WarningLine is one line of the warnings panel on sheet 1.
type WarningLine struct {
	Text string
	// Warnings are the indices in Plan.Warnings of the warnings it
	// stands for: one, or one of a kind for several operating points.
	Warnings []int
	Safety   bool    // a safety warning
	Size     float64 // type size, pt
}

// Panel is a boxed block of text on a sheet: the safety panel, the
// warnings, the legend, the notes, the label key.
type Panel struct {
	Name string
	Box  Rect
}

// MarshalJSON writes the point as the string "x y", each rounded to
// 0.001 mm, which keeps dumps compact and the same on every platform.
func (p Pt) MarshalJSON() ([]byte, error) {
	return []byte(`"` + num3(p.X) + " " + num3(p.Y) + `"`), nil
}

// num3 prints v rounded to 0.001 without trailing zeros or a minus zero.
func num3(v float64) string {
	r := math.Round(v*1000) / 1000
	if r == 0 {
		r = 0
	}
	return strconv.FormatFloat(r, 'f', -1, 64)
}
