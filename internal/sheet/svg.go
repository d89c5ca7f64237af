package sheet

import (
	"bufio"
	"fmt"
	"io"
	"math"
	"sort"
	"strconv"
	"strings"
	"sync"

	"arcwright/internal/jet"
	"arcwright/internal/planner"
)

// PlanDrawing is the plan view of sheet 1 on its own, for a screen: the
// same shapes, labels and scale bar the PDF draws, cut out of the sheet
// model, with each station's symbols grouped under its ID and the zones of
// every operating point beside the ones the sheet draws.
type PlanDrawing struct {
	// Area is the part of sheet 1 shown: the plan view's frame and the
	// strip under it with the scale bar, mm.
	Area Rect
	// View is the plan view: its frame, scale and every shape the sheet
	// draws in it except the zones and the station symbols, which are in
	// SheetZones and Stations.
	View View
	// SheetZones are the zone shapes the sheet draws (the governing
	// point's velocity zone, the longest hot zone, margins and core).
	SheetZones []Shape
	// Points holds the zones of each operating point alone, drawn the way
	// the sheet draws the governing one, in the plan's order of points.
	Points []PointZones
	// Stations are the station symbols, in the plan's order.
	Stations []StationMark
	// Shapes and Texts are the page's shapes and texts that fall inside
	// Area outside the view (the scale bar, the caption).
	Shapes []Shape
	Texts  []Text
	// Labels are the labels placed on the plan view.
	Labels []Label
	// Governing names the point whose velocity zone the sheet draws, and
	// GoverningHot the point whose hot zone it draws.
	Governing, GoverningHot string

	zonesAt int // the index in View.Shapes before which the zones are drawn
}

// PointZones are the zone shapes of one operating point.
type PointZones struct {
	Name   string
	Shapes []Shape
}

// StationMark is one station's symbol on the plan.
type StationMark struct {
	ID      string
	Verdict planner.Verdict
	At      Pt      // the microphone's plan position on the page, mm
	R       float64 // the symbol's radius, mm
	Shapes  []Shape // the symbol as the sheet draws it
	Reason  string  // the leading reason, "" when ok
}

// PlanView lays out the sheet set of p with [Build] and returns its plan
// view alone, with the zones of every operating point. Its errors are
// Build's.
func PlanView(p *planner.Plan, opt Options) (*PlanDrawing, error) {
	m, err := Build(p, opt)
	if err != nil {
		return nil, err
	}
	if len(m.Pages) == 0 || m.Scale <= 0 {
		return nil, fmt.Errorf("%w: the sheet has no pages", ErrInvalidPlan)
	}
	pg := &m.Pages[0]
	vi := -1
	for i := range pg.Views {
		if pg.Views[i].Name == "plan" {
			vi = i
		}
	}
	if vi < 0 {
		return nil, fmt.Errorf("%w: sheet 1 has no plan view", ErrInvalidPlan)
	}
	view := pg.Views[vi]
	d := &PlanDrawing{
		zonesAt:      -1,
		Area:         Rect{view.Frame.X, view.Frame.Y, view.Frame.W, view.Frame.H + stripH},
		View:         View{Name: view.Name, Frame: view.Frame, Scale: view.Scale},
		Governing:    p.Points[p.Governing].Name,
		GoverningHot: p.Points[p.GoverningHot].Name,
	}
	req := p.Request
	b := &builder{
		plan: p, req: req, gov: &p.Points[p.Governing], lim: limits(req.Limits),
		pr: printer{sys: req.Units, conv: req.Convention}, m: meters.Get().(*meter), model: m,
	}
	defer meters.Put(b.m)
	// the plan view's transform, as planPage sets it up
	ext := b.planExtent()
	t, err := b.viewTransform(view, m.Scale)
	if err != nil {
		return nil, err
	}

	// stations: find each one's symbol among the view's shapes
	pts := make([]Pt, len(p.Stations))
	for i := range p.Stations {
		pts[i] = t.pt(p.Stations[i].Mic.X, p.Stations[i].Mic.Y)
	}
	r := markRadius(pts)
	d.Stations = make([]StationMark, len(p.Stations))
	for i := range p.Stations {
		s := &p.Stations[i]
		d.Stations[i] = StationMark{ID: s.ID, Verdict: s.Status, At: pts[i], R: r}
		if len(s.Reasons) > 0 {
			d.Stations[i].Reason = s.Reasons[0]
		}
	}
	owner := stationIndex(pts, r)
	spot := make(map[int][]Shape) // shapes by the first station at their spot
	for _, sh := range view.Shapes {
		switch {
		case isZoneStyle(sh.Style):
			if len(d.SheetZones) == 0 {
				d.zonesAt = len(d.View.Shapes)
			}
			d.SheetZones = append(d.SheetZones, sh)
		case isMarkStyle(sh.Style):
			if i := owner(sh); i >= 0 {
				spot[i] = append(spot[i], sh)
				continue
			}
			d.View.Shapes = append(d.View.Shapes, sh)
		default:
			d.View.Shapes = append(d.View.Shapes, sh)
		}
	}

	shareSymbols(d.Stations, spot)
	if d.zonesAt < 0 {
		d.zonesAt = len(d.View.Shapes)
	}
	// every operating point's zones, drawn as the sheet draws them
	v := &planView{b: b, frame: view.Frame, t: t}
	for i := range p.Points {
		v.shapes = nil
		v.drawZones(b.pointZones(&p.Points[i]))
		d.Points = append(d.Points, PointZones{Name: p.Points[i].Name, Shapes: v.shapes})
	}

	for _, sh := range pg.Shapes {
		if d.Area.Contains(shapeBound(sh)) {
			d.Shapes = append(d.Shapes, sh)
		}
	}
	for _, tx := range pg.Texts {
		if tx.X >= d.Area.X && tx.X <= d.Area.Right() && tx.Y >= d.Area.Y && tx.Y <= d.Area.Bottom() {
			d.Texts = append(d.Texts, tx)
		}
	}
	for _, l := range pg.Labels {
		if l.View == view.Name || d.Area.Contains(l.Box()) {
			d.Labels = append(d.Labels, l)
		}
	}
	d.crop(b, t.pt(ext.Min[0], ext.Min[1]), t.pt(ext.Max[0], ext.Max[1]))
	return d, nil
}

// crop cuts the view down to what is drawn in it, for a screen: the plan's
// extent (page corners a and b) and every label but the grid's, padded as
// the sheet pads its view. The grid labels move to the new edges, the
// scale bar and caption under the view move up with its bottom edge, and
// items left outside the new frame are dropped.
func (d *PlanDrawing) crop(b *builder, a, c Pt) {
	f := d.View.Frame
	box := boundOf([]Pt{a, c})
	for _, l := range d.Labels {
		if !strings.HasPrefix(l.For, "grid") {
			box = union(box, l.Box())
		}
	}
	for _, st := range d.Stations {
		box = union(box, rectAround(st.At, 2*st.R))
	}
	x0, y0 := math.Max(f.X, box.X-viewPad), math.Max(f.Y, box.Y-viewPad)
	x1, y1 := math.Min(f.Right(), box.Right()+viewPad), math.Min(f.Bottom(), box.Bottom()+viewPad)
	if x1-x0 < 40 || y1-y0 < 30 {
		return // too small to be worth it
	}
	cr := Rect{x0, y0, x1 - x0, y1 - y0}
	dy := cr.Bottom() - f.Bottom()
	dx := cr.X - f.X
	move := func(l *Label, mx, my float64) {
		l.X += mx
		l.Y += my
		l.Anchor = add(l.Anchor, Pt{mx, my})
		for i := range l.Line {
			l.Line[i] = add(l.Line[i], Pt{mx, my})
		}
	}
	var labels []Label
	for _, l := range d.Labels {
		switch {
		case l.For == "grid X":
			move(&l, 0, dy)
		case l.For == "grid Y":
			move(&l, dx, 0)
		case l.For == "grid axis" && strings.HasPrefix(l.Text, "X"):
			move(&l, cr.Right()-f.Right(), dy)
		case l.For == "grid axis":
			move(&l, dx, cr.Y-f.Y)
		}
		if cr.Contains(l.Box()) {
			labels = append(labels, l)
		}
	}
	d.Labels = labels
	// the strip under the view: moved to the new frame's bottom left
	area := cr
	var shapes []Shape
	for _, sh := range d.Shapes {
		if shapeBound(sh).Y < f.Bottom() {
			if cr.Contains(shapeBound(sh)) {
				shapes = append(shapes, sh)
			}
			continue
		}
		sh.Points = append([]Pt(nil), sh.Points...)
		for i := range sh.Points {
			sh.Points[i] = add(sh.Points[i], Pt{dx, dy})
		}
		shapes = append(shapes, sh)
		area = union(area, shapeBound(sh))
	}
	d.Shapes = shapes
	var texts []Text
	for _, t := range d.Texts {
		if t.Y < f.Bottom() {
			if t.X >= cr.X && t.X <= cr.Right() && t.Y >= cr.Y && t.Y <= cr.Bottom() {
				texts = append(texts, t)
			}
			continue
		}
		t.X += dx
		t.Y += dy
		texts = append(texts, t)
		area = union(area, Rect{t.X, t.Y - capHeight(t.Size), b.m.width(t.Text, t.Size, t.Bold), capHeight(t.Size) + 1})
	}
	d.Texts = texts
	d.View.Frame = cr
	d.Area = Rect{area.X, cr.Y, area.Right() - area.X + 2, math.Max(area.Bottom(), cr.Bottom()+stripH) - cr.Y}
}

// union returns the smallest rectangle holding a and b.
func union(a, b Rect) Rect {
	x0, y0 := math.Min(a.X, b.X), math.Min(a.Y, b.Y)
	x1, y1 := math.Max(a.Right(), b.Right()), math.Max(a.Bottom(), b.Bottom())
	return Rect{x0, y0, x1 - x0, y1 - y0}
}

// viewTransform recovers the plan view's transform from what the sheet
// drew at the given scale: the governing point's velocity zone, drawn from
// the outline [builder.pointZones] gives, fixes the page position of the
// world origin; failing that, the datum symbol (the largest plain circle
// in the mark style) marks it. It returns an error wrapping
// [ErrInvalidPlan] when neither is on the view.
func (b *builder) viewTransform(view View, scale int) (transform, error) {
	at := func(world [2]float64, page Pt) transform {
		return newTransform(scale, world[0], world[1], page)
	}
	vel := envelopeOutline(b.gov.Plume.Envelope(jet.VelocityZone, jet.Conservative))
	if vel != nil {
		ring := planRing(b.req.Exit, vel)
		for _, sh := range view.Shapes {
			if sh.Style != StyleVelocity || len(sh.Points) != len(ring) {
				continue
			}
			t := at(ring[0], sh.Points[0])
			last := t.pt(ring[len(ring)-1][0], ring[len(ring)-1][1])
			if dist(last, sh.Points[len(sh.Points)-1]) < 1e-6 {
				return t, nil
			}
		}
	}
	var datum *Shape
	for i, sh := range view.Shapes {
		if sh.Kind == Circle && sh.Style == StyleMark && len(sh.Points) == 1 && (datum == nil || sh.R > datum.R) {
			datum = &view.Shapes[i]
		}
	}
	if datum != nil {
		return at([2]float64{0, 0}, datum.Points[0]), nil
	}
	return transform{}, fmt.Errorf("%w: the plan view has neither the velocity zone nor the datum to place the drawing by", ErrInvalidPlan)
}

// meters keeps text meters for PlanView between calls: making one loads
// the core font's metrics.
var meters = sync.Pool{New: func() any { return newMeter() }}

// pointZones returns what the sheet would draw of point pt's plume: its
// conservative velocity and hot zones, their margins and its core.
func (b *builder) pointZones(pt *planner.PointResult) zoneSet { return b.zoneSetOf(pt, pt) }

// isZoneStyle reports whether s draws a zone ("zone.…").
func isZoneStyle(s Style) bool { return strings.HasPrefix(string(s), "zone.") }

// isMarkStyle reports whether s is a style station symbols are drawn in.
func isMarkStyle(s Style) bool {
	switch s {
	case StyleMark, StyleSolid, StyleStrike:
		return true
	}
	return strings.HasPrefix(string(s), "mark") || strings.HasPrefix(string(s), "station")
}

// stationIndex returns a function that tells which station a small shape
// belongs to: the station nearest the centre of the shape's bounding box,
// when that centre is within half a symbol radius r (mm) of it and the
// shape is no wider than three radii; -1 otherwise.
func stationIndex(pts []Pt, r float64) func(Shape) int {
	order := make([]int, len(pts))
	for i := range order {
		order[i] = i
	}
	sort.Slice(order, func(a, b int) bool { return pts[order[a]].X < pts[order[b]].X })
	xs := make([]float64, len(order))
	for k, i := range order {
		xs[k] = pts[i].X
	}
	tol := 0.5 * r
	return func(sh Shape) int {
		bd := shapeBound(sh)
		if bd.W > 3*r+1e-6 || bd.H > 3*r+1e-6 {
			return -1
		}
		c := Pt{bd.X + bd.W/2, bd.Y + bd.H/2}
		best, bestD := -1, tol
		for k := sort.SearchFloat64s(xs, c.X-tol); k < len(xs) && xs[k] <= c.X+tol; k++ {
			i := order[k]
			dd := dist(c, pts[i])
			// of stations on one spot, the first in the plan stands for all
			if dd < bestD || (dd == bestD && best >= 0 && i < best) || (best < 0 && dd <= bestD) {
				best, bestD = i, dd
			}
		}
		return best
	}
}

// shareSymbols hands the symbol shapes found at each spot to the stations
// there. Stations on one plan spot (a ring's top and bottom) are drawn one
// after the other in the plan's order, so the shapes are split in that
// order by the size of each verdict's symbol; when the counts do not add
// up, the first station at the spot takes them all.
func shareSymbols(st []StationMark, spot map[int][]Shape) {
	for first, shapes := range spot {
		var at []int
		for i := first; i < len(st); i++ {
			if st[i].At == st[first].At {
				at = append(at, i)
			}
		}
		n := 0
		for _, i := range at {
			n += len(markShapes(st[i].Verdict, st[i].At, st[i].R))
		}
		if len(at) == 1 || n != len(shapes) {
			st[first].Shapes = shapes
			continue
		}
		for _, i := range at {
			k := len(markShapes(st[i].Verdict, st[i].At, st[i].R))
			st[i].Shapes, shapes = shapes[:k:k], shapes[k:]
		}
	}
}

// shapeBound returns the bounding box of a shape, mm.
func shapeBound(s Shape) Rect {
	if s.Kind == Circle && len(s.Points) > 0 {
		return rectAround(s.Points[0], s.R)
	}
	return boundOf(s.Points)
}

// Verdict colours on the screen. Symbols also differ in shape, so a grey
// print or a colour-blind reader still tells them apart (SUGGESTION: our
// own palette).
var verdictColour = map[planner.Verdict]RGB{
	planner.OK:      {20, 125, 60},
	planner.Warn:    {190, 115, 0},
	planner.Blocked: {195, 30, 40},
}

// verdictName returns the verdict's word for class names.
func verdictName(v planner.Verdict) string {
	switch v {
	case planner.OK:
		return "ok"
	case planner.Warn:
		return "warn"
	case planner.Blocked:
		return "blocked"
	}
	return "unknown"
}

// WriteSVG writes the drawing as one SVG document in page millimetres.
// Hatching becomes SVG patterns, dash patterns stroke-dasharray. The zones
// the sheet draws are the group of class "zones" with an empty data-point;
// each operating point's zones follow in a hidden group whose data-point
// is its name; labels that name a zone have the class "zone-label", to be
// hidden with another point's zones. Each station is a group of class "station" with data-id and
// data-verdict, coloured and shaped by its verdict. The output depends only
// on the drawing.
//
// It returns an error wrapping [ErrRender] when a coordinate of the
// drawing is NaN or infinite, or when w fails.
func (d *PlanDrawing) WriteSVG(w io.Writer) error {
	if err := d.checkFinite(); err != nil {
		return err
	}
	s := &svgWriter{w: bufio.NewWriter(w)}
	a := d.Area
	s.printf(`<svg xmlns="http://www.w3.org/2000/svg" class="arcwright-plan" viewBox="%s %s %s %s" width="%smm" height="%smm" font-family="Helvetica, Arial, sans-serif">`+"\n",
		f2(a.X), f2(a.Y), f2(a.W), f2(a.H), f2(a.W), f2(a.H))
	s.printf("<title>%s</title>\n", esc(fmt.Sprintf("Plan, scale 1:%d", d.View.Scale)))
	// patterns first, for every hatched style in the drawing
	var all []Shape
	all = append(all, d.View.Shapes...)
	all = append(all, d.SheetZones...)
	for _, pz := range d.Points {
		all = append(all, pz.Shapes...)
	}
	all = append(all, d.Shapes...)
	s.printf("<defs>\n")
	seen := map[Style]bool{}
	for _, sh := range all {
		if seen[sh.Style] {
			continue
		}
		seen[sh.Style] = true
		def, ok := styles[sh.Style]
		if !ok {
			continue
		}
		for i, h := range def.Hatches {
			id := patternID(sh.Style, i)
			sp := h.Spacing
			s.printf(`<pattern id="%s" patternUnits="userSpaceOnUse" width="%s" height="%s" patternTransform="rotate(%s)"><line x1="0" y1="%s" x2="%s" y2="%s" stroke="%s" stroke-width="%s"/></pattern>`+"\n",
				id, f3(sp), f3(sp), f2(-h.Angle), f3(sp/2), f3(sp), f3(sp/2), hex(h.Pen.Color), f3(h.Pen.Width))
		}
	}
	f := d.View.Frame
	s.printf(`<clipPath id="aw-frame"><rect x="%s" y="%s" width="%s" height="%s"/></clipPath>`+"\n", f2(f.X), f2(f.Y), f2(f.W), f2(f.H))
	s.printf("</defs>\n")
	s.printf(`<rect x="%s" y="%s" width="%s" height="%s" fill="#ffffff"/>`+"\n", f2(a.X), f2(a.Y), f2(a.W), f2(a.H))

	s.printf(`<g clip-path="url(#aw-frame)">` + "\n")
	// the view's shapes in the sheet's order with the zones where the
	// sheet draws them; the stations on top, to be pointed at
	zonesAt := min(d.zonesAt, len(d.View.Shapes))
	for i := 0; i <= len(d.View.Shapes); i++ {
		if i == zonesAt {
			s.zones(d)
		}
		if i == len(d.View.Shapes) {
			break
		}
		s.shape(d.View.Shapes[i], nil)
	}
	s.stations(d)
	s.printf("</g>\n")
	s.shape(rectShape(StyleBox, f), nil)
	for _, sh := range d.Shapes {
		s.shape(sh, nil)
	}
	// labels: leaders, then white boxes with their text
	for _, l := range d.Labels {
		if len(l.Line) == 2 {
			s.shape(line(StyleLeader, l.Line[0], l.Line[1]), nil)
		}
	}
	for _, l := range d.Labels {
		cls := "label"
		if strings.Contains(l.For, "zone") || strings.Contains(l.Text, "zone") {
			cls += " zone-label"
		}
		s.printf(`<g class="%s" data-for="%s">`, cls, esc(l.For))
		s.printf(`<rect x="%s" y="%s" width="%s" height="%s" fill="#ffffff"/>`, f2(l.X), f2(l.Y), f2(l.W), f2(l.H))
		s.text(Text{X: l.X + 0.4, Y: l.Y + 0.5 + capHeight(l.Size), Size: l.Size, Text: l.Text, Bold: l.Kind == NumberLabel})
		s.printf("</g>\n")
	}
	for _, t := range d.Texts {
		s.text(t)
		s.printf("\n")
	}
	s.printf("</svg>\n")
	if s.err != nil {
		return fmt.Errorf("%w: %w", ErrRender, s.err)
	}
	if err := s.w.Flush(); err != nil {
		return fmt.Errorf("%w: %w", ErrRender, err)
	}
	return nil
}

// checkFinite returns an error wrapping [ErrRender] naming the first item
// of the drawing with a NaN or infinite coordinate.
func (d *PlanDrawing) checkFinite() error {
	bad := func(what string) error {
		return fmt.Errorf("%w: %s has a coordinate that is not a finite number", ErrRender, what)
	}
	shapes := func(what string, ss []Shape) error {
		for _, sh := range ss {
			if !finite(sh.R) {
				return bad(what)
			}
			for _, ring := range append([][]Pt{sh.Points, sh.Clip}, sh.Holes...) {
				for _, p := range ring {
					if !finite(p.X, p.Y) {
						return bad(what + " (" + string(sh.Style) + ")")
					}
				}
			}
		}
		return nil
	}
	a := d.Area
	if !finite(a.X, a.Y, a.W, a.H) {
		return bad("the drawing's area")
	}
	if err := shapes("the plan view", d.View.Shapes); err != nil {
		return err
	}
	if err := shapes("the zones", d.SheetZones); err != nil {
		return err
	}
	for _, pz := range d.Points {
		if err := shapes("the zones of "+pz.Name, pz.Shapes); err != nil {
			return err
		}
	}
	for _, st := range d.Stations {
		if !finite(st.At.X, st.At.Y, st.R) {
			return bad("station " + st.ID)
		}
		if err := shapes("station "+st.ID, st.Shapes); err != nil {
			return err
		}
	}
	if err := shapes("the scale bar", d.Shapes); err != nil {
		return err
	}
	for _, t := range d.Texts {
		if !finite(t.X, t.Y, t.Size) {
			return bad("the text " + strconv.Quote(t.Text))
		}
	}
	for _, l := range d.Labels {
		if !finite(l.X, l.Y, l.W, l.H, l.Size) {
			return bad("the label " + strconv.Quote(l.Text))
		}
		for _, p := range l.Line {
			if !finite(p.X, p.Y) {
				return bad("the leader of " + strconv.Quote(l.Text))
			}
		}
	}
	return nil
}

// svgWriter writes SVG elements, keeping the first write error.
type svgWriter struct {
	w     *bufio.Writer
	err   error
	clips int
}

func (s *svgWriter) printf(format string, args ...any) {
	if s.err != nil {
		return
	}
	_, s.err = fmt.Fprintf(s.w, format, args...)
}

// zones writes the sheet's zones, then each point's, hidden.
func (s *svgWriter) zones(d *PlanDrawing) {
	s.printf(`<g class="zones" data-point="">` + "\n")
	for _, sh := range d.SheetZones {
		s.shape(sh, nil)
	}
	s.printf("</g>\n")
	for _, pz := range d.Points {
		s.printf(`<g class="zones" data-point="%s" display="none">`+"\n", esc(pz.Name))
		for _, sh := range pz.Shapes {
			s.shape(sh, nil)
		}
		s.printf("</g>\n")
	}
}

// stations writes each station's group: its symbol in its verdict's
// colour, a title for a tooltip and a larger transparent target for
// pointing at it.
func (s *svgWriter) stations(d *PlanDrawing) {
	s.printf(`<g class="stations">` + "\n")
	for i := range d.Stations {
		st := &d.Stations[i]
		c := verdictColour[st.Verdict]
		vn := verdictName(st.Verdict)
		s.printf(`<g class="station v-%s" data-id="%s" data-verdict="%s">`, vn, esc(st.ID), vn)
		tip := st.ID + ": " + vn
		if st.Reason != "" {
			tip += " — " + st.Reason
		}
		s.printf("<title>%s</title>", esc(tip))
		tint := func(x RGB) RGB {
			if x == black {
				return c
			}
			return x
		}
		for _, sh := range st.Shapes {
			s.shape(sh, tint)
		}
		s.printf(`<circle class="hit" cx="%s" cy="%s" r="%s" fill="#000000" fill-opacity="0" stroke="none"/>`, f2(st.At.X), f2(st.At.Y), f3(math.Max(2*st.R, 1.6)))
		s.printf("</g>\n")
	}
	s.printf("</g>\n")
}

// shape writes one shape in its style: fill, hatching, outline. tint, when
// not nil, changes the style's colours.
func (s *svgWriter) shape(sh Shape, tint func(RGB) RGB) {
	def, ok := styles[sh.Style]
	if !ok || len(sh.Points) == 0 {
		return
	}
	if tint == nil {
		tint = func(c RGB) RGB { return c }
	}
	clip := ""
	if len(sh.Clip) >= 3 {
		s.clips++
		id := "aw-clip-" + strconv.Itoa(s.clips)
		s.printf(`<clipPath id="%s"><path d="%s"/></clipPath>`, id, pathData([][]Pt{sh.Clip}, true))
		clip = ` clip-path="url(#` + id + `)"`
	}
	pen := func(p Pen) string {
		var b strings.Builder
		fmt.Fprintf(&b, ` stroke="%s" stroke-width="%s"`, hex(tint(p.Color)), f3(p.Width))
		if len(p.Dash) > 0 {
			ds := make([]string, len(p.Dash))
			for i, v := range p.Dash {
				ds[i] = f3(v)
			}
			fmt.Fprintf(&b, ` stroke-dasharray="%s"`, strings.Join(ds, " "))
		}
		if p.Round {
			b.WriteString(` stroke-linecap="round"`)
		}
		return b.String()
	}
	cls := ` class="s-` + strings.ReplaceAll(string(sh.Style), ".", "-") + `"`
	switch sh.Kind {
	case Circle:
		c := sh.Points[0]
		attr := ` fill="none"`
		if def.Fill != nil {
			attr = ` fill="` + hex(tint(*def.Fill)) + `"`
		}
		if def.Pen.Width > 0 {
			attr += pen(def.Pen)
		}
		s.printf(`<circle%s%s cx="%s" cy="%s" r="%s"%s/>`+"\n", cls, clip, f2(c.X), f2(c.Y), f3(sh.R), attr)
	case Polyline:
		if def.Pen.Width > 0 && len(sh.Points) > 1 {
			s.printf(`<path%s%s d="%s" fill="none"%s/>`+"\n", cls, clip, pathData([][]Pt{sh.Points}, false), pen(def.Pen))
		}
	case Polygon:
		rings := append([][]Pt{sh.Points}, sh.Holes...)
		d := pathData(rings, true)
		if clip != "" {
			s.printf(`<g%s>`, clip)
		}
		if def.Fill != nil {
			s.printf(`<path%s d="%s" fill="%s" fill-rule="evenodd" stroke="none"/>`+"\n", cls, d, hex(tint(*def.Fill)))
		}
		for i := range def.Hatches {
			s.printf(`<path%s d="%s" fill="url(#%s)" fill-rule="evenodd" stroke="none"/>`+"\n", cls, d, patternID(sh.Style, i))
		}
		if def.Pen.Width > 0 {
			s.printf(`<path%s d="%s" fill="none"%s/>`+"\n", cls, d, pen(def.Pen))
		}
		if clip != "" {
			s.printf("</g>\n")
		}
	}
}

// text writes one line of text with its baseline at (X, Y).
func (s *svgWriter) text(t Text) {
	fill := "#000000"
	switch t.Color {
	case Grey:
		fill = "#5a5a5a"
	case Red:
		fill = hex(hotRed)
	}
	weight := ""
	if t.Bold {
		weight = ` font-weight="bold"`
	}
	s.printf(`<text x="%s" y="%s" font-size="%s" fill="%s"%s>%s</text>`, f2(t.X), f2(t.Y), f3(t.Size*mmPerPt), fill, weight, esc(t.Text))
}

// pathData returns the SVG path of the rings.
func pathData(rings [][]Pt, closed bool) string {
	var b strings.Builder
	for _, r := range rings {
		for i, p := range r {
			if i == 0 {
				b.WriteString("M")
			} else {
				b.WriteString("L")
			}
			b.WriteString(f2(p.X))
			b.WriteByte(' ')
			b.WriteString(f2(p.Y))
		}
		if closed && len(r) > 0 {
			b.WriteString("Z")
		}
	}
	return b.String()
}

// patternID is the id of the i-th hatch pattern of style st.
func patternID(st Style, i int) string {
	return "aw-hatch-" + strings.ReplaceAll(string(st), ".", "-") + "-" + strconv.Itoa(i)
}

// hex returns c as #rrggbb.
func hex(c RGB) string { return fmt.Sprintf("#%02x%02x%02x", c[0], c[1], c[2]) }

// f2 and f3 print a page length rounded to 0.01 and 0.001 mm.
func f2(v float64) string { return strconv.FormatFloat(roundTo(v, 100), 'f', -1, 64) }
func f3(v float64) string { return strconv.FormatFloat(roundTo(v, 1000), 'f', -1, 64) }

// roundTo rounds v to 1/k, without a minus zero.
func roundTo(v, k float64) float64 {
	r := math.Round(v*k) / k
	if r == 0 {
		return 0
	}
	return r
}

// esc escapes text for XML.
func esc(s string) string {
	var b strings.Builder
	for _, r := range s {
		switch r {
		case '&':
			b.WriteString("&amp;")
		case '<':
			b.WriteString("&lt;")
		case '>':
			b.WriteString("&gt;")
		case '"':
			b.WriteString("&quot;")
		case '\'':
			b.WriteString("&#39;")
		default:
			if r < 0x20 && r != '\t' && r != '\n' {
				continue
			}
			b.WriteRune(r)
		}
	}
	return b.String()
}
