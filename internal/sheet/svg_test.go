package sheet_test

import (
	"bytes"
	"encoding/xml"
	"errors"
	"fmt"
	"io"
	"math"
	"strings"
	"testing"

	"arcwright/internal/planner"
	"arcwright/internal/sheet"
)

func planView(t testing.TB, p *planner.Plan) *sheet.PlanDrawing {
	t.Helper()
	d, err := sheet.PlanView(p, sheet.Options{})
	if err != nil {
		t.Fatalf("PlanView: %v", err)
	}
	return d
}

func svgOf(t testing.TB, d *sheet.PlanDrawing) []byte {
	t.Helper()
	var b bytes.Buffer
	if err := d.WriteSVG(&b); err != nil {
		t.Fatalf("WriteSVG: %v", err)
	}
	return b.Bytes()
}

// svgElement is an element of an SVG document with the attributes the
// tests read.
type svgElement struct {
	Name  string
	Attr  map[string]string
	Depth int
}

// parseSVG reads the document with encoding/xml, failing the test when it
// is not well-formed, and returns its elements in order.
func parseSVG(t *testing.T, doc []byte) []svgElement {
	t.Helper()
	dec := xml.NewDecoder(bytes.NewReader(doc))
	var out []svgElement
	depth := 0
	for {
		tok, err := dec.Token()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			t.Fatalf("SVG is not well-formed XML: %v", err)
		}
		switch tk := tok.(type) {
		case xml.StartElement:
			e := svgElement{Name: tk.Name.Local, Attr: map[string]string{}, Depth: depth}
			for _, a := range tk.Attr {
				e.Attr[a.Name.Local] = a.Value
			}
			out = append(out, e)
			depth++
		case xml.EndElement:
			depth--
		}
	}
	if depth != 0 {
		t.Fatalf("SVG ends %d elements deep, want 0", depth)
	}
	return out
}

func TestPlanViewStations(t *testing.T) {
	for _, tc := range []struct {
		name string
		plan func(testing.TB) *planner.Plan
	}{
		{"chamber", chamberPlan},
		{"pad", func(t testing.TB) *planner.Plan { return padPlan(t, 120) }},
	} {
		t.Run(tc.name, func(t *testing.T) {
			p := tc.plan(t)
			d := planView(t, p)
			if got, want := len(d.Stations), len(p.Stations); got != want {
				t.Fatalf("got %d station marks, want %d", got, want)
			}
			// every station at its own plan spot carries its symbol;
			// stations sharing a spot (a ring's top and bottom) at least one
			spots := map[sheet.Pt]int{}
			for _, s := range d.Stations {
				if len(s.Shapes) > 0 {
					spots[s.At]++
				}
			}
			for i, s := range d.Stations {
				if s.ID != p.Stations[i].ID || s.Verdict != p.Stations[i].Status {
					t.Errorf("station %d: got %s %v, want %s %v", i, s.ID, s.Verdict, p.Stations[i].ID, p.Stations[i].Status)
				}
				if spots[s.At] == 0 {
					t.Errorf("station %s: no symbol at its spot", s.ID)
				}
			}
			doc := svgOf(t, d)
			count := map[string]int{}
			for _, e := range parseSVG(t, doc) {
				if e.Name == "g" && strings.HasPrefix(e.Attr["class"], "station ") {
					count[e.Attr["data-verdict"]]++
				}
			}
			want := map[string]int{"ok": p.OK, "warn": p.Warn, "blocked": p.Blocked}
			for v, n := range want {
				if count[v] != n {
					t.Errorf("got %d station groups with verdict %s, want %d", count[v], v, n)
				}
			}
		})
	}
}

// The symbols differ in shape by verdict, not only in colour, so the plan
// reads in grey: ok is a circle with a dot, warn a triangle, blocked a
// struck-through circle.
func TestPlanViewVerdictShapes(t *testing.T) {
	p := chamberPlan(t)
	d := planView(t, p)
	sig := map[planner.Verdict]string{}
	for _, s := range d.Stations {
		if len(s.Shapes) == 0 {
			continue
		}
		var kinds []string
		for _, sh := range s.Shapes {
			kinds = append(kinds, string(sh.Kind)+"/"+string(sh.Style))
		}
		k := strings.Join(kinds, ",")
		if old, ok := sig[s.Verdict]; ok && old != k {
			t.Errorf("verdict %v drawn two ways: %s and %s", s.Verdict, old, k)
		}
		sig[s.Verdict] = k
	}
	if len(sig) < 3 {
		t.Fatalf("the fixture has %d verdicts, want all three", len(sig))
	}
	if sig[planner.OK] == sig[planner.Warn] || sig[planner.OK] == sig[planner.Blocked] || sig[planner.Warn] == sig[planner.Blocked] {
		t.Errorf("two verdicts share a symbol: %v", sig)
	}
}

// The zones drawn for the governing point alone are the sheet's own velocity
// zone: the drawing's transform is the sheet's.
func TestPlanViewZonesMatchSheet(t *testing.T) {
	p := chamberPlan(t)
	d := planView(t, p)
	if got, want := len(d.Points), len(p.Points); got != want {
		t.Fatalf("got zones of %d points, want %d", got, want)
	}
	find := func(ss []sheet.Shape, st sheet.Style) *sheet.Shape {
		for i := range ss {
			if ss[i].Style == st {
				return &ss[i]
			}
		}
		return nil
	}
	sheetVel := find(d.SheetZones, sheet.StyleVelocity)
	ownVel := find(d.Points[p.Governing].Shapes, sheet.StyleVelocity)
	if sheetVel == nil || ownVel == nil {
		t.Fatalf("velocity zone missing: sheet %v, point %v", sheetVel != nil, ownVel != nil)
	}
	if len(sheetVel.Points) != len(ownVel.Points) {
		t.Fatalf("got %d points in the governing velocity zone, the sheet has %d", len(ownVel.Points), len(sheetVel.Points))
	}
	for i := range ownVel.Points {
		a, b := ownVel.Points[i], sheetVel.Points[i]
		if dx, dy := a.X-b.X, a.Y-b.Y; dx*dx+dy*dy > 1e-12 {
			t.Fatalf("point %d: got %v, the sheet draws %v", i, a, b)
		}
	}
	// the cold and hot points differ: the hot one has a hot zone
	hot := 0
	for _, pz := range d.Points {
		if find(pz.Shapes, sheet.StyleHot) != nil {
			hot++
		}
	}
	if hot == 0 || hot == len(d.Points) {
		t.Errorf("got a hot zone for %d of %d points, want some but not all (one hot point in the fixture)", hot, len(d.Points))
	}
}

func TestWriteSVG(t *testing.T) {
	p := chamberPlan(t)
	d := planView(t, p)
	doc := svgOf(t, d)
	els := parseSVG(t, doc)
	if els[0].Name != "svg" || !strings.HasPrefix(els[0].Attr["viewBox"], "") || els[0].Attr["width"] == "" {
		t.Fatalf("got root %v, want an svg with a size", els[0])
	}
	points := map[string]bool{}
	var sheetZones, labels, zoneLabels, texts int
	for _, e := range els {
		switch {
		case e.Name == "g" && e.Attr["class"] == "zones":
			if e.Attr["data-point"] == "" {
				sheetZones++
				if e.Attr["display"] == "none" {
					t.Error("the sheet's zones are hidden")
				}
			} else {
				points[e.Attr["data-point"]] = true
				if e.Attr["display"] != "none" {
					t.Errorf("zones of %s shown, want hidden until chosen", e.Attr["data-point"])
				}
			}
		case e.Name == "g" && strings.HasPrefix(e.Attr["class"], "label"):
			labels++
			if strings.Contains(e.Attr["class"], "zone-label") {
				zoneLabels++
			}
		case e.Name == "text":
			texts++
		}
	}
	if sheetZones != 1 {
		t.Errorf("got %d groups of the sheet's zones, want 1", sheetZones)
	}
	for _, pt := range p.Points {
		if !points[pt.Name] {
			t.Errorf("no zones for point %s", pt.Name)
		}
	}
	// the zones' names, hidden in the page with another point's zones
	if zoneLabels == 0 {
		t.Error("no label is marked as naming a zone")
	}
	if labels != len(d.Labels) || labels == 0 {
		t.Errorf("got %d labels in the SVG, the drawing has %d", labels, len(d.Labels))
	}
	// the scale bar and its caption come along
	for _, want := range []string{"PLAN", "Scale bar"} {
		if !bytes.Contains(doc, []byte(want)) {
			t.Errorf("SVG lacks %q", want)
		}
	}
	// hatching is drawn with patterns, and every reference resolves
	ids := map[string]bool{}
	for _, e := range els {
		if e.Attr["id"] != "" {
			ids[e.Attr["id"]] = true
		}
	}
	refs := 0
	for _, e := range els {
		for _, a := range []string{"fill", "clip-path"} {
			v := e.Attr[a]
			if !strings.HasPrefix(v, "url(#") {
				continue
			}
			refs++
			if id := strings.TrimSuffix(strings.TrimPrefix(v, "url(#"), ")"); !ids[id] {
				t.Errorf("%s refers to #%s, which is not defined", a, id)
			}
		}
	}
	if refs == 0 {
		t.Error("no hatching or clipping: the zones and keep-outs are hatched on the sheet")
	}
	if !bytes.Equal(doc, svgOf(t, planView(t, p))) {
		t.Error("two drawings of the same plan differ")
	}
}

// Each station's symbol is drawn in its verdict's colour (our own palette,
// SUGGESTION) as well as in its verdict's shape.
func TestWriteSVGVerdictColours(t *testing.T) {
	want := map[string]string{"ok": "#147d3c", "warn": "#be7300", "blocked": "#c31e28"}
	els := parseSVG(t, svgOf(t, planView(t, chamberPlan(t))))
	seen := map[string]bool{}
	verdict, depth := "", -1
	for _, e := range els {
		if depth >= 0 && e.Depth <= depth {
			verdict, depth = "", -1
		}
		if e.Name == "g" && strings.HasPrefix(e.Attr["class"], "station ") {
			verdict, depth = e.Attr["data-verdict"], e.Depth
			continue
		}
		if verdict == "" || e.Attr["class"] == "hit" {
			continue
		}
		if c := e.Attr["stroke"]; c != "" && c != "none" {
			if c != want[verdict] {
				t.Errorf("a %s station is stroked %s, want %s", verdict, c, want[verdict])
			}
			seen[verdict] = true
		}
	}
	for v := range want {
		if !seen[v] {
			t.Errorf("no %s station drawn", v)
		}
	}
}

// A station ID with characters special to XML stays well-formed.
func TestWriteSVGEscapes(t *testing.T) {
	p := chamberPlan(t)
	p.Stations[0].ID = `A<1>&"x'`
	p.Stations[0].Reasons = []string{"a < b & c"}
	doc := svgOf(t, planView(t, p))
	found := false
	for _, e := range parseSVG(t, doc) {
		if e.Attr["data-id"] == `A<1>&"x'` {
			found = true
		}
	}
	if !found {
		t.Error("the escaped station ID does not read back")
	}
}

func TestPlanViewErrors(t *testing.T) {
	p := chamberPlan(t)
	if _, err := sheet.PlanView(p, sheet.Options{Paper: "B7"}); !errors.Is(err, sheet.ErrUnknownPaper) {
		t.Errorf("got %v, want ErrUnknownPaper", err)
	}
}

// A drawing with a NaN coordinate is an error, not an SVG with "NaN" in it.
func TestWriteSVGNotFinite(t *testing.T) {
	d := planView(t, chamberPlan(t))
	d.Stations[3].Shapes[0].Points[0].X = math.NaN()
	var b bytes.Buffer
	err := d.WriteSVG(&b)
	if !errors.Is(err, sheet.ErrRender) || !strings.Contains(err.Error(), d.Stations[3].ID) {
		t.Errorf("got %v, want an ErrRender naming station %s", err, d.Stations[3].ID)
	}
	if b.Len() != 0 {
		t.Errorf("wrote %d bytes before failing, want none", b.Len())
	}
}

func TestWriteSVGWriteError(t *testing.T) {
	d := planView(t, chamberPlan(t))
	if err := d.WriteSVG(failWriter{}); !errors.Is(err, sheet.ErrRender) {
		t.Errorf("got %v, want ErrRender", err)
	}
}

// PlanView cuts the plan view out of the sheet with the zones of every
// operating point; WriteSVG draws it for a browser.
func ExamplePlanView() {
	p := chamberPlan(exampleT{})
	d, err := sheet.PlanView(p, sheet.Options{})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("plan 1:%d, %d stations, zones of %d points, the sheet's of %s\n", d.View.Scale, len(d.Stations), len(d.Points), d.Governing)
	var b bytes.Buffer
	if err := d.WriteSVG(&b); err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(strings.Count(b.String(), `<g class="station `), "station symbols")
	// Output:
	// plan 1:50, 30 stations, zones of 3 points, the sheet's of SP3
	// 30 station symbols
}

func BenchmarkPlanViewSVG500(b *testing.B) {
	p := padPlan(b, 500)
	b.ReportAllocs()
	b.ResetTimer()
	for b.Loop() {
		d, err := sheet.PlanView(p, sheet.Options{})
		if err != nil {
			b.Fatal(err)
		}
		if err := d.WriteSVG(io.Discard); err != nil {
			b.Fatal(err)
		}
	}
}
