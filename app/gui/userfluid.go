package gui

import (
	"bytes"
	"fmt"
	"io"
	"os"
	"slices"
	"strings"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/dialog"
	"fyne.io/fyne/v2/widget"

	"ullage/fluids"
)

// askUserFluid asks for a fluid file, checks it and adds its fluids.
func (s *session) askUserFluid() {
	d := dialog.NewFileOpen(func(r fyne.URIReadCloser, err error) {
		if err != nil {
			dialog.ShowError(err, s.win)
			return
		}
		if r == nil {
			return
		}
		defer r.Close()
		path := r.URI().Path()
		subs, err := readUserFluids(r)
		if err != nil {
			s.showFluidProblem(path, err)
			return
		}
		s.confirmUserFluids(path, subs)
	}, s.win)
	d.SetFilter(designFilter)
	s.startIn(d)
	d.Resize(fyne.NewSize(900, 600))
	d.Show()
}

// readUserFluids loads and checks fluids with the library's strict
// loader, then makes sure each gives a state at its boiling point.
func readUserFluids(r io.Reader) ([]*fluids.Substance, error) {
	subs, err := fluids.LoadUserFluids(r)
	if err != nil {
		return nil, err
	}
	// A user fluid never takes the id or name of a built-in one.
	if lib, err := fluids.Builtin(); err == nil {
		if _, err := lib.Extend(subs...); err != nil {
			return nil, err
		}
	}
	for _, sub := range subs {
		f := sub.Fluid()
		if _, err := sub.Saturation(f.NormalBoilingPoint.Value); err != nil {
			return nil, fmt.Errorf("fluid %q: no saturated state at its normal boiling point: %w", f.ID, err)
		}
	}
	return subs, nil
}

// showFluidProblem reports why a fluid file was refused, in the loader's
// words.
func (s *session) showFluidProblem(path string, err error) {
	msg := widget.NewLabel(err.Error())
	msg.Wrapping = fyne.TextWrapWord
	content := container.NewVBox(
		widget.NewLabel("The fluid file "+path+" was refused:"), msg,
		hint("Every value needs its unit, range and source; the vapour-pressure curve must rise steadily to the critical point and give the stated boiling point. The library was not changed."))
	d := dialog.NewCustom("Fluid not added", "Close", content, s.win)
	d.Resize(fyne.NewSize(640, 280))
	d.Show()
}

// confirmUserFluids shows what a checked file holds and adds it when
// the reviewer agrees.
func (s *session) confirmUserFluids(path string, subs []*fluids.Substance) {
	var b strings.Builder
	for _, sub := range subs {
		fmt.Fprintf(&b, "%s (%s): %s\n\n", sub.Fluid().Name, sub.Fluid().ID, fluidSummary(sub, s.units()))
	}
	msg := widget.NewLabel(strings.TrimSpace(b.String()))
	msg.Wrapping = fyne.TextWrapWord
	content := container.NewVBox(
		widget.NewLabel("The file passed the library's checks. Add these fluids?"), msg,
		hint("Records that use them will say that the data were supplied by you."))
	d := dialog.NewCustomConfirm("Add "+plural(len(subs), "fluid")+"?", "Add", "Cancel", content, func(ok bool) {
		if ok {
			s.addUserFluids(path, subs)
		}
	}, s.win)
	d.Resize(fyne.NewSize(640, 320))
	d.Show()
}

// addUserFluids puts fluids in the library and remembers their file; the
// panels are told the library changed.
func (s *session) addUserFluids(path string, subs []*fluids.Substance) {
	ids := map[string]bool{}
	for _, sub := range subs {
		ids[sub.Fluid().ID] = true
	}
	s.user = slices.DeleteFunc(s.user, func(x *fluids.Substance) bool { return ids[x.Fluid().ID] })
	s.user = append(s.user, subs...)
	s.rebuildLibrary()
	if path != "" {
		p := s.app.Preferences()
		files := slices.DeleteFunc(p.StringList(prefUserFluids), func(x string) bool { return x == path })
		p.SetStringList(prefUserFluids, append(files, path))
	}
	s.changes.publish(change{cause: causeLibrary})
}

// loadUserFluidsFromPrefs reloads the fluid files added earlier. A file
// that no longer loads is skipped but kept in the list: a design that
// uses its fluid then says the fluid is not in the library.
func (s *session) loadUserFluidsFromPrefs() {
	p := s.app.Preferences()
	for _, path := range p.StringList(prefUserFluids) {
		if info, err := os.Stat(path); err != nil || !info.Mode().IsRegular() {
			continue // a named pipe would block the start for ever
		}
		b, err := os.ReadFile(path)
		if err != nil {
			continue
		}
		subs, err := readUserFluids(bytes.NewReader(b))
		if err != nil {
			continue
		}
		s.user = append(s.user, subs...)
	}
	s.rebuildLibrary()
}
