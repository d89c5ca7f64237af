package sheet

import (
	"fmt"
	"math"

	"github.com/paulmach/orb"

	"arcwright/internal/geometry"
	"arcwright/internal/units"
)

// planFit is the plan view's scale and the cell-frame rectangle it shows.
type planFit struct {
	scale   int
	ext     orb.Bound
	cropped bool // ext is the region of interest, not the whole cell
}

// extendWorks returns bd grown to hold the nozzle exit and body, the array
// centres and every station's microphone and stand base, m.
func (b *builder) extendWorks(bd orb.Bound) orb.Bound {
	ex := b.req.Exit
	bd = bd.Extend(orb.Point{ex.Exit.X, ex.Exit.Y})
	up := ex.ToCell(geometry.JetPoint{X: -nozzleLen(b.gov.Exit.Diameter)})
	bd = bd.Extend(orb.Point{up.X, up.Y})
	for _, a := range b.plan.Arrays {
		bd = bd.Extend(orb.Point{a.Centre.X, a.Centre.Y})
	}
	for i := range b.plan.Stations {
		s := &b.plan.Stations[i]
		bd = bd.Extend(orb.Point{s.Mic.X, s.Mic.Y}).Extend(s.Base)
	}
	return bd
}

// roiExtent returns the region of interest of the plan, m: every station and
// stand base, the nozzle, the array centres and, when withZones, the zones
// of the drawn points as far as the cell's boundary lets them run; padded by
// 5 % (at least 1 m). The datum, the marks and the obstacles are not part of
// it: they are drawn where they fall inside the frame.
func (b *builder) roiExtent(withZones bool) orb.Bound {
	ex := b.req.Exit
	bd := b.extendWorks(orb.Bound{Min: orb.Point{ex.Exit.X, ex.Exit.Y}, Max: orb.Point{ex.Exit.X, ex.Exit.Y}})
	if withZones {
		var zb orb.Bound
		has := false
		for _, o := range []zoneOutline{b.zs.velM, b.zs.hotM, b.zs.vel, b.zs.hot} {
			for _, p := range planRing(ex, o) {
				if !has {
					zb, has = orb.Bound{Min: p, Max: p}, true
				}
				zb = zb.Extend(p)
			}
		}
		if has {
			if c := &b.req.Cell; c.Bounded() {
				cb := c.Boundary.Bound()
				zb = orb.Bound{
					Min: orb.Point{math.Max(zb.Min[0], cb.Min[0]), math.Max(zb.Min[1], cb.Min[1])},
					Max: orb.Point{math.Min(zb.Max[0], cb.Max[0]), math.Min(zb.Max[1], cb.Max[1])},
				}
			}
			if zb.Min[0] <= zb.Max[0] && zb.Min[1] <= zb.Max[1] {
				bd = bd.Union(zb)
			}
		}
	}
	w, h := bd.Max[0]-bd.Min[0], bd.Max[1]-bd.Min[1]
	bd = bd.Pad(math.Max(1, 0.05*math.Max(w, h)))
	return bd
}

// fitPlan chooses the plan's scale and extent for a drawing area of
// aw × ah mm. The whole cell is drawn at the largest scale of the sheet's
// unit system that fits it; an outdoor or open site whose stations and
// zones would fill less than half the frame at that scale, or a cell that
// fits at no scale, is drawn cropped to its region of interest (stations,
// zones, nozzle) instead. A scale asked for is kept, cropping when the whole
// cell does not fit at it. When nothing fits, the error names the scale and
// the paper that would.
func (b *builder) fitPlan(asked int, field string, aw, ah float64) (planFit, error) {
	full := b.planExtent()
	roi := b.roiExtent(true)
	bare := b.roiExtent(false)
	size := func(e orb.Bound) (float64, float64) { return e.Max[0] - e.Min[0], e.Max[1] - e.Min[1] }
	fw, fh := size(full)
	list := scalesFor(b.req.Units)
	if asked > 0 {
		for _, e := range []orb.Bound{full, roi, bare} {
			w, h := size(e)
			if fits(w, h, aw, ah, asked) {
				return planFit{scale: asked, ext: e, cropped: e != full}, nil
			}
		}
		return planFit{}, b.noFit(fmt.Sprintf("%s, %s,", field, ScaleName(asked, b.req.Units)), asked, full, bare, aw, ah)
	}
	sFull, okFull := chooseScale(list, fw, fh, aw, ah)
	crop := b.req.Cell.Kind == geometry.OutdoorPad || !b.req.Cell.Bounded()
	for _, e := range []orb.Bound{roi, bare} {
		w, h := size(e)
		s, ok := chooseScale(list, w, h, aw, ah)
		if !ok {
			continue
		}
		if !okFull {
			return planFit{scale: s, ext: e, cropped: true}, nil
		}
		// crop an open site whose region of interest would fill less than
		// half the frame in both directions at the whole site's scale
		k := 1000 / float64(sFull)
		if crop && s < sFull && w*k < 0.5*aw && h*k < 0.5*ah {
			return planFit{scale: s, ext: e, cropped: true}, nil
		}
		break
	}
	if okFull {
		return planFit{scale: sFull, ext: full}, nil
	}
	return planFit{}, b.noFit("the plan", 0, full, bare, aw, ah)
}

// noFit returns the error for a plan that fits the paper at no scale (or
// not at the one asked, asked > 0): it names the scale that fits this paper
// and, as a second way out, a larger paper that holds the plan at the
// scale asked (or the smallest scale), cropped to its stations and nozzle
// with room round them for labels (roi). It reports the stations' and
// nozzle's own extents, without that room, beside the whole plan's.
func (b *builder) noFit(what string, asked int, full, roi orb.Bound, aw, ah float64) error {
	w, h := roi.Max[0]-roi.Min[0], roi.Max[1]-roi.Min[1]
	paper := b.model.Paper
	sys := b.req.Units
	list := scalesFor(sys)
	var here, larger string
	if s, ok := chooseScale(list, w, h, aw, ah); ok {
		here = fmt.Sprintf("%s fits on %s", ScaleName(s, sys), paper.Name)
	}
	den := asked
	if den == 0 {
		den = list[len(list)-1]
	}
	for _, p := range papers {
		if p.Width*p.Height <= paper.Width*paper.Height {
			continue
		}
		if pw, ph := b.planArea(p); fits(w, h, pw, ph, den) {
			larger = fmt.Sprintf("use %s, which holds it at %s", p.Name, ScaleName(den, sys))
			break
		}
	}
	way := "split the arrays over several layouts"
	switch {
	case here != "" && larger != "":
		way = here + "; or " + larger
	case here != "":
		way = here
	case larger != "":
		way = larger
	}
	verb := "does not fit"
	if asked > 0 {
		verb = "is too large a scale for"
	}
	// sizes in the layout's units: to a tenth of a metre, or in feet and
	// inches as everywhere on a feet-and-inches sheet
	size := func(w, h float64) string {
		if sys == units.Imperial {
			return units.FormatLength(w, sys) + " × " + units.FormatLength(h, sys)
		}
		return fmt.Sprintf("%.1f × %.1f m", w, h)
	}
	ex := b.req.Exit.Exit
	works := b.extendWorks(orb.Bound{Min: orb.Point{ex.X, ex.Y}, Max: orb.Point{ex.X, ex.Y}})
	return fmt.Errorf("%w: %s %s %s: the plan spans %s, its stations and nozzle alone %s; %s",
		ErrScale, what, verb, paper.Name, size(full.Max[0]-full.Min[0], full.Max[1]-full.Min[1]),
		size(works.Max[0]-works.Min[0], works.Max[1]-works.Min[1]), way)
}

// planArea returns the plan's drawing area on paper p, mm: the frame less
// the column, the strip and the view's padding.
func (b *builder) planArea(p Paper) (float64, float64) {
	fw := p.Width - marginLeft - marginOther
	fh := p.Height - 2*marginOther
	colW := columnWidth(fw)
	return fw - colW - gapMM - 2*viewPad, fh - stripH - 2*viewPad
}

// columnWidth returns the width of sheet 1's right-hand column for a frame
// fw mm wide.
func columnWidth(fw float64) float64 { return clamp(0.27*fw, 92, 112) }

// joinOr joins phrases with commas and "or".
func joinOr(s []string) string { return joinWith(s, "or") }
