package sheet

import (
	"fmt"
	"math"

	"strings"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/planner"
)

// The side views of sheet 2 share the horizontal axis, x along the jet axis
// from the nozzle exit (downstream to the right), and its scale:
//
//   - the elevation is the true vertical section through the jet axis:
//     floor, ceiling, the walls where the axis meets them, the obstacles the
//     section cuts, the nozzle, the collector and the zones, each zone cut
//     at the floor, the ceiling and the walls;
//   - the clearance view is the jet's meridional half-plane, the vertical
//     axis the distance r from the jet axis: the zones are axisymmetric, so
//     each station, drawn at its axial position and its true distance from
//     the axis, is outside a zone exactly when its mark is outside the
//     zone's outline there. A zone bent by buoyancy or carried along a
//     surface is no body of revolution and is not drawn there: a station
//     it blocks is ringed, with a note to see the plan.
//
// When the height of a view would be a sliver at the horizontal scale, its
// vertical scale is a larger standard scale, at most 10 times larger, and
// the view's title states the exaggeration.

// sideView is one of the side views being drawn.
type sideView struct {
	b      *builder
	name   string // "elevation" or "clearance"
	frame  Rect
	t      transform
	sx, sy int     // scale denominators, horizontal and vertical
	u0, u1 float64 // axial range shown, m
	v0, v1 float64 // vertical range shown, m
	shapes []Shape
	labels []Label
	texts  []Text
	pl     *placer
}

// axial returns the axial position of p (cell frame), m from the exit plane.
func (b *builder) axial(p r3.Vec) float64 {
	fr := b.req.Exit
	return r3.Dot(r3.Sub(p, fr.Exit), fr.Axis())
}

// floorBand is the depth of floor drawn under the elevation, m.
const floorBand = 0.4

// maxElevationIDs is the most stations whose IDs the clearance view prints.
const maxElevationIDs = 80

// maxExaggeration is the largest vertical exaggeration of a side view.
const maxExaggeration = 10

// minViewH is the height below which a side view is a sliver, mm.
const minViewH = 30.0

// zoneStops returns the axial positions, m, where a side view cuts the
// zones: the walls on the axis (axisWalls) of a walled cell; ±Inf outdoors,
// where the jet runs on beyond the site limit (issue 8).
func (b *builder) zoneStops() (lo, hi float64) {
	if !b.walled() {
		return math.Inf(-1), math.Inf(1)
	}
	return b.axisWalls()
}

// boundaryStyle is the style of the cell's boundary: a site limit is
// dashed.
func (b *builder) boundaryStyle() Style {
	if b.req.Cell.Kind == geometry.OutdoorPad {
		return StyleSiteLimit
	}
	return StyleBoundary
}

// boundaryWord names the cell's boundary in a table heading: "site limit"
// on an outdoor pad (not a wall, issue 8), else "wall".
func (b *builder) boundaryWord() string {
	if b.req.Cell.Kind == geometry.OutdoorPad {
		return "site limit"
	}
	return "wall"
}

// axisWalls returns the axial positions where the jet axis, in plan, leaves
// the boundary upstream and downstream of the exit, m; ±Inf for an open
// cell or where the axis does not leave it within reach.
func (b *builder) axisWalls() (lo, hi float64) {
	c := &b.req.Cell
	lo, hi = math.Inf(-1), math.Inf(1)
	if !c.Bounded() {
		return lo, hi
	}
	fr := b.req.Exit
	bd := c.Boundary.Bound()
	reach := math.Hypot(bd.Max[0]-bd.Min[0], bd.Max[1]-bd.Min[1]) + 1
	in := func(x float64) bool {
		p := fr.ToCell(geometry.JetPoint{X: x})
		return c.Contains(orb.Point{p.X, p.Y})
	}
	if !in(0) {
		return lo, hi
	}
	// march out in 1/400 of the reach, then bisect to 1 mm
	step := reach / 400
	edge := func(dir float64) float64 {
		a := 0.0
		for a < reach && in(dir*(a+step)) {
			a += step
		}
		if a >= reach {
			return dir * math.Inf(1)
		}
		z := a + step
		for z-a > 1e-3 {
			m := (a + z) / 2
			if in(dir * m) {
				a = m
			} else {
				z = m
			}
		}
		return dir * a
	}
	return edge(-1), edge(1)
}

// axialRange returns the axial range both side views show, m: the nozzle,
// every station, the collector, the zones as far as the walls let them run,
// and the walls on the axis.
func (b *builder) axialRange() (u0, u1 float64) {
	u0, u1 = -nozzleLen(b.gov.Exit.Diameter)-0.3, 0.3
	ext := func(u float64) { u0, u1 = math.Min(u0, u), math.Max(u1, u) }
	for i := range b.plan.Stations {
		ext(b.plan.Stations[i].Jet.X)
	}
	if col := b.req.Cell.Collector; col != nil {
		ext(b.axial(col.Inlet))
	}
	lo, hi := b.axisWalls()
	reach := 0.0
	for _, o := range []zoneOutline{b.zs.velM, b.zs.hotM} {
		if len(o) > 0 {
			reach = math.Max(reach, o[len(o)-1][0])
		}
	}
	ext(math.Min(reach, hi))
	if finite(lo) {
		ext(lo)
	}
	if finite(hi) {
		ext(hi)
	}
	pad := math.Max(0.3, 0.03*(u1-u0))
	return u0 - pad, u1 + pad
}

// sideScales returns the horizontal and vertical scales of a side view of
// w × h m in an area of aw × maxH mm, horizontal scale sx fixed (0:
// choose): the vertical scale is sx unless the view would be lower than
// minViewH, then the largest scale up to maxExaggeration times sx that
// fits maxH.
func (b *builder) sideScales(sx int, w, h, aw, maxH float64) (int, int, bool) {
	list := scalesFor(b.req.Units)
	try := list
	if sx > 0 {
		try = []int{sx}
	}
	for _, sx := range try {
		if w*1000/float64(sx) > aw || h*1000/float64(sx) > maxH {
			continue
		}
		sy := sx
		if h*1000/float64(sx) < minViewH {
			for _, s := range list {
				// an exaggeration a reader can use: a whole or half number
				ratio := float64(sx) / float64(s)
				if s < sx && ratio <= maxExaggeration && math.Abs(ratio*2-math.Round(ratio*2)) < 1e-9 && h*1000/float64(s) <= maxH {
					sy = s
					break
				}
			}
		}
		return sx, sy, true
	}
	return 0, 0, false
}

// exaggeration says the vertical exaggeration of a view, "" if none.
func exaggeration(sx, sy int) string {
	if sx == sy {
		return ""
	}
	return fmt.Sprintf(" (vertical exaggeration ×%s)", trimNum(float64(sx)/float64(sy)))
}

// newSide sets up a side view of the world range [u0, u1] × [v0, v1] at
// 1:sx and 1:sy with its top-left corner at (x, y).
func (b *builder) newSide(name string, x, y float64, sx, sy int, u0, u1, v0, v1 float64) *sideView {
	kx, ky := 1000/float64(sx), 1000/float64(sy)
	w := (u1-u0)*kx + 2*viewPad
	h := (v1-v0)*ky + 2*viewPad
	v := &sideView{b: b, name: name, frame: Rect{x, y, w, h}, sx: sx, sy: sy, u0: u0, u1: u1, v0: v0, v1: v1}
	v.t = newTransform2(sx, sy, u0, v1, Pt{x + viewPad, y + viewPad})
	v.pl = newPlacer(v.frame.inset(0.8))
	return v
}

// grid draws the view's grid, numbered along the bottom (x) and the left
// edge (the vertical quantity) in the layout's unit.
func (v *sideView) grid(vname string) {
	b := v.b
	u := unitLen(b.req.Units)
	gx := gridSpacing(v.sx, b.req.Units, 15)
	gy := gridSpacing(v.sy, b.req.Units, 8)
	for i := math.Ceil(v.u0 / gx); i*gx <= v.u1; i++ {
		p := v.t.pt(i*gx, v.v0)
		v.shapes = append(v.shapes, line(StyleGrid, Pt{p.X, v.frame.Y + viewPad}, Pt{p.X, v.frame.Bottom() - viewPad}))
		s := trimNum(i * gx / u)
		wd := v.b.m.width(s, sizeSmall, false)
		v.fixedLabel(s, Pt{p.X - wd/2 - 0.3, v.frame.Bottom() - viewPad + 1.2}, "grid x")
	}
	for j := math.Ceil(v.v0 / gy); j*gy <= v.v1; j++ {
		p := v.t.pt(v.u0, j*gy)
		v.shapes = append(v.shapes, line(StyleGrid, Pt{v.frame.X + viewPad, p.Y}, Pt{v.frame.Right() - viewPad, p.Y}))
		s := trimNum(j * gy / u)
		wd := v.b.m.width(s, sizeSmall, false)
		v.fixedLabel(s, Pt{v.frame.X + viewPad - wd - 1.8, p.Y - capHeight(sizeSmall)/2 - 0.4}, "grid "+vname)
	}
	sym := unitSym(b.req.Units)
	v.fixedLabel("x, "+sym, Pt{v.frame.Right() - viewPad - 8, v.frame.Bottom() - viewPad + 4.6}, "grid axis")
	v.fixedLabel(vname+", "+sym, Pt{v.frame.X + 0.8, v.frame.Y + 1}, "grid axis")
}

// clipRect returns the page polygon of the world rectangle [x0, x1] ×
// [y0, y1], limited to the view.
func (v *sideView) clipRect(x0, x1, y0, y1 float64) []Pt {
	x0, x1 = math.Max(x0, v.u0), math.Min(x1, v.u1)
	y0, y1 = math.Max(y0, v.v0), math.Min(y1, v.v1)
	a, c := v.t.pt(x0, y1), v.t.pt(x1, y0)
	return []Pt{{a.X, a.Y}, {c.X, a.Y}, {c.X, c.Y}, {a.X, c.Y}}
}

// zone adds a zone polygon (world points) of style s, cut to the clip.
func (v *sideView) zone(s Style, ring [][2]float64, clip []Pt) {
	pts := make([]Pt, len(ring))
	for i, p := range ring {
		pts[i] = v.t.pt(p[0], p[1])
	}
	sh := poly(s, pts)
	sh.Clip = clip
	v.shapes = append(v.shapes, sh)
}

// zones draws the drawn zones and the core: in the elevation their
// vertical section about the axis height z0, in the clearance view their
// meridian outline (z0 = 0, upper half only); cut to clip.
func (v *sideView) zones(z0 float64, upper bool, clip []Pt) {
	z := v.b.zs
	ring := func(o zoneOutline) [][2]float64 {
		if upper {
			return [][2]float64(o)
		}
		return sideRing(o, z0)
	}
	for _, o := range []zoneOutline{z.velM, z.hotM} {
		if o != nil {
			v.zone(StyleMargin, ring(o), clip)
		}
	}
	if z.vel != nil {
		v.zone(StyleVelocity, ring(z.vel), clip)
	}
	if z.hot != nil {
		v.zone(StyleHot, ring(z.hot), clip)
	}
	v.carried(z0, upper, clip)
	if z.core > 0 {
		v.zone(StyleCore, ring(zoneOutline{{0, 0}, {0, z.exitR}, {z.core, 0}}), clip)
	}
}

// nozzle draws the nozzle body about height z0 (the upper half only in the
// clearance view) and the axis.
func (v *sideView) nozzle(z0 float64, upper bool) {
	d := math.Max(v.b.gov.Exit.Diameter, 1.2/v.t.ky)
	l := nozzleLen(d)
	t := v.t
	lo := z0 - 0.8*d
	lo2 := z0 - d/2
	if upper {
		lo, lo2 = 0, 0
	}
	body := []Pt{t.pt(0, z0+d/2), t.pt(-l, z0+0.8*d), t.pt(-l, lo), t.pt(0, lo2)}
	v.shapes = append(v.shapes, poly(StyleNozzle, body), line(StyleAxis, t.pt(v.u0, z0), t.pt(v.u1, z0)))
	v.pl.block(boundOf(body))
}

// fixedLabel records a label at a fixed place (grid figures, captions) if
// it is free.
func (v *sideView) fixedLabel(s string, at Pt, of string) {
	s = clean(s)
	w, h := v.b.labelBox(s, sizeSmall)
	r := Rect{at.X, at.Y, w, h}
	if !v.pl.free(r) {
		return
	}
	v.pl.take(r)
	v.labels = append(v.labels, Label{Text: s, Kind: FeatureLabel, For: of, X: r.X, Y: r.Y, W: r.W, H: r.H, Size: sizeSmall, Anchor: at, View: v.name})
}

// placeText places a label in the view, if there is room; of "" makes it a
// station ID.
func (v *sideView) placeText(s string, anchor, dir Pt, clear float64, far []float64, of string) bool {
	s = clean(s)
	kind := FeatureLabel
	size := sizeSmall
	if of == "" {
		kind, of, size = StationLabel, s, sizeID
	}
	w, h := v.b.labelBox(s, size)
	sp, ok := v.pl.find(want{w: w, h: h, anchor: anchor, clear: clear, dir: dir}, far)
	if !ok {
		return false
	}
	v.pl.commit(sp)
	v.labels = append(v.labels, Label{Text: s, Kind: kind, For: of, X: sp.box.X, Y: sp.box.Y, W: sp.box.W, H: sp.box.H,
		Size: size, Anchor: anchor, Leader: sp.leader, Line: leaderLine(sp), View: v.name})
	return true
}

// elevationHeight returns the top of the elevation, m, and whether the
// ceiling is drawn: the ceiling when it is not far above everything else,
// else 0.5 m above the highest of the zones (within the walls), the
// obstacles on the axis, the collector and the axis.
func (b *builder) elevationHeight(u0, u1 float64) (float64, bool) {
	c := &b.req.Cell
	z0 := b.req.Exit.Exit.Z
	lo, hi := b.zoneStops()
	top := z0 + 0.3
	for _, o := range []zoneOutline{b.zs.velM, b.zs.hotM} {
		for _, q := range o {
			if q[0] >= math.Max(lo, u0) && q[0] <= math.Min(hi, u1) {
				top = math.Max(top, z0+q[1])
			}
		}
	}
	for _, ob := range b.axisObstacles(u0, u1) {
		top = math.Max(top, ob.z1)
	}
	if col := c.Collector; col != nil {
		top = math.Max(top, col.Inlet.Z+col.Diameter/2)
	}
	if finite(c.Ceiling) && c.Ceiling <= 2*top+2 {
		return c.Ceiling + math.Min(c.TreatmentDepth, 1) + 0.2, true
	}
	if finite(c.Ceiling) {
		top = math.Min(top, c.Ceiling)
	}
	return top + 0.5, false
}

// axisObstacle is an obstacle cut by the vertical section through the axis.
type axisObstacle struct {
	name           string
	u0, u1, z0, z1 float64
}

// axisObstacles returns the obstacles the section through the axis cuts,
// with their axial extent along the axis (sampled at 1/400 of the range).
func (b *builder) axisObstacles(u0, u1 float64) []axisObstacle {
	fr := b.req.Exit
	var out []axisObstacle
	n := 400
	for _, o := range b.req.Cell.Obstacles {
		a, z := math.Inf(1), math.Inf(-1)
		for i := 0; i <= n; i++ {
			x := u0 + (u1-u0)*float64(i)/float64(n)
			p := fr.ToCell(geometry.JetPoint{X: x})
			if o.Footprint.Contains(orb.Point{p.X, p.Y}) {
				a, z = math.Min(a, x), math.Max(z, x)
			}
		}
		if a <= z {
			pad := (u1 - u0) / float64(n) / 2
			out = append(out, axisObstacle{o.Name, a - pad, z + pad, math.Max(o.ZMin, 0), o.ZMax})
		}
	}
	return out
}

// elevation lays out the vertical section at (x, y) in an area w × maxH mm
// at horizontal scale sx (0: choose) and returns it, or false when it fits
// at no standard scale.
func (b *builder) elevation(x, y, w, maxH float64, sx int) (*sideView, bool) {
	c := &b.req.Cell
	fr := b.req.Exit
	z0 := fr.Exit.Z
	u0, u1 := b.axialRange()
	top, ceiling := b.elevationHeight(u0, u1)
	sx, sy, ok := b.sideScales(sx, u1-u0, top+floorBand, w-2*viewPad, maxH-2*viewPad)
	if !ok {
		return nil, false
	}
	v := b.newSide("elevation", x, y, sx, sy, u0, u1, -floorBand, top)
	v.grid("height")
	t := v.t
	// floor band and floor
	v.shapes = append(v.shapes, poly(StyleFloor, v.clipRect(u0, u1, -floorBand, 0)), line(StyleBoundary, t.pt(u0, 0), t.pt(u1, 0)))
	roof := top
	if ceiling {
		roof = c.Ceiling
		v.shapes = append(v.shapes, line(StyleBoundary, t.pt(u0, c.Ceiling), t.pt(u1, c.Ceiling)))
		if c.TreatmentDepth > 0 {
			v.shapes = append(v.shapes, poly(StyleTreatment, v.clipRect(u0, u1, c.Ceiling, c.Ceiling+c.TreatmentDepth)))
		}
	}
	lo, hi := b.axisWalls()
	for _, u := range []float64{lo, hi} {
		if finite(u) && u > u0 && u < u1 {
			v.shapes = append(v.shapes, line(b.boundaryStyle(), t.pt(u, 0), t.pt(u, roof)))
			if !b.walled() {
				v.placeText("site limit", t.pt(u, roof*0.92), Pt{-1, 0}, 0.5, featFar, "site limit")
			}
		}
	}
	lo, hi = b.zoneStops()
	for _, ob := range b.axisObstacles(u0, u1) {
		z1 := math.Min(ob.z1, top)
		if z1 > ob.z0 {
			v.shapes = append(v.shapes, poly(StyleObstacle, v.clipRect(ob.u0, ob.u1, ob.z0, z1)))
			v.pl.block(boundOf(v.clipRect(ob.u0, ob.u1, ob.z0, z1)))
		}
	}
	if col := c.Collector; col != nil {
		u := b.axial(col.Inlet)
		r := col.Diameter / 2
		duct := math.Max(col.Diameter, 1)
		v.shapes = append(v.shapes,
			line(StyleCollector, t.pt(u, col.Inlet.Z-r), t.pt(u, col.Inlet.Z+r)),
			line(StyleBase, t.pt(u, col.Inlet.Z-r), t.pt(math.Min(u+duct, u1), col.Inlet.Z-r)),
			line(StyleBase, t.pt(u, col.Inlet.Z+r), t.pt(math.Min(u+duct, u1), col.Inlet.Z+r)))
	}
	// the zones stop at the floor, the ceiling and the walls
	v.zones(z0, false, v.clipRect(math.Max(lo, u0), math.Min(hi, u1), 0, roof))
	v.nozzle(z0, false)
	pr := b.pr
	if ceiling {
		v.placeText(fmt.Sprintf("ceiling %s above the %s", pr.length(c.Ceiling), b.ground()), t.pt(0, c.Ceiling), Pt{0, 1}, 0.5, featFar, "ceiling")
	} else {
		what := "open sky"
		if finite(c.Ceiling) {
			what = "ceiling " + pr.length(c.Ceiling) + " above the " + b.ground() + ", above this view"
		}
		v.fixedLabel(what, Pt{v.frame.X + viewPad + 2, v.frame.Y + viewPad + 0.5}, "ceiling")
	}
	v.placeText("nozzle axis "+pr.length(z0)+" above the "+b.ground(), t.pt(0, z0), unit(Pt{-1, -1}, Pt{0, -1}), 1.5, featFar, "nozzle")
	v.placeText(b.ground(), t.pt(u0+(u1-u0)*0.03, 0), Pt{0.3, -1}, 0.3, nil, "floor")
	for _, ob := range b.axisObstacles(u0, u1) {
		v.placeText(ob.name, t.pt((ob.u0+ob.u1)/2, math.Min(ob.z1, top)), Pt{0, -1}, 0.5, featFar, ob.name)
	}
	return v, true
}

// carriedNote labels the first station ringed in the clearance view.
const carriedNote = "ringed: blocked by a bent or carried zone, not drawn here: see the plan"

// carriedBlock reports whether a zone bent by buoyancy or carried on by a
// surface sets a failing velocity or hot-zone check of station s (the
// planner's reason names the zone so).
func carriedBlock(s *planner.Station) bool {
	for _, c := range s.Checks {
		if (c.Name == planner.CheckVelocity || c.Name == planner.CheckHot) && c.Verdict != planner.OK &&
			(strings.Contains(c.Reason, "bent by buoyancy") || strings.Contains(c.Reason, "carried along the") || strings.Contains(c.Reason, "spread over the wall")) {
			return true
		}
	}
	return false
}

// clearance lays out the clearance view at (x, y) in an area w × maxH mm
// at the horizontal scale sx of the elevation (0: choose).
func (b *builder) clearance(x, y, w, maxH float64, sx int) (*sideView, bool) {
	c := &b.req.Cell
	z0 := b.req.Exit.Exit.Z
	u0, u1 := b.axialRange()
	lo, hi := b.zoneStops()
	rmax := b.gov.Exit.Diameter
	for i := range b.plan.Stations {
		rmax = math.Max(rmax, b.plan.Stations[i].Jet.R)
	}
	for _, o := range []zoneOutline{b.zs.velM, b.zs.hotM} {
		for _, q := range o {
			if q[0] >= math.Max(lo, u0) && q[0] <= math.Min(hi, u1) {
				rmax = math.Max(rmax, q[1])
			}
		}
	}
	rmax = math.Max(rmax, z0) // the floor below the axis is always in view
	top := rmax * 1.08
	sx, sy, ok := b.sideScales(sx, u1-u0, top, w-2*viewPad, maxH-2*viewPad)
	if !ok {
		return nil, false
	}
	v := b.newSide("clearance", x, y, sx, sy, u0, u1, 0, top)
	v.grid("r")
	t := v.t
	pr := b.pr
	wlo, whi := b.axisWalls()
	for _, u := range []float64{wlo, whi} {
		if finite(u) && u > u0 && u < u1 {
			v.shapes = append(v.shapes, line(b.boundaryStyle(), t.pt(u, 0), t.pt(u, top)))
			if b.walled() {
				v.placeText("wall on the axis", t.pt(u, top*0.92), Pt{-1, 0}, 0.5, featFar, "wall")
			} else {
				v.placeText("site limit", t.pt(u, top*0.92), Pt{-1, 0}, 0.5, featFar, "site limit")
			}
		}
	}
	v.zones(0, true, v.clipRect(math.Max(lo, u0), math.Min(hi, u1), 0, top))
	// the floor and the ceiling straight below and above the axis: a zone
	// reaching past them touches them there (see the plan's warnings)
	ref := func(r float64, what string) {
		if r > 0 && r <= top {
			v.shapes = append(v.shapes, line(StyleDim, t.pt(u0, r), t.pt(u1, r)))
			v.placeText(what+" "+pr.length(r)+" from the axis", t.pt(u0+(u1-u0)*0.06, r), Pt{0.2, -1}, 0.4, featFar, what)
		}
	}
	ref(z0, b.ground()+" straight below the axis,")
	if finite(c.Ceiling) {
		ref(c.Ceiling-z0, "ceiling straight above the axis,")
	}
	v.nozzle(0, true)
	st := b.plan.Stations
	pts := make([]Pt, len(st))
	for i := range st {
		pts[i] = t.pt(st[i].Jet.X, st[i].Jet.R)
	}
	rr := math.Min(markRadius(pts), 0.9)
	first := -1
	for i := range st {
		v.shapes = append(v.shapes, markShapes(st[i].Status, pts[i], rr)...)
		v.pl.block(rectAround(pts[i], rr*1.15))
		// a zone bent by buoyancy or carried along a surface is not a
		// body of revolution: it is not drawn here, and a station it
		// blocks is ringed
		if carriedBlock(&st[i]) {
			v.shapes = append(v.shapes, circle(StyleStrike, pts[i], rr*1.9))
			v.pl.block(rectAround(pts[i], rr*2))
			if first < 0 {
				first = i
			}
		}
	}
	if first >= 0 {
		v.placeText(carriedNote, pts[first], Pt{0.4, -1}, rr*2+0.3, featFar, "carried")
	}
	if len(st) <= maxElevationIDs {
		for i := range st {
			v.placeText(st[i].ID, pts[i], Pt{0, -1}, rr+0.2, []float64{2, 4}, "")
		}
	}
	return v, true
}
