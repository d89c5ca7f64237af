package layout

import (
	"fmt"
	"strings"

	"go.yaml.in/yaml/v3"

	"arcwright/internal/planner"
	"arcwright/internal/sheet"
	"arcwright/internal/units"
)

// FormatVersion is the version of the layout format this package reads,
// the value of the file's "arcwright" key.
const FormatVersion = 1

var (
	topKeys     = []string{"arcwright", "title", "units", "polar_angle", "ambient", "cell", "nozzle", "operating_points", "limits", "band", "stands", "arrays", "sheet", "noise", "crew", "anchor"}
	titleKeys   = []string{"title", "facility", "test", "revision", "prepared_by", "checked_by", "approved_by", "date"}
	unitsKeys   = []string{"length", "sheet"}
	sheetKeys   = []string{"scale", "paper"}
	lengthUnits = []string{"m", "mm", "cm", "in", "ft"}
	conventions = map[string]planner.Convention{"from_jet_axis": planner.FromJetAxis, "from_inlet": planner.FromInlet}
)

// Load reads and validates the layout file at path; see [Decode].
// A file that cannot be read, that is not a regular file (a device, a
// named pipe, a directory) or that is larger than [MaxInputSize] gives an
// Errors value of one problem, without a line, wrapping [ErrRead] and the
// error of the file system, if any.
func Load(path string) (*planner.Request, []Warning, error) {
	data, err := readInput(path)
	if err != nil {
		return nil, nil, err
	}
	return Decode(path, data)
}

// Decode reads and validates a layout already in memory; name is the file
// name used in messages and as Request.Source.
//
// It returns either a Request with the warnings found (sorted like errors),
// or, with a nil Request and nil warnings, an [Errors] value holding every
// problem found in one pass: decoding goes on past a problem, skipping only
// the checks that need the broken value. Every value in the Request is in
// SI units (m, K, Pa, Hz, rad), already checked against the rules of the
// geometry and jet packages.
func Decode(name string, data []byte) (*planner.Request, []Warning, error) {
	d := &decoder{file: name, lenUnit: "m", sys: units.Metric}
	var req *planner.Request
	if root := d.parse(data); root != nil {
		req = d.request(root)
	}
	if len(d.errs) > 0 {
		d.errs = summarise(d.errs)
		return nil, nil, d.errs
	}
	sortWarnings(d.warns)
	if req != nil {
		for _, w := range d.warns {
			req.Notes = append(req.Notes, w.String())
		}
	}
	return req, d.warns, nil
}

// request decodes the whole layout.
func (d *decoder) request(root *yaml.Node) *planner.Request {
	top := d.section(root, "", root.Line, topKeys)
	req := &planner.Request{Source: d.file}
	if n := top.need("arcwright", "the format version, arcwright: 1"); n != nil {
		if v, ok := d.integer(n, "arcwright", "the format version, a whole number", 0); ok && v != FormatVersion {
			d.errorf(ErrInvalid, n.Line, "arcwright", "this program reads format version %d, got %d", FormatVersion, v)
		}
	}
	req.Units = d.unitsSection(top)
	req.LengthUnit = d.lenUnit
	req.Title = d.titleSection(top)
	if n := top.need("polar_angle", "from_jet_axis or from_inlet (no default: an angle range means opposite things under the two conventions)"); n != nil {
		if c, ok := d.choice(n, "polar_angle", []string{"from_jet_axis", "from_inlet"}); ok {
			req.Convention = conventions[c]
		}
	}
	amb, ambOK := d.ambientSection(top)
	req.Ambient = amb
	ci := d.cellSection(top)
	ni := d.nozzleSection(top, ci)
	req.Nozzle, req.Exit = ni.nozzle, ni.frame
	req.Points = d.operatingPoints(top, ni, amb, ambOK)
	req.Limits = d.limitsSection(top, amb, ambOK)
	req.Band = d.bandSection(top)
	standNames := d.nameSet()
	req.Stands = d.standsSection(top, ci, standNames)
	req.Arrays = d.arraysSection(top, &arrayContext{ci: ci, stands: standNames, stations: d.nameSet()})
	req.Sheet = d.sheetSection(top)
	req.Noise = d.noiseSection(top, ci)
	req.Crew = d.crewSection(top, ci)
	req.Anchor = d.anchorSection(top)
	d.collectorCheck(ci, ni)
	if ci.cutoff > 0 && req.Band.Low > 0 && req.Band.Low < ci.cutoff {
		d.warnf(top.keyLine("band"), "band.low", "the band starts at %s, below the treatment cut-off %s: the cell is not anechoic there",
			units.FormatFrequency(req.Band.Low), units.FormatFrequency(ci.cutoff))
	}
	req.Cell, req.CutOff = ci.cell, ci.cutoff
	if len(d.errs) == 0 {
		// Every part was checked above; this is a last guard.
		if err := req.Cell.Validate(); err != nil {
			d.add(ErrInvalid, err, top.keyLine("cell"), "cell", strings.TrimPrefix(err.Error(), "geometry: "))
		}
	}
	return req
}

// unitsSection decodes the unit of bare lengths and the sheet's system.
func (d *decoder) unitsSection(top *section) units.System {
	s := top.sub("units", unitsKeys)
	if n := s.get("length"); n != nil {
		if u, ok := d.choice(n, s.field("length"), lengthUnits); ok {
			d.lenUnit = u
		} else {
			d.lenBad = true
		}
	}
	if n := s.get("sheet"); n != nil {
		if v, ok := d.scalar(n, s.field("sheet"), "metric or imperial"); ok {
			sys, err := units.ParseSystem(v)
			if err != nil {
				d.add(ErrInvalid, err, n.Line, s.field("sheet"), strings.TrimPrefix(err.Error(), "units: "))
			} else {
				d.sys = sys
			}
		}
	}
	return d.sys
}

// titleSection decodes the title block; only title.title is required.
func (d *decoder) titleSection(top *section) planner.Title {
	s := top.needSub("title", "the title block, with at least title: …", titleKeys)
	var t planner.Title
	for _, f := range []struct {
		key string
		dst *string
	}{
		{"facility", &t.Facility}, {"test", &t.Test}, {"revision", &t.Revision},
		{"prepared_by", &t.PreparedBy}, {"checked_by", &t.CheckedBy}, {"approved_by", &t.ApprovedBy}, {"date", &t.Date},
	} {
		if n := s.get(f.key); n != nil {
			if v, ok := d.text(n, s.field(f.key)); ok && d.checkLabel(v, n.Line, s.field(f.key), MaxTextLength) {
				if f.key != "date" || d.checkDate(v, n.Line, s.field(f.key)) {
					*f.dst = v
				}
			}
		}
	}
	if n := s.need("title", "the title of the sheet"); n != nil {
		if v, ok := d.text(n, s.field("title")); ok {
			if strings.TrimSpace(v) == "" {
				d.errorf(ErrInvalid, n.Line, s.field("title"), "want the title of the sheet, got an empty text")
			} else if d.checkLabel(v, n.Line, s.field("title"), MaxTextLength) {
				t.Title = v
			}
		}
	}
	return t
}

// sheetSection decodes the wishes for the printed sheet.
func (d *decoder) sheetSection(top *section) planner.SheetOptions {
	s := top.sub("sheet", sheetKeys)
	var o planner.SheetOptions
	// the sheet's own lists, so that the layout and --scale/--paper accept
	// the same scales and papers
	if n := s.get("scale"); n != nil {
		if v, ok := d.text(n, s.field("scale")); ok {
			if den, err := sheet.ParseScale(v); err == nil {
				o.Scale = den
				// one family of scales per sheet: a scale of the other
				// family than units.sheet contradicts it, and plan --pdf
				// would refuse it
				if err := sheet.CheckScale(den, d.sys); err != nil {
					d.add(ErrInvalid, err, n.Line, s.field("scale"), fmt.Sprintf("%s (units.sheet is %s)", strings.TrimPrefix(err.Error(), sheet.ErrScale.Error()+": "), d.sys))
				}
			} else {
				d.add(ErrInvalid, nil, n.Line, s.field("scale"), fmt.Sprintf("want a standard scale (%s), got %q", sheet.ScaleNames(), v))
			}
		}
	}
	if n := s.get("paper"); n != nil {
		if v, ok := d.text(n, s.field("paper")); ok {
			if p, err := sheet.ParsePaper(v); err == nil {
				o.Paper = p.Name
			} else {
				d.add(ErrInvalid, nil, n.Line, s.field("paper"), fmt.Sprintf("want one of %s, got %q", sheet.PaperNames(), v))
			}
		}
	}
	return o
}

// collectorCheck gives the collector the nozzle's heading when it has none
// of its own, and warns when its inlet is off the jet axis by more than its
// radius or not downstream of the exit.
func (d *decoder) collectorCheck(ci *cellInfo, ni *nozzleInfo) {
	col := ci.cell.Collector
	if col == nil || !ni.frameOK {
		return
	}
	if !ci.collectorHeading {
		col.Heading = ni.frame.Heading
	}
	q := ni.frame.ToJet(col.Inlet)
	if q.X <= 0 {
		d.warnf(ci.collectorLine, ci.collectorField+".inlet", "the collector inlet is not downstream of the nozzle exit (%s along the jet axis)", d.fmtLen(q.X))
	}
	if r := col.Diameter / 2; q.R > r {
		d.warnf(ci.collectorLine, ci.collectorField+".inlet", "the collector inlet centre is %s off the jet axis, more than its radius %s", d.fmtLen(q.R), d.fmtLen(r))
	}
}

// sortWarnings orders ws by line, then by field, like sortErrors.
func sortWarnings(ws []Warning) {
	es := make(Errors, len(ws))
	for i, w := range ws {
		es[i] = &Error{File: w.File, Line: w.Line, Field: w.Field, Msg: w.Msg}
	}
	sortErrors(es)
	for i, e := range es {
		ws[i] = Warning{File: e.File, Line: e.Line, Field: e.Field, Msg: e.Msg}
	}
}
