package gui

import (
	"bytes"
	"log"
	"strings"
	"testing"
)

// TestFavouritesNoiseIsDropped: the choosers' record of a missing usual
// folder does not reach the log; the records around it do.
func TestFavouritesNoiseIsDropped(t *testing.T) {
	var out bytes.Buffer
	l := log.New(&favouritesNoiseFilter{w: &out}, "", log.LstdFlags)
	l.Println("Fyne error:  Something else")
	l.Println("Fyne error:  Getting favorite locations")
	l.Println("  Cause: this computer does not define a VIDEOS folder")
	l.Println("  At: /x/dialog/file.go:396")
	l.Println("Fyne error:  Another")
	l.Println("  Cause: kept")
	got := out.String()
	for _, want := range []string{"Something else", "Another", "Cause: kept"} {
		if !strings.Contains(got, want) {
			t.Errorf("the log lost %q:\n%s", want, got)
		}
	}
	for _, gone := range []string{"favorite", "VIDEOS", "file.go:396"} {
		if strings.Contains(got, gone) {
			t.Errorf("the log still holds %q:\n%s", gone, got)
		}
	}
}
