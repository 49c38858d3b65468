package gui

import (
	"math"
	"strings"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/widget"

	"ullage/hazards"
)

// customRoom is the preset choice for a room described by the reviewer.
const customRoom = "Your own room"

// limitBodies are the bodies whose exposure limits a review may apply.
var limitBodies = []string{"NIOSH", "OSHA", "EPA", "AIHA", "ACGIH"}

// roomSection is the release scenario: the room a broken device empties
// into, and whose exposure limits apply.
type roomSection struct {
	f       *designForm
	presets []hazards.RoomPreset
	pick    *widget.Select
	source  *widget.Label
	fields  []*numField
	bodies  *widget.CheckGroup
}

// newRoomSection builds the "Release into a room" group.
func newRoomSection(f *designForm) fyne.CanvasObject {
	r := &roomSection{f: f}
	f.room = r
	r.presets, _ = hazards.RoomPresets()
	opts := []string{customRoom}
	for _, p := range r.presets {
		opts = append(opts, p.Name)
	}
	r.source = hint("")
	r.pick = widget.NewSelect(opts, func(opt string) {
		doc := f.s.doc
		if p, ok := r.byName(opt); ok {
			doc.choose(hazards.FieldRoom, func(d *hazards.Design) { d.Room = p.Room(d.Room.ExposureMinutes) })
		} else {
			doc.choose(hazards.FieldRoomPreset, func(d *hazards.Design) { d.Room.PresetID = "" })
		}
	})
	rf := func(path string) *numField {
		nf := f.field(path)
		r.fields = append(r.fields, nf)
		return nf
	}
	vol := rf(hazards.FieldRoomVolume)
	ach := rf(hazards.FieldAirChanges)
	mix := rf(hazards.FieldMixingFactor)
	nfr := rf(hazards.FieldNearFieldRadius)
	nfs := rf(hazards.FieldNearFieldAirSpeed)
	exp := rf(hazards.FieldExposureMinutes)
	r.bodies = widget.NewCheckGroup(limitBodies, func(sel []string) {
		// keep the bodies in their usual order
		var out []string
		for _, b := range limitBodies {
			for _, s := range sel {
				if s == b {
					out = append(out, b)
				}
			}
		}
		f.s.doc.choose(hazards.FieldLimitBodies, func(d *hazards.Design) { d.Criteria.LimitBodies = out })
	})
	r.bodies.Horizontal = true
	return section("Release into a room",
		labelled("Room", r.pick), indented(r.source),
		vol.object, ach.object,
		mix.object, indented(hint("1 = perfectly mixed; larger values slow the removal of vapour by ventilation.")),
		nfr.object, nfs.object, exp.object,
		labelled("Limits from", r.bodies),
		indented(hint("US occupational limits. None ticked: the limits of every body apply; each is averaged over its own period and the largest share of its limit governs.")),
	)
}

func (r *roomSection) byName(name string) (hazards.RoomPreset, bool) {
	for _, p := range r.presets {
		if p.Name == name {
			return p, true
		}
	}
	return hazards.RoomPreset{}, false
}

func (r *roomSection) byID(id string) (hazards.RoomPreset, bool) {
	for _, p := range r.presets {
		if p.ID == id {
			return p, true
		}
	}
	return hazards.RoomPreset{}, false
}

// load selects the room's preset and the limit bodies.
func (r *roomSection) load() {
	d := &r.f.s.doc.Work
	choice := customRoom
	if p, ok := r.byID(d.Room.PresetID); ok {
		choice = p.Name
	}
	showSelected(r.pick, choice)
	showChecked(r.bodies, append([]string(nil), d.Criteria.LimitBodies...))
	r.describe()
}

// roomFollowsPreset makes the room the reviewer's own once a value typed
// no longer matches its preset (the exposure time is not part of a
// preset).
func roomFollowsPreset(d *hazards.Design) {
	p, err := hazards.LookupRoomPreset(d.Room.PresetID)
	if d.Room.PresetID == "" || err != nil {
		return
	}
	want := p.Room(d.Room.ExposureMinutes)
	same := func(a, b float64) bool { return math.Abs(a-b) <= 1e-9*math.Max(1, math.Abs(b)) }
	if same(want.VolumeM3, d.Room.VolumeM3) && same(want.AirChangesPerHour, d.Room.AirChangesPerHour) &&
		same(want.MixingFactor, d.Room.MixingFactor) && same(want.NearFieldRadiusM, d.Room.NearFieldRadiusM) &&
		same(want.NearFieldAirSpeed, d.Room.NearFieldAirSpeed) {
		return
	}
	d.Room.PresetID = ""
}

// syncPick selects the room's preset as the document names it, or "your
// own room".
func (r *roomSection) syncPick() {
	choice := customRoom
	if p, ok := r.byID(r.f.s.doc.Work.Room.PresetID); ok {
		choice = p.Name
	}
	if r.pick.Selected != choice {
		showSelected(r.pick, choice)
		r.describe()
	}
}

// describe shows the preset's note and the source of each value.
func (r *roomSection) describe() {
	p, ok := r.byName(r.pick.Selected)
	if !ok {
		setText(r.source, "Your own room: state its grounds in the change note.")
		return
	}
	var b strings.Builder
	b.WriteString(p.Note)
	b.WriteString(" Volume: " + p.Volume.Source + ". Air changes: " + p.AirChangesPerHour.Source + ". Mixing: " + p.MixingFactor.Source + ".")
	setText(r.source, b.String())
}
