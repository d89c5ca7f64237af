package layout

import (
	"errors"
	"strings"

	"arcwright/internal/jet"
	"arcwright/internal/planner"
)

var (
	opKeys     = []string{"name", "npr", "total_temperature", "temperature_ratio", "gamma", "gas_constant", "secondary"}
	streamKeys = []string{"npr", "total_temperature", "temperature_ratio", "gamma", "gas_constant"}
)

// maxStreamChecks bounds the rounds of stream validation: each round finds
// one more bad input of a stream, and a stream has five inputs.
const maxStreamChecks = 6

// operatingPoints decodes the test matrix. Each point becomes a
// jet.Condition with the layout's ambient.
func (d *decoder) operatingPoints(top *section, ni *nozzleInfo, amb planner.Ambient, ambOK bool) []jet.Condition {
	n := top.need("operating_points", "a list of operating points (name, npr, total_temperature …)")
	if n == nil {
		return nil
	}
	field := top.field("operating_points")
	items, ok := d.list(n, field, top.keyLine("operating_points"), "a list of operating points")
	if !ok {
		return nil
	}
	if len(items) == 0 {
		d.errorf(ErrMissing, top.keyLine("operating_points"), field, "empty; want at least one operating point")
		return nil
	}
	names := d.nameSet()
	var out []jet.Condition
	for i, it := range items {
		s := d.section(it, index(field, i), it.Line, opKeys)
		c := jet.Condition{Ambient: amb.JetAmbient()}
		name, okName := d.name(s, "operating point", names)
		c.Name = name
		var okP bool
		c.Primary, okP = d.stream(s)
		okS := true
		if s.has("secondary") {
			sec := s.sub("secondary", streamKeys)
			var st jet.Stream
			st, okS = d.stream(sec)
			c.Secondary = &st
			if ni.kindOK && ni.nozzle.Kind != jet.Coaxial {
				d.errorf(ErrInvalid, s.keyLine("secondary"), s.field("secondary"), "a secondary stream applies only to a coaxial nozzle, not %s", ni.nozzle.Kind)
				okS = false
			}
		} else if ni.kindOK && ni.nozzle.Kind == jet.Coaxial && s.isMap {
			s.need("secondary", "the secondary stream of the coaxial nozzle, {npr: …, temperature_ratio: …}")
			okS = false
		}
		if okName && okP && okS && ni.nozzleOK && ambOK {
			if err := c.Validate(ni.nozzle); err != nil { // every input was checked above; this is a last guard
				d.add(ErrInvalid, err, s.line, s.path, strings.TrimPrefix(err.Error(), "jet: "))
				continue
			}
		}
		out = append(out, c)
	}
	return out
}

// stream decodes one stream (npr, total_temperature or temperature_ratio,
// gamma, gas_constant) and checks it with the jet package's rules.
func (d *decoder) stream(s *section) (jet.Stream, bool) {
	st := jet.Stream{Gas: jet.Air()}
	ok := true
	if n := s.need("npr", "the nozzle pressure ratio, total over ambient pressure, a number such as 1.8"); n != nil {
		var good bool
		st.NPR, good = d.number(n, s.field("npr"), "the nozzle pressure ratio, a number")
		if good && st.NPR > 1 { // at most 1 is the jet package's message: no flow
			good = d.checkRange(n.Line, s.field("npr"), NPRRange, st.NPR, "")
		}
		ok = ok && good
	} else {
		ok = false
	}
	tt, tr := s.get("total_temperature"), s.get("temperature_ratio")
	switch {
	case tt != nil && tr != nil:
		d.errorf(ErrInvalid, s.keyLine("temperature_ratio"), s.field("temperature_ratio"), "give total_temperature or temperature_ratio, not both")
		ok = false
	case tt != nil:
		var good bool
		st.TotalTemperature, good = d.temperature(tt, s.field("total_temperature"))
		if good && st.TotalTemperature > 0 {
			good = d.checkRange(tt.Line, s.field("total_temperature"), TotalTemperatureRange, st.TotalTemperature,
				short(st.TotalTemperature)+" K ("+tempC(st.TotalTemperature)+")")
		}
		ok = ok && good
	case tr != nil:
		var good bool
		st.TemperatureRatio, good = d.number(tr, s.field("temperature_ratio"), "the total temperature over the ambient temperature, a number")
		if good && st.TemperatureRatio > 0 {
			good = d.checkRange(tr.Line, s.field("temperature_ratio"), TemperatureRatioRange, st.TemperatureRatio, "")
		}
		ok = ok && good
	default:
		if s.isMap {
			d.errorf(ErrMissing, s.line, s.field("total_temperature"), "missing; want total_temperature (such as 800 K) or temperature_ratio (total over ambient, such as 2.78)")
		}
		ok = false
	}
	if n := s.get("gamma"); n != nil {
		var good bool
		st.Gas.Gamma, good = d.number(n, s.field("gamma"), "the ratio of specific heats, a number")
		ok = ok && good
	}
	if n := s.get("gas_constant"); n != nil {
		var good bool
		st.Gas.R, good = d.number(n, s.field("gas_constant"), "the specific gas constant in J/(kg K), a bare number")
		if good && st.Gas.R > 0 {
			good = d.checkRange(n.Line, s.field("gas_constant"), GasConstantRange, st.Gas.R, "")
		}
		ok = ok && good
	}
	if !ok {
		return st, false
	}
	return st, d.checkStream(s, st)
}

// checkStream validates st with jet.Condition.Validate, on a stand-in
// convergent nozzle and standard ambient so that only the stream's own
// rules apply. Each bad input is reported at its key and replaced by a
// valid value, and the check repeats, so that every bad input is found.
func (d *decoder) checkStream(s *section, st jet.Stream) bool {
	fields := map[string]string{
		"nozzle pressure ratio":   "npr",
		"total temperature":       "total_temperature",
		"total-temperature ratio": "temperature_ratio",
		"ratio of specific heats": "gamma",
		"gas constant":            "gas_constant",
	}
	if st.TotalTemperature == 0 {
		fields["total temperature"] = "temperature_ratio"
	}
	standIn := jet.Nozzle{Kind: jet.Convergent, Diameter: 1}
	good := true
	for range maxStreamChecks {
		err := jet.Condition{Primary: st, Ambient: jet.StandardAmbient()}.Validate(standIn)
		if err == nil {
			return good
		}
		good = false
		d.jetError(err, s, fields)
		var ie *jet.InputError
		if !errors.As(err, &ie) {
			return false
		}
		switch fields[ie.Field] {
		case "npr":
			st.NPR = 2
		case "total_temperature", "temperature_ratio":
			st.TotalTemperature, st.TemperatureRatio = 0, 1
		case "gamma":
			st.Gas.Gamma = jet.GammaAir
		case "gas_constant":
			st.Gas.R = jet.RAir
		default:
			return false
		}
	}
	return false
}
