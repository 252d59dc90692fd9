<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="de">
<context>
    <name>ExtractorJob</name>
    <message>
        <location filename="../app/desktop/runs/extractor_job.cpp" line="16"/>
        <source>Choose at least one run.</source>
        <translation>Wählen Sie mindestens einen Lauf.</translation>
    </message>
</context>
<context>
    <name>FunctionStyle</name>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="30"/>
        <source>Problem</source>
        <translation>Problem</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="32"/>
        <source>Cause</source>
        <translation>Ursache</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="34"/>
        <source>Evaluation</source>
        <translation>Bewertung</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="36"/>
        <source>Remedy</source>
        <translation>Lösung</translation>
    </message>
</context>
<context>
    <name>ImportDialog</name>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="17"/>
        <source>Importing articles…</source>
        <translation>Artikel werden importiert…</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="18"/>
        <source>Cancel</source>
        <translation>Abbrechen</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="23"/>
        <source>Importing %1 (%2 of %3)…</source>
        <translation>%1 wird importiert (%2 von %3)…</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="29"/>
        <location filename="../app/desktop/import_dialog.cpp" line="47"/>
        <source>%1: not imported — %2</source>
        <translation>%1: nicht importiert — %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="42"/>
        <source>%1: cancelled; nothing from this file was added.</source>
        <translation>%1: abgebrochen; aus dieser Datei wurde nichts hinzugefügt.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/import_dialog.cpp" line="52"/>
        <source>%1: %n article(s) added</source>
        <translation>
            <numerusform>%1: %n Artikel hinzugefügt</numerusform>
            <numerusform>%1: %n Artikel hinzugefügt</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="56"/>
        <source>    line %1 (%2): skipped, %3</source>
        <translation>    Zeile %1 (%2): übersprungen, %3</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="69"/>
        <location filename="../app/desktop/import_dialog.cpp" line="75"/>
        <source>Import report</source>
        <translation>Importbericht</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/import_dialog.cpp" line="71"/>
        <source>%n article(s) added.</source>
        <translation>
            <numerusform>%n Artikel hinzugefügt.</numerusform>
            <numerusform>%n Artikel hinzugefügt.</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>ReliabilityJob</name>
    <message>
        <location filename="../app/desktop/reliability/reliability_job.cpp" line="39"/>
        <source>The computation was cancelled.</source>
        <translation>Die Berechnung wurde abgebrochen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_job.cpp" line="49"/>
        <source>Choose at least one framing function.</source>
        <translation>Wählen Sie mindestens eine Framing-Funktion.</translation>
    </message>
</context>
<context>
    <name>StudyText</name>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="13"/>
        <source>Training</source>
        <translation>Training</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="15"/>
        <source>Pilot</source>
        <translation>Pilot</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="17"/>
        <source>Reliability</source>
        <translation>Reliabilität</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="19"/>
        <source>Production</source>
        <translation>Hauptcodierung</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="29"/>
        <source>%1 s</source>
        <translation>%1 s</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="32"/>
        <source>%1 min</source>
        <translation>%1 min</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="33"/>
        <source>%1 h %2 min</source>
        <translation>%1 h %2 min</translation>
    </message>
</context>
<context>
    <name>fourfold::ArticleListModel</name>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="47"/>
        <source>done</source>
        <translation>erledigt</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="49"/>
        <source>in progress</source>
        <translation>in Arbeit</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="50"/>
        <source>not started</source>
        <translation>nicht begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="92"/>
        <source>Title</source>
        <translation>Titel</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="94"/>
        <source>Outlet</source>
        <translation>Medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="96"/>
        <source>Lang.</source>
        <translation>Spr.</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="100"/>
        <source>Status</source>
        <translation>Status</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="102"/>
        <source>Time</source>
        <translation>Zeit</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="98"/>
        <source>Characters</source>
        <translation>Zeichen</translation>
    </message>
</context>
<context>
    <name>fourfold::CodebookPanel</name>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="22"/>
        <source>nominal</source>
        <translation>nominalskaliert</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="24"/>
        <source>ordinal</source>
        <translation>ordinalskaliert</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="26"/>
        <source>interval</source>
        <translation>intervallskaliert</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="28"/>
        <source>ratio</source>
        <translation>verhältnisskaliert</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="56"/>
        <source>Codebook</source>
        <translation>Codebuch</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="58"/>
        <source>Framing function</source>
        <translation>Framing-Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="64"/>
        <source>Codebook entry</source>
        <translation>Codebucheintrag</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="106"/>
        <source>No codebook loaded.</source>
        <translation>Kein Codebuch geladen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="119"/>
        <source>%1, version %2</source>
        <translation>%1, Version %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="127"/>
        <source>Decision rules</source>
        <translation>Entscheidungsregeln</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="134"/>
        <source>Examples</source>
        <translation>Beispiele</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="139"/>
        <source>Attributes</source>
        <translation>Merkmale</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="142"/>
        <source>None: marking the span is all this function asks for.</source>
        <translation>Keine: Für diese Funktion genügt es, die Textstelle zu markieren.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="147"/>
        <source>free text</source>
        <translation>Freitext</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="148"/>
        <source>%1 (%2)</source>
        <translation>%1 (%2)</translation>
    </message>
</context>
<context>
    <name>fourfold::CoderDialog</name>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="22"/>
        <source>Who is coding?</source>
        <translation>Wer codiert?</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="25"/>
        <source>&lt;b&gt;%1&lt;/b&gt;&lt;br&gt;Choose who you are. A coder sees only their own spans and the articles assigned to them; a lead sees every article.</source>
        <translation>&lt;b&gt;%1&lt;/b&gt;&lt;br&gt;Wählen Sie aus, wer Sie sind. Codierende sehen nur ihre eigenen Textstellen und die ihnen zugewiesenen Artikel; die Leitung sieht alle Artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="32"/>
        <source>Coders</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="36"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="65"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="90"/>
        <source>lead</source>
        <translation>Leitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="36"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="64"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="90"/>
        <source>coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="41"/>
        <source>Start coding</source>
        <translation>Codierung starten</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="44"/>
        <source>Add a person…</source>
        <translation>Person hinzufügen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="58"/>
        <source>Add a person</source>
        <translation>Person hinzufügen</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="62"/>
        <source>e.g. C04 — the only name written to exports</source>
        <translation>z.&#xa0;B. C04 — der einzige Name, der in Exporte geschrieben wird</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="66"/>
        <source>Name:</source>
        <translation>Name:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="67"/>
        <source>Pseudonym:</source>
        <translation>Pseudonym:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="68"/>
        <source>Role:</source>
        <translation>Rolle:</translation>
    </message>
</context>
<context>
    <name>fourfold::ComparisonView</name>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="34"/>
        <source>Coders side by side</source>
        <translation>Codierende nebeneinander</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="193"/>
        <source>only one coder has a span here</source>
        <translation>nur eine codierende Person hat hier eine Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="194"/>
        <source>not every coder has a span here</source>
        <translation>nicht alle Codierenden haben hier eine Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="196"/>
        <source>different functions</source>
        <translation>unterschiedliche Funktionen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="198"/>
        <source>different boundaries</source>
        <translation>unterschiedliche Grenzen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="200"/>
        <source>different attributes</source>
        <translation>unterschiedliche Merkmale</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="201"/>
        <source>The coders agree here.</source>
        <translation>Die Codierenden stimmen hier überein.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="202"/>
        <source>Disagreement: %1.</source>
        <translation>Abweichung: %1.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="202"/>
        <source>; </source>
        <translation>; </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="204"/>
        <source>Decided.</source>
        <translation>Entschieden.</translation>
    </message>
</context>
<context>
    <name>fourfold::ComparisonWindow</name>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="89"/>
        <source>Compare coders and decide gold — %1</source>
        <translation>Codierende vergleichen und Goldstandard entscheiden — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="91"/>
        <source>Only a lead compares coders and decides the gold standard. Open the project as a lead to use this window.</source>
        <translation>Nur die Leitung vergleicht Codierende und entscheidet über den Goldstandard. Öffnen Sie das Projekt als Leitung, um dieses Fenster zu verwenden.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="141"/>
        <source>Articles to adjudicate</source>
        <translation>Zu entscheidende Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="142"/>
        <source>Articles coded by several coders, most undecided disagreements first. Open: undecided disagreements; Agreed: passages all coders agree on that are not yet in gold.</source>
        <translation>Von mehreren Codierenden codierte Artikel, die mit den meisten nicht entschiedenen Abweichungen zuerst. Offen: nicht entschiedene Abweichungen; Übereinstimmend: Passagen, in denen alle Codierenden übereinstimmen und die noch nicht im Goldstandard sind.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="159"/>
        <source>Margin: ∅ a coder has no span here · ≠ different functions · ↔ different boundaries · ≈ different attributes · ✓ decided. Lanes under each line: problem (solid), cause (dashed), evaluation (dotted), remedy (dash-dot). Hatched: this coder has no span in the passage.</source>
        <translation>Rand: ∅ eine codierende Person hat hier keine Textstelle · ≠ unterschiedliche Funktionen · ↔ unterschiedliche Grenzen · ≈ unterschiedliche Merkmale · ✓ entschieden. Spuren unter jeder Zeile: Problem (durchgezogen), Ursache (gestrichelt), Bewertung (gepunktet), Lösung (Strich-Punkt). Schraffiert: diese codierende Person hat in der Passage keine Textstelle.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="196"/>
        <source>Who</source>
        <translation>Wer</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="196"/>
        <source>Span</source>
        <translation>Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="196"/>
        <source>Decision</source>
        <translation>Entscheidung</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="201"/>
        <source>Spans of the passage</source>
        <translation>Textstellen der Passage</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="212"/>
        <source>&amp;Rationale (optional, kept with the decision):</source>
        <translation>&amp;Begründung (optional, wird mit der Entscheidung gespeichert):</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="214"/>
        <source>Why this decision, for the method section</source>
        <translation>Warum diese Entscheidung, für den Methodenteil</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="218"/>
        <source>Keys: N / P next and previous disagreement, Alt+Down / Alt+Up next and previous article; A accept the chosen span, M merge the chosen spans, E edit, R reject, W withdraw a gold span; Ctrl+Shift+A accept all agreed; Ctrl+L rationale; Ctrl+Z undo.</source>
        <translation>Tasten: N / P nächste und vorherige Abweichung, Alt+Pfeil nach unten / Alt+Pfeil nach oben nächster und vorheriger Artikel; A gewählte Textstelle übernehmen, M gewählte Textstellen vereinen, E bearbeiten, R verwerfen, W Goldstandard-Textstelle zurückziehen; Strg+Umschalt+A alle übereinstimmenden übernehmen; Strg+L Begründung; Strg+Z rückgängig.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="251"/>
        <source>Comparison</source>
        <translation>Vergleich</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="265"/>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="585"/>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="641"/>
        <source>, </source>
        <translation>, </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="271"/>
        <source>Function: </source>
        <translation>Funktion: </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="273"/>
        <source>All functions</source>
        <translation>Alle Funktionen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="276"/>
        <source>Function filter</source>
        <translation>Funktionsfilter</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="282"/>
        <source>  Coders: </source>
        <translation>  Codierende: </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="284"/>
        <source>All coders</source>
        <translation>Alle Codierenden</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="291"/>
        <source>%1 and %2</source>
        <translation>%1 und %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="293"/>
        <source>Coder pair filter</source>
        <translation>Filter nach Codierpaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="299"/>
        <source>Show decided</source>
        <translation>Entschiedene zeigen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="300"/>
        <source>Also step through disagreements already decided</source>
        <translation>Auch bereits entschiedene Abweichungen durchgehen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="303"/>
        <source>Articles in progress</source>
        <translation>Artikel in Bearbeitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="304"/>
        <source>Also compare coders on articles they have started but not yet marked done</source>
        <translation>Codierer auch bei Artikeln vergleichen, die sie begonnen, aber noch nicht als fertig markiert haben</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="306"/>
        <source>Show articles in progress</source>
        <translation>Artikel in Bearbeitung zeigen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="314"/>
        <source>Previous</source>
        <translation>Zurück</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="315"/>
        <source>Previous undecided disagreement</source>
        <translation>Vorherige nicht entschiedene Abweichung</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="316"/>
        <source>Next</source>
        <translation>Weiter</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="316"/>
        <source>Next undecided disagreement</source>
        <translation>Nächste nicht entschiedene Abweichung</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="318"/>
        <source>Previous article</source>
        <translation>Vorheriger Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="319"/>
        <source>Previous article in the queue</source>
        <translation>Vorheriger Artikel in der Warteschlange</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="324"/>
        <source>Next article</source>
        <translation>Nächster Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="325"/>
        <source>Next article in the queue</source>
        <translation>Nächster Artikel in der Warteschlange</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="333"/>
        <source>Accept</source>
        <translation>Übernehmen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="333"/>
        <source>Accept the chosen coder&apos;s span into gold</source>
        <translation>Die Textstelle der gewählten codierenden Person in den Goldstandard übernehmen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="335"/>
        <source>Merge</source>
        <translation>Vereinen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="336"/>
        <source>Put one span covering the chosen spans into gold</source>
        <translation>Eine Textstelle, die die gewählten Textstellen umfasst, in den Goldstandard aufnehmen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="337"/>
        <source>Edit…</source>
        <translation>Bearbeiten…</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="338"/>
        <source>Decide a gold span with a function and boundaries of your own</source>
        <translation>Eine Goldstandard-Textstelle mit eigener Funktion und eigenen Grenzen festlegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="340"/>
        <source>Reject</source>
        <translation>Verwerfen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="341"/>
        <source>Record that the chosen spans do not belong in gold</source>
        <translation>Festhalten, dass die gewählten Textstellen nicht in den Goldstandard gehören</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="342"/>
        <source>Withdraw gold</source>
        <translation>Zurückziehen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="342"/>
        <source>Withdraw the chosen gold span</source>
        <translation>Die gewählte Goldstandard-Textstelle zurückziehen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="344"/>
        <source>Accept all agreed</source>
        <translation>Übereinstimmende übernehmen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="346"/>
        <source>Accept every span all coders of the article agree on</source>
        <translation>Jede Textstelle übernehmen, in der alle Codierenden des Artikels übereinstimmen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="352"/>
        <source>Undo</source>
        <translation>Rückgängig</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="354"/>
        <source>Redo</source>
        <translation>Wiederholen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="496"/>
        <source>Gold (%1)</source>
        <translation>Goldstandard (%1)</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="496"/>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="633"/>
        <source>Gold</source>
        <translation>Goldstandard</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="541"/>
        <source>No undecided disagreement left in this article. Alt+Down opens the next article.</source>
        <translation>Keine nicht entschiedene Abweichung mehr in diesem Artikel. Alt+Pfeil nach unten öffnet den nächsten Artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="558"/>
        <source>No undecided disagreement left in this article.</source>
        <translation>Keine nicht entschiedene Abweichung mehr in diesem Artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="574"/>
        <source>No spans to compare in this article.</source>
        <translation>Keine Textstellen zum Vergleichen in diesem Artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="575"/>
        <source>Click a passage or press N for the next disagreement.</source>
        <translation>Klicken Sie auf eine Passage oder drücken Sie N für die nächste Abweichung.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="585"/>
        <source>no span by %1</source>
        <translation>keine Textstelle von %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="588"/>
        <source>different functions</source>
        <translation>unterschiedliche Funktionen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="590"/>
        <source>different boundaries</source>
        <translation>unterschiedliche Grenzen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="592"/>
        <source>different attributes</source>
        <translation>unterschiedliche Merkmale</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="600"/>
        <source>Passage %1 of %2 (paragraph %3): %4%5</source>
        <translation>Passage %1 von %2 (Absatz %3): %4%5</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="604"/>
        <source>the coders agree</source>
        <translation>die Codierenden stimmen überein</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="604"/>
        <source>; </source>
        <translation>; </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="605"/>
        <source> — decided</source>
        <translation> — entschieden</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="624"/>
        <source>Characters %1 to %2</source>
        <translation>Zeichen %1 bis %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="625"/>
        <source>rejected</source>
        <translation>verworfen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="625"/>
        <source>in gold</source>
        <translation>im Goldstandard</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="641"/>
        <source>drawn by the lead</source>
        <translation>von der Leitung gezogen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="641"/>
        <source>from %1</source>
        <translation>von %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="643"/>
        <source>Decided by %1 at %2.%3</source>
        <translation>Entschieden von %1 am %2.%3</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="645"/>
        <source> Rationale: %1</source>
        <translation> Begründung: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="653"/>
        <source>Gold %1 decided by %2 at %3%4</source>
        <translation>Goldstandard %1 entschieden von %2 am %3%4</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="757"/>
        <source>%1. Undo with %2.</source>
        <translation>%1. Rückgängig mit %2.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="784"/>
        <source>Choose one coder&apos;s span to accept (or several to merge).</source>
        <translation>Wählen Sie die Textstelle einer codierenden Person zum Übernehmen (oder mehrere zum Vereinen).</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="811"/>
        <source>Choose a passage first.</source>
        <translation>Wählen Sie zuerst eine Passage.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="849"/>
        <source>Choose the spans to reject (that are not rejected yet).</source>
        <translation>Wählen Sie die zu verwerfenden Textstellen (die noch nicht verworfen sind).</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="860"/>
        <source>Choose one gold span to withdraw.</source>
        <translation>Wählen Sie eine Goldstandard-Textstelle zum Zurückziehen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="880"/>
        <source>There is no agreed passage left to accept in this article.</source>
        <translation>In diesem Artikel ist keine übereinstimmende Passage mehr zu übernehmen.</translation>
    </message>
</context>
<context>
    <name>fourfold::DisagreementQueueModel</name>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="74"/>
        <source>%1 passages: %2 with a disagreement (%3 undecided), %4 agreed and not yet in gold. Only one coder or not all: %5; function: %6; boundaries: %7; attributes: %8.</source>
        <translation>%1 Passagen: %2 mit Abweichung (%3 nicht entschieden), %4 übereinstimmend und noch nicht im Goldstandard. Nur eine codierende Person oder nicht alle: %5; Funktion: %6; Grenzen: %7; Merkmale: %8.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="96"/>
        <source>Passages with a disagreement not yet decided</source>
        <translation>Passagen mit noch nicht entschiedener Abweichung</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="98"/>
        <source>Passages with a disagreement, decided or not</source>
        <translation>Passagen mit Abweichung, entschieden oder nicht</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="100"/>
        <source>Passages all coders agree on that are not yet in gold</source>
        <translation>Passagen, in denen alle Codierenden übereinstimmen und die noch nicht im Goldstandard sind</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="109"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="111"/>
        <source>Open</source>
        <translation>Offen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="113"/>
        <source>All</source>
        <translation>Alle</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="115"/>
        <source>Agreed</source>
        <translation>Übereinst.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="117"/>
        <source>Coders</source>
        <translation>Codierende</translation>
    </message>
</context>
<context>
    <name>fourfold::ExtractorWindow</name>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="97"/>
        <source>Extractor runs</source>
        <translation>Extraktorläufe</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="107"/>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="263"/>
        <source>Function</source>
        <translation>Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="107"/>
        <source>Precision</source>
        <translation>Precision</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="107"/>
        <source>Recall</source>
        <translation>Recall</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="107"/>
        <source>F1</source>
        <translation>F1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>F1 95% CI</source>
        <translation>F1 95-%-KI</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>COR</source>
        <translation>COR</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>INC</source>
        <translation>INC</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>PAR</source>
        <translation>PAR</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>MIS</source>
        <translation>MIS</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>SPU</source>
        <translation>SPU</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>α run–coders</source>
        <translation>α Lauf–Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="109"/>
        <source>Coders&apos; band</source>
        <translation>Band der Codierenden</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="109"/>
        <source>Run vs band</source>
        <translation>Lauf ggü. Band</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="110"/>
        <source>Correct: the run&apos;s span matches</source>
        <translation>Korrekt: die Textstelle des Laufs stimmt überein</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="112"/>
        <source>Incorrect: matched, but the boundaries or the function differ (strict/exact/type)</source>
        <translation>Inkorrekt: zugeordnet, aber Grenzen oder Funktion weichen ab (streng/exakt/Typ)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="114"/>
        <source>Partial: matched with other boundaries (partial mode; counts half)</source>
        <translation>Teilweise: zugeordnet mit anderen Grenzen (Modus teilweise; zählt halb)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="115"/>
        <source>Missing: a reference span the run missed</source>
        <translation>Fehlend: eine Referenz-Textstelle, die der Lauf verfehlt hat</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="117"/>
        <source>Spurious: a run span with no reference span (false positive)</source>
        <translation>Falsch: eine Textstelle des Laufs ohne Referenz-Textstelle (falsch positiv)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="119"/>
        <source>Mean Krippendorff&apos;s alpha (nominal) of the run with each coder, per unit</source>
        <translation>Mittleres Krippendorffs Alpha (nominal) des Laufs mit jeder codierenden Person, je Einheit</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="121"/>
        <source>Lowest to highest alpha of the pairs of human coders</source>
        <translation>Niedrigstes bis höchstes Alpha der Paare menschlicher Codierender</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="127"/>
        <source>Scores</source>
        <translation>Werte</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="129"/>
        <source>Errors</source>
        <translation>Fehler</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="150"/>
        <source>Function confusion</source>
        <translation>Funktionsverwechslung</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="184"/>
        <source>&lt;b&gt;Runs&lt;/b&gt; — select one or more to compare</source>
        <translation>&lt;b&gt;Läufe&lt;/b&gt; — einen oder mehrere zum Vergleichen auswählen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Name</source>
        <translation>Name</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Version</source>
        <translation>Version</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Made</source>
        <translation>Erstellt</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Parameters</source>
        <translation>Parameter</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Spans</source>
        <translation>Textstellen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="203"/>
        <source>What the runs are scored against: gold or one coder</source>
        <translation>Wogegen die Läufe bewertet werden: Goldstandard oder eine codierende Person</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="204"/>
        <source>&amp;Reference</source>
        <translation>&amp;Referenz</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="207"/>
        <source>Strict — same boundaries and function</source>
        <translation>Streng — gleiche Grenzen und Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="208"/>
        <source>Exact — same boundaries, any function</source>
        <translation>Exakt — gleiche Grenzen, beliebige Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="209"/>
        <source>Partial — overlap counts half</source>
        <translation>Teilweise — Überlappung zählt halb</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="210"/>
        <source>Type — same function, any overlap</source>
        <translation>Typ — gleiche Funktion, beliebige Überlappung</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="214"/>
        <source>&amp;Matching</source>
        <translation>&amp;Abgleich</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="217"/>
        <source>Sentence</source>
        <translation>Satz</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="218"/>
        <source>Paragraph</source>
        <translation>Absatz</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="219"/>
        <source>Token (word)</source>
        <translation>Token (Wort)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="223"/>
        <source>The unit on which the run&apos;s alpha with the coders is computed</source>
        <translation>Die Einheit, auf der das Alpha des Laufs mit den Codierenden berechnet wird</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="224"/>
        <source>&amp;Unit for alpha</source>
        <translation>&amp;Einheit für Alpha</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="263"/>
        <source>Reference spans</source>
        <translation>Referenz-Textstellen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="263"/>
        <source>Run spans</source>
        <translation>Textstellen des Laufs</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="263"/>
        <source>False positives</source>
        <translation>Falsch positive</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="264"/>
        <source>Misses</source>
        <translation>Verfehlte</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="264"/>
        <source>Wrong function</source>
        <translation>Falsche Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="264"/>
        <source>Boundary</source>
        <translation>Grenze</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="265"/>
        <source>Click a count to list those errors</source>
        <translation>Klicken Sie auf eine Anzahl, um diese Fehler aufzulisten</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="274"/>
        <source>All functions</source>
        <translation>Alle Funktionen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="279"/>
        <source>Every kind of error</source>
        <translation>Jede Fehlerart</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="284"/>
        <source>Article or text…</source>
        <translation>Artikel oder Text…</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="286"/>
        <source>&amp;Show</source>
        <translation>An&amp;zeigen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="309"/>
        <source>Double-click or press Enter to open the passage</source>
        <translation>Doppelklicken oder Eingabetaste drücken, um die Passage zu öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="332"/>
        <source>Gold</source>
        <translation>Goldstandard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="338"/>
        <source>Coder %1</source>
        <translation>Codierende %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="376"/>
        <source>?</source>
        <translation>?</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="387"/>
        <source>This project has no extractor runs yet. Make one with “fourfold-cli extract”, or import an extractor&apos;s spans with it.</source>
        <translation>Dieses Projekt hat noch keine Extraktorläufe. Erstellen Sie einen mit „fourfold-cli extract“ oder importieren Sie damit die Textstellen eines Extraktors.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="419"/>
        <source>No run selected.</source>
        <translation>Kein Lauf ausgewählt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="423"/>
        <source>&lt;b&gt;%1&lt;/b&gt;, version %2, made %3, %4 spans&lt;br&gt;%5</source>
        <translation>&lt;b&gt;%1&lt;/b&gt;, Version %2, erstellt %3, %4 Textstellen&lt;br&gt;%5</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="475"/>
        <source>Select a run to score.</source>
        <translation>Wählen Sie einen Lauf zum Bewerten aus.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="481"/>
        <source>Scoring %n run(s)…</source>
        <translation>
            <numerusform>%n Lauf wird bewertet…</numerusform>
            <numerusform>%n Läufe werden bewertet…</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="533"/>
        <source>gold</source>
        <translation>Goldstandard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="533"/>
        <source>coder %1</source>
        <translation>Codierende %1</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="544"/>
        <source>%n article(s) with %1 scored.</source>
        <translation>
            <numerusform>%n Artikel mit %1 bewertet.</numerusform>
            <numerusform>%n Artikel mit %1 bewertet.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="592"/>
        <source>Precision %1, recall %2 (95% bootstrap intervals)</source>
        <translation>Precision %1, Recall %2 (95-%-Bootstrap-Intervalle)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="611"/>
        <source>▼ below</source>
        <translation>▼ darunter</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="613"/>
        <source>● inside</source>
        <translation>● innerhalb</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="615"/>
        <source>▲ above</source>
        <translation>▲ darüber</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="617"/>
        <source>undefined</source>
        <translation>nicht definiert</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="636"/>
        <source>Micro</source>
        <translation>Mikro</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="638"/>
        <source>Macro</source>
        <translation>Makro</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="641"/>
        <source>%1: alpha on %n unit(s) (%2) with coders %3.</source>
        <translation>
            <numerusform>%1: Alpha auf %n Einheit (%2) mit den Codierenden %3.</numerusform>
            <numerusform>%1: Alpha auf %n Einheiten (%2) mit den Codierenden %3.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="646"/>
        <source>%1: no band with the coders — %2</source>
        <translation>%1: kein Band mit den Codierenden — %2</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="649"/>
        <source>Scored against %1, %2 matching; intervals from %n bootstrap replicate(s) over articles.</source>
        <translation>
            <numerusform>Bewertet gegen %1, Abgleich %2; Intervalle aus %n Bootstrap-Replikation über Artikel.</numerusform>
            <numerusform>Bewertet gegen %1, Abgleich %2; Intervalle aus %n Bootstrap-Replikationen über Artikel.</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="666"/>
        <source>Errors of run &lt;b&gt;%1&lt;/b&gt; against %2 (%3 matching) on %n article(s). Double-click an error to see its passage.</source>
        <translation>
            <numerusform>Fehler des Laufs &lt;b&gt;%1&lt;/b&gt; gegen %2 (Abgleich %3) in %n Artikel. Doppelklicken Sie auf einen Fehler, um seine Passage zu sehen.</numerusform>
            <numerusform>Fehler des Laufs &lt;b&gt;%1&lt;/b&gt; gegen %2 (Abgleich %3) in %n Artikeln. Doppelklicken Sie auf einen Fehler, um seine Passage zu sehen.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="672"/>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="728"/>
        <source>No run scored.</source>
        <translation>Kein Lauf bewertet.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="686"/>
        <source>All</source>
        <translation>Alle</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="716"/>
        <source>reference</source>
        <translation>Referenz</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="721"/>
        <source>None (false positive)</source>
        <translation>Keine (falsch positiv)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="722"/>
        <source>None (miss)</source>
        <translation>Keine (verfehlt)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="733"/>
        <source>Rows: the function %1 gives a span; columns: the function run &lt;b&gt;%2&lt;/b&gt; gives it (%3 matching). The diagonal is agreement on the function.</source>
        <translation>Zeilen: die Funktion, die %1 einer Textstelle gibt; Spalten: die Funktion, die Lauf &lt;b&gt;%2&lt;/b&gt; ihr gibt (Abgleich %3). Die Diagonale ist Übereinstimmung in der Funktion.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="781"/>
        <source>%1 %2 → run %3: %4</source>
        <translation>%1 %2 → Lauf %3: %4</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="787"/>
        <source>The run gives no matched span another function.</source>
        <translation>Der Lauf gibt keiner zugeordneten Textstelle eine andere Funktion.</translation>
    </message>
</context>
<context>
    <name>fourfold::FrameCard</name>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="162"/>
        <source>Frame card</source>
        <translation>Frame-Karte</translation>
    </message>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="209"/>
        <source>— nothing coded yet</source>
        <translation>— noch nichts codiert</translation>
    </message>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="263"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frame_card.cpp" line="279"/>
        <source>%n span(s)</source>
        <translation>
            <numerusform>%n Textstelle</numerusform>
            <numerusform>%n Textstellen</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frame_card.cpp" line="281"/>
        <source>%1: %n span(s)</source>
        <translation>
            <numerusform>%1: %n Textstelle</numerusform>
            <numerusform>%1: %n Textstellen</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>fourfold::GoldSpanDialog</name>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="22"/>
        <source>Edit the gold span</source>
        <translation>Goldstandard-Textstelle bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="28"/>
        <source>&amp;Function:</source>
        <translation>&amp;Funktion:</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="36"/>
        <source>&amp;Start (character):</source>
        <translation>&amp;Beginn (Zeichen):</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="37"/>
        <source>&amp;End (character, not included):</source>
        <translation>&amp;Ende (Zeichen, nicht enthalten):</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="42"/>
        <source>Text:</source>
        <translation>Text:</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="44"/>
        <source>Decide gold span</source>
        <translation>Goldstandard-Textstelle festlegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="70"/>
        <source>(The end must come after the start.)</source>
        <translation>(Das Ende muss nach dem Beginn liegen.)</translation>
    </message>
</context>
<context>
    <name>fourfold::ItemForm</name>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="29"/>
        <source>Article-level items</source>
        <translation>Items auf Artikelebene</translation>
    </message>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="34"/>
        <source>The codebook asks no questions about the article as a whole.</source>
        <translation>Das Codebuch stellt keine Fragen zum Artikel als Ganzem.</translation>
    </message>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="68"/>
        <source>not answered</source>
        <translation>nicht beantwortet</translation>
    </message>
</context>
<context>
    <name>fourfold::LeadWindows</name>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="122"/>
        <source>Write the reliability report</source>
        <translation>Reliabilitätsbericht schreiben</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="123"/>
        <source>Web page (*.html);;PDF document (*.pdf)</source>
        <translation>Webseite (*.html);;PDF-Dokument (*.pdf)</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="130"/>
        <source>Reliability report</source>
        <translation>Reliabilitätsbericht</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="134"/>
        <source>The reliability report was written to %1.</source>
        <translation>Der Reliabilitätsbericht wurde nach %1 geschrieben.</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="135"/>
        <source>&amp;Open</source>
        <translation>&amp;Öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="136"/>
        <location filename="../app/desktop/lead_windows.cpp" line="175"/>
        <source>Open the &amp;folder</source>
        <translation>&amp;Ordner öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="147"/>
        <location filename="../app/desktop/lead_windows.cpp" line="155"/>
        <location filename="../app/desktop/lead_windows.cpp" line="168"/>
        <source>Coder copy</source>
        <translation>Kopie für Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="156"/>
        <source>A coder copy holds only the articles assigned to this coder, the codebook and the coder&apos;s own codings. Whose copy?</source>
        <translation>Eine Kopie für Codierende enthält nur die dieser Person zugewiesenen Artikel, das Codebuch und ihre eigenen Codierungen. Für wen ist die Kopie?</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="162"/>
        <source>Write the coder copy</source>
        <translation>Kopie für Codierende schreiben</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="163"/>
        <location filename="../app/desktop/lead_windows.cpp" line="185"/>
        <source>Fourfold project (*.fourfold)</source>
        <translation>Fourfold-Projekt (*.fourfold)</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/lead_windows.cpp" line="172"/>
        <source>Wrote %1 for %2: %n article(s), %3 span(s).</source>
        <translation>
            <numerusform>%1 für %2 geschrieben: %n Artikel, %3 Textstelle(n).</numerusform>
            <numerusform>%1 für %2 geschrieben: %n Artikel, %3 Textstelle(n).</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="185"/>
        <source>Merge returned coder copies</source>
        <translation>Zurückgegebene Kopien zusammenführen</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="190"/>
        <source>Merge coder copies</source>
        <translation>Kopien zusammenführen</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="191"/>
        <source>Nothing was merged.

%1</source>
        <translation>Es wurde nichts zusammengeführt.

%1</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="198"/>
        <source>%1 (%2): already merged, nothing new.</source>
        <translation>%1 (%2): bereits zusammengeführt, nichts Neues.</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="200"/>
        <source>%1 (%2): %3 new, %4 changed (%5 deleted), %6 conflict(s).</source>
        <translation>%1 (%2): %3 neu, %4 geändert (%5 gelöscht), %6 Konflikt(e).</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/lead_windows.cpp" line="208"/>
        <source>Merged %n copy(ies); %1 conflict(s) keep the project&apos;s version until you decide (fourfold-cli merge PROJECT --conflicts lists them).</source>
        <translation>
            <numerusform>%n Kopie zusammengeführt; %1 Konflikt(e) behalten die Fassung des Projekts, bis Sie entscheiden (fourfold-cli merge PROJECT --conflicts listet sie).</numerusform>
            <numerusform>%n Kopien zusammengeführt; %1 Konflikt(e) behalten die Fassung des Projekts, bis Sie entscheiden (fourfold-cli merge PROJECT --conflicts listet sie).</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/lead_windows.cpp" line="212"/>
        <source>Merged %n copy(ies).</source>
        <translation>
            <numerusform>%n Kopie zusammengeführt.</numerusform>
            <numerusform>%n Kopien zusammengeführt.</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>fourfold::MainWindow</name>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="693"/>
        <source>Fourfold</source>
        <translation>Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="183"/>
        <source>Articles</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="104"/>
        <source>&lt;h1&gt;Fourfold&lt;/h1&gt;&lt;p&gt;Manual frame analysis of news and opinion articles: problem, cause, evaluation, remedy.&lt;/p&gt;</source>
        <translation>&lt;h1&gt;Fourfold&lt;/h1&gt;&lt;p&gt;Manuelle Frame-Analyse von Nachrichten- und Meinungsartikeln: Problem, Ursache, Bewertung, Lösung.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="111"/>
        <source>Open a project…</source>
        <translation>Projekt öffnen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="114"/>
        <source>Open the sample project</source>
        <translation>Beispielprojekt öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="116"/>
        <source>Invented demo data: three local controversies, three coders.</source>
        <translation>Erfundene Demodaten: drei lokale Streitfragen, drei Codierende.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="122"/>
        <location filename="../app/desktop/main_window.cpp" line="135"/>
        <source>Recent projects</source>
        <translation>Zuletzt geöffnete Projekte</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="154"/>
        <source>Search the texts…</source>
        <translation>Texte durchsuchen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="156"/>
        <source>Search articles</source>
        <translation>Artikel durchsuchen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="163"/>
        <source>Status filter</source>
        <translation>Statusfilter</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="164"/>
        <source>All articles</source>
        <translation>Alle Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="165"/>
        <source>Not started</source>
        <translation>Nicht begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="166"/>
        <source>In progress</source>
        <translation>In Arbeit</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="167"/>
        <source>Done</source>
        <translation>Erledigt</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="225"/>
        <source>Mark the selected text as %1 (key %2)</source>
        <translation>Ausgewählten Text als %1 markieren (Taste %2)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="236"/>
        <source>Mark as done</source>
        <translation>Als erledigt markieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="237"/>
        <source>Mark this article as done and open the next one (Ctrl+Return)</source>
        <translation>Diesen Artikel als erledigt markieren und den nächsten öffnen (Strg+Eingabe)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="305"/>
        <source>&amp;Project</source>
        <translation>&amp;Projekt</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="306"/>
        <source>&amp;New project…</source>
        <translation>&amp;Neues Projekt…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="307"/>
        <source>&amp;Open…</source>
        <translation>Ö&amp;ffnen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="308"/>
        <source>&amp;Import articles…</source>
        <translation>Artikel &amp;importieren…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="310"/>
        <source>Open the &amp;sample project</source>
        <translation>Bei&amp;spielprojekt öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="312"/>
        <source>&amp;Quit</source>
        <translation>&amp;Beenden</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="314"/>
        <source>&amp;Edit</source>
        <translation>&amp;Bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="315"/>
        <location filename="../app/desktop/main_window.cpp" line="453"/>
        <source>&amp;Undo</source>
        <translation>&amp;Rückgängig</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="318"/>
        <location filename="../app/desktop/main_window.cpp" line="456"/>
        <source>&amp;Redo</source>
        <translation>&amp;Wiederholen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="322"/>
        <source>&amp;Code</source>
        <translation>&amp;Codieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="326"/>
        <source>Mark as %1	%2</source>
        <translation>Als %1 markieren	%2</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="330"/>
        <source>Mark article as &amp;done</source>
        <translation>Artikel als &amp;erledigt markieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="332"/>
        <source>&amp;Next article</source>
        <translation>&amp;Nächster Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="335"/>
        <source>&amp;Find in texts</source>
        <translation>In Texten &amp;suchen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="336"/>
        <source>&amp;Training feedback…</source>
        <translation>&amp;Trainingsfeedback…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="343"/>
        <source>&amp;View</source>
        <translation>&amp;Ansicht</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="344"/>
        <source>Show &amp;every coder&apos;s spans (leads only)</source>
        <translation>Textstellen &amp;aller Codierenden zeigen (nur Leitung)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="354"/>
        <source>&amp;Lead</source>
        <translation>&amp;Leitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="355"/>
        <source>&amp;Compare and adjudicate…</source>
        <translation>&amp;Vergleichen und entscheiden…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="357"/>
        <source>&amp;Reliability…</source>
        <translation>&amp;Reliabilität…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="359"/>
        <source>Write the reliability &amp;report…</source>
        <translation>Reliabilitäts&amp;bericht schreiben…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="361"/>
        <source>&amp;Study design…</source>
        <translation>&amp;Studiendesign…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="362"/>
        <source>&amp;Progress…</source>
        <translation>&amp;Fortschritt…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="363"/>
        <source>&amp;Hand out a coder copy…</source>
        <translation>&amp;Kopie für Codierende ausgeben…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="364"/>
        <source>&amp;Merge returned coder copies…</source>
        <translation>Zurückgegebene Kopien &amp;zusammenführen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="366"/>
        <source>&amp;Extractor runs…</source>
        <translation>&amp;Extraktorläufe…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="370"/>
        <source>&amp;Settings</source>
        <translation>&amp;Einstellungen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="371"/>
        <source>&amp;Language</source>
        <translation>&amp;Sprache</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="376"/>
        <source>System language</source>
        <translation>Systemsprache</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="387"/>
        <source>&amp;Help</source>
        <translation>&amp;Hilfe</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="389"/>
        <source>&amp;Keyboard shortcuts</source>
        <translation>&amp;Tastenkürzel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="406"/>
        <source>The project has no coder &quot;%1&quot;.</source>
        <translation>Im Projekt gibt es keine Codierenden mit dem Pseudonym „%1“.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="410"/>
        <source>Nobody was chosen to code.</source>
        <translation>Es wurde niemand zum Codieren ausgewählt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="435"/>
        <source>Span</source>
        <translation>Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="436"/>
        <source>Codebook</source>
        <translation>Codebuch</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="453"/>
        <source>&amp;Undo %1</source>
        <translation>&amp;Rückgängig: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="456"/>
        <source>&amp;Redo %1</source>
        <translation>&amp;Wiederholen: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="599"/>
        <source>Every article in the list is done.</source>
        <translation>Alle Artikel in der Liste sind erledigt.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/main_window.cpp" line="621"/>
        <source>%n article(s) contain &quot;%1&quot;.</source>
        <translation>
            <numerusform>%n Artikel enthält „%1“.</numerusform>
            <numerusform>%n Artikel enthalten „%1“.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="627"/>
        <source>New project</source>
        <translation>Neues Projekt</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="637"/>
        <source>Cannot create project</source>
        <translation>Projekt kann nicht erstellt werden</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="649"/>
        <source>Import articles</source>
        <translation>Artikel importieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="650"/>
        <source>Articles (*.txt *.text *.html *.htm *.jsonl *.ndjson *.csv)</source>
        <translation>Artikel (*.txt *.text *.html *.htm *.jsonl *.ndjson *.csv)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="681"/>
        <source>The language changes when Fourfold starts again.</source>
        <translation>Die Sprache wechselt beim nächsten Start von Fourfold.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="694"/>
        <source>No project open</source>
        <translation>Kein Projekt geöffnet</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="698"/>
        <source>lead</source>
        <translation>Leitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="698"/>
        <source>coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="699"/>
        <source>%1 — coding as %2 (%3) — Fourfold</source>
        <translation>%1 — Codieren als %2 (%3) — Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="702"/>
        <source>Coding as %1 · %2 · lead: every article</source>
        <translation>Codieren als %1 · %2 · Leitung: alle Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="703"/>
        <source>Coding as %1 · %2 · blind: only your own spans</source>
        <translation>Codieren als %1 · %2 · blind: nur eigene Textstellen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="715"/>
        <source>Mark the selected text as %1 (snapped to whole words; hold Alt for the exact selection); with a span selected: relabel it</source>
        <translation>Ausgewählten Text als %1 markieren (auf ganze Wörter erweitert; Alt gedrückt halten für die genaue Auswahl); bei ausgewählter Textstelle: deren Funktion ändern</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="719"/>
        <source>Delete</source>
        <translation>Entf</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="719"/>
        <source>Delete the selected span</source>
        <translation>Ausgewählte Textstelle löschen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="721"/>
        <source>Undo the last change</source>
        <translation>Letzte Änderung rückgängig machen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="722"/>
        <source>Redo</source>
        <translation>Wiederholen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="723"/>
        <source>Mark the article as done and open the next</source>
        <translation>Artikel als erledigt markieren und den nächsten öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="724"/>
        <source>Next article that is not done</source>
        <translation>Nächster noch nicht erledigter Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="726"/>
        <source>Search the texts</source>
        <translation>Texte durchsuchen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="728"/>
        <source>Keyboard shortcuts</source>
        <translation>Tastenkürzel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="731"/>
        <source>Span resizing keys are listed in the reading desk&apos;s tooltip.</source>
        <translation>Die Tasten zum Ändern der Länge einer Textstelle stehen im Tooltip des Lesebereichs.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="661"/>
        <source>Open project</source>
        <translation>Projekt öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="627"/>
        <location filename="../app/desktop/main_window.cpp" line="661"/>
        <source>Fourfold projects (*.fourfold)</source>
        <translation>Fourfold-Projekte (*.fourfold)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="129"/>
        <location filename="../app/desktop/main_window.cpp" line="642"/>
        <location filename="../app/desktop/main_window.cpp" line="665"/>
        <location filename="../app/desktop/main_window.cpp" line="674"/>
        <source>Cannot open project</source>
        <translation>Projekt kann nicht geöffnet werden</translation>
    </message>
</context>
<context>
    <name>fourfold::MessageBar</name>
    <message>
        <location filename="../app/desktop/message_bar.cpp" line="68"/>
        <source>Message</source>
        <translation>Meldung</translation>
    </message>
    <message>
        <location filename="../app/desktop/message_bar.cpp" line="83"/>
        <source>&amp;Details</source>
        <translation>&amp;Details</translation>
    </message>
    <message>
        <location filename="../app/desktop/message_bar.cpp" line="89"/>
        <location filename="../app/desktop/message_bar.cpp" line="90"/>
        <source>Close the message</source>
        <translation>Meldung schließen</translation>
    </message>
    <message>
        <location filename="../app/desktop/message_bar.cpp" line="95"/>
        <source>Details of the message</source>
        <translation>Details der Meldung</translation>
    </message>
</context>
<context>
    <name>fourfold::ProgressBoardWindow</name>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="63"/>
        <source>Progress — %1</source>
        <translation>Fortschritt — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="73"/>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="96"/>
        <source>Phase</source>
        <translation>Phase</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="74"/>
        <source>All phases</source>
        <translation>Alle Phasen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="77"/>
        <source>Show:</source>
        <translation>Zeigen:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="79"/>
        <source>Reload</source>
        <translation>Neu laden</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <source>Coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <source>Assigned</source>
        <translation>Zugewiesen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <source>Started</source>
        <translation>Begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="180"/>
        <source>Done</source>
        <translation>Erledigt</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="84"/>
        <source>Agreement so far (α)</source>
        <translation>Übereinstimmung (α)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="84"/>
        <source>Compared articles</source>
        <translation>Verglichene Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="84"/>
        <source>Active time</source>
        <translation>Aktive Zeit</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="87"/>
        <source>Krippendorff&apos;s alpha on the articles the coder finished: in training with the lead&apos;s master coding, in the other phases the mean over every coder who finished the same articles. ✓ at .800 or more, ~ from .667 (tentative), ✗ below.</source>
        <translation>Krippendorffs Alpha auf den Artikeln, die die Person abgeschlossen hat: im Training mit der Mastercodierung der Leitung, in den anderen Phasen der Mittelwert über alle Codierenden, die dieselben Artikel abgeschlossen haben. ✓ ab .800, ~ ab .667 (vorläufig), ✗ darunter.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="94"/>
        <source>Effort</source>
        <translation>Aufwand</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="96"/>
        <source>Articles done</source>
        <translation>Erledigte Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="96"/>
        <source>Active time, all coders</source>
        <translation>Aktive Zeit, alle Codierenden</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="97"/>
        <source>Mean per done article</source>
        <translation>Mittel je erledigtem Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="102"/>
        <source>Show active time per coder</source>
        <translation>Aktive Zeit je codierender Person zeigen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="106"/>
        <source>Off by default: time is shown only summed over all coders. Recording and showing how long each person works can count as monitoring employees, which may need the coders&apos; agreement or a works council&apos;s consent. Turn it on only if your study has that agreement; the change is written to the project&apos;s log. Only a lead can switch it.</source>
        <translation>Standardmäßig aus: Zeit wird nur über alle Codierenden summiert angezeigt. Zu erfassen und anzuzeigen, wie lange jede Person arbeitet, kann als Beschäftigtenüberwachung gelten, die das Einverständnis der Codierenden oder die Zustimmung eines Betriebsrats erfordern kann. Schalten Sie es nur ein, wenn Ihre Studie dieses Einverständnis hat; die Änderung wird im Protokoll des Projekts vermerkt. Nur die Leitung kann es umschalten.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="179"/>
        <source>%1 of %2</source>
        <translation>%1 von %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="229"/>
        <source>&lt;b&gt;No assignments yet.&lt;/b&gt; Plan them in the study design window.</source>
        <translation>&lt;b&gt;Noch keine Zuweisungen.&lt;/b&gt; Planen Sie sie im Fenster Studiendesign.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="230"/>
        <source>&lt;b&gt;%1 of %2 assignments done&lt;/b&gt; · %3 of active coding time in all.</source>
        <translation>&lt;b&gt;%1 von %2 Zuweisungen erledigt&lt;/b&gt; · insgesamt %3 aktive Codierzeit.</translation>
    </message>
</context>
<context>
    <name>fourfold::ReadingView</name>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="60"/>
        <source>intro</source>
        <translation>Einleitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="62"/>
        <source>body</source>
        <translation>Hauptteil</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="64"/>
        <source>conclusion</source>
        <translation>Schluss</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="89"/>
        <source>Article text</source>
        <translation>Artikeltext</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="633"/>
        <source>Mark as %1</source>
        <translation>Als %1 markieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="634"/>
        <source>Change to %1</source>
        <translation>In %1 ändern</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="639"/>
        <source>Delete span</source>
        <translation>Textstelle löschen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="665"/>
        <source>%1: “%2”</source>
        <translation>%1: „%2“</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/reading_view.cpp" line="894"/>
        <source>%n span(s). Select text and press 1 to 4 to mark a framing function; Alt+Down and Alt+Up move between spans.</source>
        <translation>
            <numerusform>%n Textstelle. Wählen Sie Text aus und drücken Sie 1 bis 4, um eine Framing-Funktion zu markieren; Alt+Pfeil nach unten und Alt+Pfeil nach oben wechseln zwischen Textstellen.</numerusform>
            <numerusform>%n Textstellen. Wählen Sie Text aus und drücken Sie 1 bis 4, um eine Framing-Funktion zu markieren; Alt+Pfeil nach unten und Alt+Pfeil nach oben wechseln zwischen Textstellen.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="903"/>
        <source>Selected span: %1, “%2”. Press 1 to 4 to relabel, Delete to delete, Alt+Left/Right and Alt+Shift+Left/Right to resize.</source>
        <translation>Ausgewählte Textstelle: %1, „%2“. 1 bis 4 ändert die Funktion, Entf löscht, Alt+Links/Rechts und Alt+Umschalt+Links/Rechts ändern die Länge.</translation>
    </message>
</context>
<context>
    <name>fourfold::ReliabilityWindow</name>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="115"/>
        <source>0.800: rely on the variable</source>
        <translation>0.800: auf die Variable verlassen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="116"/>
        <source>0.667: tentative conclusions only</source>
        <translation>0.667: nur vorläufige Schlüsse</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="156"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="575"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="678"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="722"/>
        <source>undefined</source>
        <translation>nicht definiert</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="158"/>
        <source>reliable (≥ 0.800)</source>
        <translation>reliabel (≥ 0.800)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="160"/>
        <source>tentative (≥ 0.667)</source>
        <translation>vorläufig (≥ 0.667)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="164"/>
        <source>unreliable (&lt; 0.667)</source>
        <translation>nicht reliabel (&lt; 0.667)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="174"/>
        <source>Reliability — %1</source>
        <translation>Reliabilität — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="212"/>
        <source>Table</source>
        <translation>Tabelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="226"/>
        <source>Alpha without each coder</source>
        <translation>Alpha ohne jeweils eine codierende Person</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="229"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="707"/>
        <source>Alpha without each article (the costliest first)</source>
        <translation>Alpha ohne jeweils einen Artikel (der teuerste zuerst)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="233"/>
        <source>Change = alpha without it − alpha with everything: positive means leaving it out raises alpha, so it costs reliability (leave-one-out, common practice). A diagnostic for training and codebook work, not a licence to report the higher figure.</source>
        <translation>Änderung = Alpha ohne − Alpha mit allem: positiv heißt, Weglassen erhöht Alpha, es kostet also Reliabilität (Leave-one-out, gängige Praxis). Eine Diagnose für Schulung und Codebucharbeit, kein Freibrief, die höhere Zahl zu berichten.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="238"/>
        <source>Boundary habits on matched spans</source>
        <translation>Grenzgewohnheiten bei zugeordneten Textstellen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="241"/>
        <source>Each span against the other coder&apos;s span of the same function that overlaps it most; differences are this coder&apos;s minus the other&apos;s, in characters (code points). Systematic: the mean differs from 0 by more than two standard errors over at least 5 matches (a rough screen, common practice).</source>
        <translation>Jede Textstelle gegen die am stärksten überlappende Textstelle derselben Funktion der anderen Person; Differenzen sind die dieser Person minus die der anderen, in Zeichen (Codepunkten). Systematisch: Der Mittelwert weicht über mindestens 5 Zuordnungen um mehr als zwei Standardfehler von 0 ab (grobe Prüfung, gängige Praxis).</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="248"/>
        <source>Diagnostics</source>
        <translation>Diagnose</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="253"/>
        <source>Alpha per function</source>
        <translation>Alpha je Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="255"/>
        <source>Coder pairs</source>
        <translation>Codierpaare</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="257"/>
        <source>Function confusion</source>
        <translation>Funktionsverwechslung</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="260"/>
        <source>Alpha over time</source>
        <translation>Alpha im Zeitverlauf</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="285"/>
        <source>Article item</source>
        <translation>Artikel-Item</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="286"/>
        <source>Paragraph</source>
        <translation>Absatz</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="287"/>
        <source>Sentence</source>
        <translation>Satz</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="288"/>
        <source>Token (word)</source>
        <translation>Token (Wort)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="289"/>
        <source>Continuum (spans, unitizing alpha)</source>
        <translation>Kontinuum (Textstellen, Unitizing-Alpha)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="294"/>
        <source>&amp;Unit</source>
        <translation>&amp;Einheit</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="300"/>
        <source>&amp;Item</source>
        <translation>&amp;Item</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="316"/>
        <source>Functions</source>
        <translation>Funktionen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="335"/>
        <source>&amp;Coders</source>
        <translation>&amp;Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="338"/>
        <source>All phases</source>
        <translation>Alle Phasen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="342"/>
        <source>&amp;Phase</source>
        <translation>&amp;Phase</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="344"/>
        <source>Gold joins as a coder</source>
        <translation>Goldstandard als weitere Codierung</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="346"/>
        <source>Count articles in progress</source>
        <translation>Artikel in Bearbeitung mitzählen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="347"/>
        <source>By default a coder&apos;s article counts only once the coder has marked it done; tick to count articles still in progress too.</source>
        <translation>Standardmäßig zählt ein Artikel eines Codierers erst, wenn er ihn als fertig markiert hat; ankreuzen, um auch Artikel in Bearbeitung mitzuzählen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="355"/>
        <source>none</source>
        <translation>keine</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="356"/>
        <source>&amp;Bootstrap</source>
        <translation>&amp;Bootstrap</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="359"/>
        <source>Batches of articles</source>
        <translation>Artikelblöcke</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="360"/>
        <source>Weeks</source>
        <translation>Wochen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="361"/>
        <source>&amp;Drift by</source>
        <translation>&amp;Drift nach</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="365"/>
        <source> articles</source>
        <translation> Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="366"/>
        <source>Batch &amp;size</source>
        <translation>Block&amp;größe</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="368"/>
        <source>Co&amp;mpute</source>
        <translation>Be&amp;rechnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="370"/>
        <source>Cancel</source>
        <translation>Abbrechen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="478"/>
        <source>Computing…</source>
        <translation>Wird berechnet…</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="488"/>
        <source>Cancelling after the current step…</source>
        <translation>Abbruch nach dem aktuellen Schritt…</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="505"/>
        <source>Cancelled; the results shown are from before.</source>
        <translation>Abgebrochen; die angezeigten Ergebnisse sind von vorher.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="510"/>
        <source>%n coder(s) compared.</source>
        <translation>
            <numerusform>%n codierende Person verglichen.</numerusform>
            <numerusform>%n Codierende verglichen.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="525"/>
        <source>Chosen functions (sets)</source>
        <translation>Funktionsmenge</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="544"/>
        <source>Alpha</source>
        <translation>Alpha</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="201"/>
        <source>Alpha: Krippendorff&apos;s alpha, coincidence form (Krippendorff 2011). Interval: 95% bootstrap, units resampled (percentile; the pair interval of Hayes &amp; Krippendorff 2007 is in the report, and it is too narrow with more than two coders); q(α &lt; 0.800): share of replicates below 0.800. Verdict: Krippendorff (2004, §12.2). Minimum values: Krippendorff (2004, §11.4) after Bloch &amp; Kraemer (1989), for the rarest value at p = 0.05. Cohen&apos;s kappa per pair over the units both coded (Cohen 1960); Fleiss&apos; kappa (Fleiss 1971) needs every coder on every unit.</source>
        <translation>Alpha: Krippendorffs Alpha, Koinzidenzform (Krippendorff 2011). Intervall: 95-%-Bootstrap, Einheiten neu gezogen (Perzentil; das Paarintervall nach Hayes &amp; Krippendorff 2007 steht im Bericht und ist bei mehr als zwei Codierenden zu schmal); q(α &lt; 0.800): Anteil der Replikationen unter 0.800. Urteil: Krippendorff (2004, §12.2). Mindestzahl an Werten: Krippendorff (2004, §11.4) nach Bloch &amp; Kraemer (1989), für den seltensten Wert bei p = 0.05. Cohens Kappa je Paar über die von beiden codierten Einheiten (Cohen 1960); Fleiss&apos; Kappa (Fleiss 1971) braucht alle Codierenden auf jeder Einheit.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="544"/>
        <source>q(α &lt; 0.800)</source>
        <translation>q(α &lt; 0.800)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="544"/>
        <source>95% interval (units resampled)</source>
        <translation>95-%-Intervall (Einheiten neu gezogen)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="545"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="663"/>
        <source>Verdict</source>
        <translation>Urteil</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="545"/>
        <source>Percent agreement</source>
        <translation>Prozentuale Übereinstimmung</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="545"/>
        <source>Fleiss&apos; kappa</source>
        <translation>Fleiss&apos; Kappa</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="549"/>
        <source>Cohen&apos;s kappa %1 × %2</source>
        <translation>Cohens Kappa %1 × %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="551"/>
        <source>Pairable values</source>
        <translation>Paarbare Werte</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="551"/>
        <source>Pairable units</source>
        <translation>Paarbare Einheiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="551"/>
        <source>Rarest value</source>
        <translation>Seltenster Wert</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="552"/>
        <source>Minimum values (α ≥ 0.800)</source>
        <translation>Mindestzahl an Werten (α ≥ 0.800)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="552"/>
        <source>Sample</source>
        <translation>Stichprobe</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="557"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="667"/>
        <source>Statistic</source>
        <translation>Kennwert</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="583"/>
        <source>%1, %2 replicates, seed %3</source>
        <translation>%1, %2 Replikationen, Seed %3</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="609"/>
        <source>Fleiss&apos; kappa needs every coder on every unit; some cells are missing.</source>
        <translation>Fleiss&apos; Kappa braucht alle Codierenden auf jeder Einheit; einige Zellen fehlen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="627"/>
        <source>below the minimum</source>
        <translation>unter dem Minimum</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="628"/>
        <source>large enough</source>
        <translation>groß genug</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="644"/>
        <source>The sample is smaller than Krippendorff&apos;s minimum for the rarest value (alpha ≥ 0.800 at p = 0.05) in: %1. Code more units before relying on these figures.</source>
        <translation>Die Stichprobe ist kleiner als Krippendorffs Minimum für den seltensten Wert (Alpha ≥ 0.800 bei p = 0.05) in: %1. Codieren Sie mehr Einheiten, bevor Sie sich auf diese Werte verlassen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="663"/>
        <source>Unitizing alpha</source>
        <translation>Unitizing-Alpha</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="663"/>
        <source>Observed disagreement D_o</source>
        <translation>Beobachtete Nichtübereinstimmung D_o</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="664"/>
        <source>Expected disagreement D_e</source>
        <translation>Erwartete Nichtübereinstimmung D_e</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="664"/>
        <source>Continuum</source>
        <translation>Kontinuum</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="669"/>
        <source>All four, pooled</source>
        <translation>Alle vier, gepoolt</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="686"/>
        <source>%1 articles, %2 characters</source>
        <translation>%1 Artikel, %2 Zeichen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="704"/>
        <source>Alpha without each article: the %1 costliest of %2</source>
        <translation>Alpha ohne jeweils einen Artikel: die %1 teuersten von %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="709"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="709"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="739"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="892"/>
        <source>Coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="711"/>
        <source>Title</source>
        <translation>Titel</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="712"/>
        <source>Alpha without</source>
        <translation>Alpha ohne</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="712"/>
        <source>Change</source>
        <translation>Änderung</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="712"/>
        <source>Units</source>
        <translation>Einheiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="739"/>
        <source>Matches</source>
        <translation>Zuordnungen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="739"/>
        <source>Length ± SE</source>
        <translation>Länge ± SE</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="739"/>
        <source>Start</source>
        <translation>Beginn</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="740"/>
        <source>End</source>
        <translation>Ende</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="740"/>
        <source>Longer</source>
        <translation>Länger</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="740"/>
        <source>Shorter</source>
        <translation>Kürzer</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="740"/>
        <source>Habit</source>
        <translation>Gewohnheit</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="762"/>
        <source>spans systematically longer</source>
        <translation>Textstellen systematisch länger</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="763"/>
        <source>spans systematically shorter</source>
        <translation>Textstellen systematisch kürzer</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="776"/>
        <source>Alpha per function, with 95% bootstrap intervals</source>
        <translation>Alpha je Funktion, mit 95-%-Bootstrap-Intervallen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="780"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="943"/>
        <source>Krippendorff&apos;s alpha</source>
        <translation>Krippendorffs Alpha</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="800"/>
        <source>pooled</source>
        <translation>gepoolt</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="884"/>
        <source>Cohen&apos;s kappa of each pair of coders over the units both coded (%1). Darker: higher agreement; hatched: not defined.</source>
        <translation>Cohens Kappa jedes Paars von Codierenden über die von beiden codierten Einheiten (%1). Dunkler: höhere Übereinstimmung; schraffiert: nicht definiert.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="889"/>
        <source>Continuum units have no per-pair kappa; see the span agreement in the function confusion.</source>
        <translation>Kontinuum-Einheiten haben kein Kappa je Paar; siehe die Übereinstimmung der Textstellen in der Funktionsverwechslung.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="906"/>
        <source>nothing</source>
        <translation>nichts</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="925"/>
        <source>A coder&apos;s span</source>
        <translation>Textstelle einer Person</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="925"/>
        <source>What another coder gave it</source>
        <translation>Was eine andere Person vergab</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="926"/>
        <source>Each span of each coder against the best-overlapping span of every other coder (both directions of each pair). Darker: a larger share of the row. &quot;nothing&quot;: no overlapping span.</source>
        <translation>Jede Textstelle jeder codierenden Person gegen die am besten überlappende Textstelle jeder anderen (beide Richtungen jedes Paars). Dunkler: größerer Anteil der Zeile. „nichts“: keine überlappende Textstelle.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="938"/>
        <source>Alpha by week of first coding — %1</source>
        <translation>Alpha nach Woche der ersten Codierung — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="939"/>
        <source>Alpha by batch of articles, in coding order — %1</source>
        <translation>Alpha nach Artikelblock, in Codierreihenfolge — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="979"/>
        <source>ISO week</source>
        <translation>ISO-Woche</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="979"/>
        <source>articles (in coding order)</source>
        <translation>Artikel (in Codierreihenfolge)</translation>
    </message>
</context>
<context>
    <name>fourfold::ReportOptionsDialog</name>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="22"/>
        <source>Reliability report</source>
        <translation>Reliabilitätsbericht</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="26"/>
        <source>Paragraph</source>
        <translation>Absatz</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="27"/>
        <source>Sentence</source>
        <translation>Satz</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="28"/>
        <source>Token (word)</source>
        <translation>Token (Wort)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="30"/>
        <source>&amp;Unit of the functions</source>
        <translation>&amp;Einheit der Funktionen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="33"/>
        <source>All phases</source>
        <translation>Alle Phasen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="36"/>
        <source>&amp;Phase</source>
        <translation>&amp;Phase</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="54"/>
        <source>&amp;Coders</source>
        <translation>&amp;Codierer</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="60"/>
        <source>none</source>
        <translation>keine</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="61"/>
        <source> replicates</source>
        <translation> Replikationen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="62"/>
        <source>&amp;Bootstrap</source>
        <translation>&amp;Bootstrap</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="66"/>
        <source>S&amp;eed</source>
        <translation>S&amp;eed</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="68"/>
        <source>Count articles in progress</source>
        <translation>Artikel in Bearbeitung mitzählen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="69"/>
        <source>By default a coder&apos;s article counts only once the coder has marked it done; tick to count articles still in progress too.</source>
        <translation>Standardmäßig zählt ein Artikel eines Codierers erst, wenn er ihn als fertig markiert hat; ankreuzen, um auch Artikel in Bearbeitung mitzuzählen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="74"/>
        <source>Reliability report: %1</source>
        <translation>Reliabilitätsbericht: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="75"/>
        <source>&amp;Title</source>
        <translation>&amp;Titel</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="78"/>
        <source>&amp;Write…</source>
        <translation>&amp;Schreiben…</translation>
    </message>
</context>
<context>
    <name>fourfold::RunErrorModel</name>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="75"/>
        <source>Correct</source>
        <translation>Korrekt</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="77"/>
        <source>False positive</source>
        <translation>Falsch positiv</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="79"/>
        <source>Miss</source>
        <translation>Verfehlt</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="81"/>
        <source>Wrong function</source>
        <translation>Falsche Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="83"/>
        <source>Boundary</source>
        <translation>Grenze</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="106"/>
        <source>%1 [%2, %3) “%4”</source>
        <translation>%1 [%2, %3) „%4“</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="117"/>
        <source>%1 → %2</source>
        <translation>%1 → %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="125"/>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="127"/>
        <source>—</source>
        <translation>—</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="152"/>
        <source>Function</source>
        <translation>Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="154"/>
        <source>Kind</source>
        <translation>Art</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="156"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="159"/>
        <source>Span of %1</source>
        <translation>Textstelle von %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="160"/>
        <source>Gold span</source>
        <translation>Goldstandard-Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="162"/>
        <source>Run span</source>
        <translation>Textstelle des Laufs</translation>
    </message>
</context>
<context>
    <name>fourfold::RunPassageWindow</name>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="25"/>
        <source>Passage</source>
        <translation>Passage</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="31"/>
        <source>◀ &amp;Previous error</source>
        <translation>◀ &amp;Vorheriger Fehler</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="34"/>
        <source>&amp;Next error ▶</source>
        <translation>&amp;Nächster Fehler ▶</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="73"/>
        <source>%1 — %2 against %3</source>
        <translation>%1 — %2 gegen %3</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="75"/>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="160"/>
        <source>gold</source>
        <translation>Goldstandard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="96"/>
        <source>Gold</source>
        <translation>Goldstandard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="97"/>
        <source>Coder %1</source>
        <translation>Codierende %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="100"/>
        <source>Run %1</source>
        <translation>Lauf %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="147"/>
        <source>No error of the run on this article.</source>
        <translation>Kein Fehler des Laufs in diesem Artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="161"/>
        <source>coder %1</source>
        <translation>Codierende %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="170"/>
        <source>&lt;b&gt;False positive.&lt;/b&gt; The run marks “%1” as %2; %3 has no span there.</source>
        <translation>&lt;b&gt;Falsch positiv.&lt;/b&gt; Der Lauf markiert „%1“ als %2; %3 hat dort keine Textstelle.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="173"/>
        <source>&lt;b&gt;Miss.&lt;/b&gt; %1 marks “%2” as %3; the run has no span there.</source>
        <translation>&lt;b&gt;Verfehlt.&lt;/b&gt; %1 markiert „%2“ als %3; der Lauf hat dort keine Textstelle.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="177"/>
        <source>&lt;b&gt;Wrong function.&lt;/b&gt; %1 marks “%2” as %3; the run marks “%4” as %5.</source>
        <translation>&lt;b&gt;Falsche Funktion.&lt;/b&gt; %1 markiert „%2“ als %3; der Lauf markiert „%4“ als %5.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="186"/>
        <source>at the same place</source>
        <translation>an derselben Stelle</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="187"/>
        <source>%n character(s) earlier</source>
        <translation>
            <numerusform>%n Zeichen früher</numerusform>
            <numerusform>%n Zeichen früher</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="188"/>
        <source>%n character(s) later</source>
        <translation>
            <numerusform>%n Zeichen später</numerusform>
            <numerusform>%n Zeichen später</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="193"/>
        <source>&lt;b&gt;Boundary.&lt;/b&gt; Both mark %1 here. Compared with the span of %2, the run&apos;s starts %3 and ends %4.&lt;br&gt;%5: “%6” %7&lt;br&gt;Run: “%8” %9</source>
        <translation>&lt;b&gt;Grenze.&lt;/b&gt; Beide markieren hier %1. Verglichen mit der Textstelle von %2 beginnt die des Laufs %3 und endet %4.&lt;br&gt;%5: „%6“ %7&lt;br&gt;Lauf: „%8“ %9</translation>
    </message>
</context>
<context>
    <name>fourfold::SpanEditor</name>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="90"/>
        <source>judges</source>
        <translation>bewertet</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="90"/>
        <source>judged by</source>
        <translation>bewertet von</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="92"/>
        <source>addresses</source>
        <translation>behandelt</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="92"/>
        <source>addressed by</source>
        <translation>behandelt von</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="93"/>
        <source>%1 →</source>
        <translation>%1 →</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="93"/>
        <source>← %1</source>
        <translation>← %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="102"/>
        <source>Span editor</source>
        <translation>Textstellen-Editor</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="108"/>
        <source>No span selected.

Click a span in the text or on the frame card to edit it, or select text and press 1–4 to code it.</source>
        <translation>Keine Textstelle ausgewählt.

Klicken Sie auf eine Textstelle im Text oder auf der Frame-Karte, um sie zu bearbeiten, oder wählen Sie Text aus und drücken Sie 1&#xa0;bis&#xa0;4, um ihn zu codieren.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="174"/>
        <source>Another coder&apos;s span: shown, not editable.</source>
        <translation>Textstelle einer anderen codierenden Person: sichtbar, nicht bearbeitbar.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="191"/>
        <source>Function: %1</source>
        <translation>Funktion: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="195"/>
        <source>&amp;Function:</source>
        <translation>&amp;Funktion:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="202"/>
        <source>Note</source>
        <translation>Notiz</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="206"/>
        <source>&amp;Note:</source>
        <translation>&amp;Notiz:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="211"/>
        <source>Confidence</source>
        <translation>Sicherheit</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="215"/>
        <location filename="../app/desktop/span_editor.cpp" line="362"/>
        <location filename="../app/desktop/span_editor.cpp" line="370"/>
        <source>not set</source>
        <translation>nicht angegeben</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="218"/>
        <source>How sure you are of this span, from 0 (a guess) to 1 (certain).</source>
        <translation>Wie sicher Sie sich bei dieser Textstelle sind, von 0 (geraten) bis 1 (sicher).</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="219"/>
        <source>&amp;Confidence:</source>
        <translation>&amp;Sicherheit:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="228"/>
        <source>Links</source>
        <translation>Verknüpfungen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="230"/>
        <source>Links start from an evaluation (to the cause it judges) or from a remedy (to the problem it addresses).</source>
        <translation>Verknüpfungen gehen von einer Bewertung (zur bewerteten Ursache) oder von einer Lösung (zum behandelten Problem) aus.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="240"/>
        <source>Span to link to</source>
        <translation>Zu verknüpfende Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="244"/>
        <source>&amp;Link</source>
        <translation>&amp;Verknüpfen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="245"/>
        <source>Link to the chosen span</source>
        <translation>Mit der gewählten Textstelle verknüpfen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="257"/>
        <source>Links of this span</source>
        <translation>Verknüpfungen dieser Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="265"/>
        <source>No links yet.</source>
        <translation>Noch keine Verknüpfungen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="268"/>
        <source>&amp;Remove link</source>
        <translation>Verknüpfung &amp;entfernen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="269"/>
        <source>Remove the chosen link</source>
        <translation>Die gewählte Verknüpfung entfernen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="377"/>
        <source>%1:</source>
        <translation>%1:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="417"/>
        <source>No note.</source>
        <translation>Keine Notiz.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="417"/>
        <source>Why this span, doubts, a question for the lead…</source>
        <translation>Warum diese Textstelle, Zweifel, eine Frage an die Leitung…</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="435"/>
        <source>&amp;Judges:</source>
        <translation>Be&amp;wertet:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="435"/>
        <source>&amp;Addresses:</source>
        <translation>Behan&amp;delt:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="437"/>
        <source>no cause span to link</source>
        <translation>keine Ursachen-Textstelle zum Verknüpfen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="437"/>
        <source>no problem span to link</source>
        <translation>keine Problem-Textstelle zum Verknüpfen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="467"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="483"/>
        <source>a span not shown here</source>
        <translation>eine hier nicht angezeigte Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="484"/>
        <source>%1 %2</source>
        <translation>%1 %2</translation>
    </message>
</context>
<context>
    <name>fourfold::StudyDesignWindow</name>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="111"/>
        <source>Study design — %1</source>
        <translation>Studiendesign — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="113"/>
        <source>Plan who codes what: draw the reliability sample that every reliability coder codes, deal the rest of the articles, and keep the codebook&apos;s versions in view. Nothing is written until you commit a plan.</source>
        <translation>Planen Sie, wer was codiert: Ziehen Sie die Reliabilitätsstichprobe, die alle Reliabilitätscodierenden codieren, verteilen Sie die übrigen Artikel und behalten Sie die Versionen des Codebuchs im Blick. Gespeichert wird erst, wenn Sie einen Plan festschreiben.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="122"/>
        <source>Reliability sample</source>
        <translation>Reliabilitätsstichprobe</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="123"/>
        <source>Assign the rest</source>
        <translation>Rest zuweisen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="124"/>
        <source>Assignments</source>
        <translation>Zuweisungen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="125"/>
        <source>Codebook versions</source>
        <translation>Codebuchversionen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="160"/>
        <source>lead</source>
        <translation>Leitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="160"/>
        <source>coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="190"/>
        <source>The seed must be a whole number from 0 to 18446744073709551615; &quot;%1&quot; is not.</source>
        <translation>Der Seed muss eine ganze Zahl von 0 bis 18446744073709551615 sein; „%1“ ist das nicht.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="210"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="308"/>
        <source>Draw</source>
        <translation>Ziehen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="216"/>
        <source>A pilot sample is coded before the codebook is final and is not part of the reliability sample.</source>
        <translation>Eine Pilotstichprobe wird codiert, bevor das Codebuch endgültig ist, und gehört nicht zur Reliabilitätsstichprobe.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="218"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="739"/>
        <source>Phase:</source>
        <translation>Phase:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="223"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="741"/>
        <source>Articles:</source>
        <translation>Artikel:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="225"/>
        <source>Share of the frame:</source>
        <translation>Anteil der Auswahlgesamtheit:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="245"/>
        <source>Size:</source>
        <translation>Umfang:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="249"/>
        <source>Simple random sample</source>
        <translation>Einfache Zufallsstichprobe</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="250"/>
        <source>Stratified by outlet</source>
        <translation>Geschichtet nach Medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="251"/>
        <source>Stratified by language</source>
        <translation>Geschichtet nach Sprache</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="252"/>
        <source>Stratified by topic</source>
        <translation>Geschichtet nach Thema</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="253"/>
        <source>Stratified draws allocate the sample to each group in proportion to its size in the frame.</source>
        <translation>Geschichtete Ziehungen teilen die Stichprobe jeder Gruppe proportional zu ihrer Größe in der Auswahlgesamtheit zu.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="255"/>
        <source>Method:</source>
        <translation>Methode:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="262"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="580"/>
        <source>Seed</source>
        <translation>Seed</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="264"/>
        <source>New seed</source>
        <translation>Neuer Seed</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="269"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="582"/>
        <source>Seed:</source>
        <translation>Seed:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="270"/>
        <source>The seed is recorded with the draw: the same seed on the same project draws the same articles on any computer.</source>
        <translation>Der Seed wird mit der Ziehung gespeichert: Derselbe Seed zieht im selben Projekt auf jedem Computer dieselben Artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="276"/>
        <source>Reliability coders</source>
        <translation>Reliabilitätscodierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="278"/>
        <source>Coded by all of:</source>
        <translation>Codiert von allen:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="280"/>
        <source>Minimum sample (Krippendorff)</source>
        <translation>Mindeststichprobe (Krippendorff)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="288"/>
        <source>The smallest alpha you would still accept: .800 for firm conclusions, .667 for tentative ones (Krippendorff).</source>
        <translation>Das kleinste Alpha, das Sie noch akzeptieren würden: .800 für belastbare Schlüsse, .667 für vorläufige (Krippendorff).</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="290"/>
        <source>α_min:</source>
        <translation>α_min:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="295"/>
        <source>Significance level:</source>
        <translation>Signifikanzniveau:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="302"/>
        <source>The expected share of the rarest value: 0.25 when four values are equally frequent.</source>
        <translation>Der erwartete Anteil des seltensten Werts: 0.25, wenn vier Werte gleich häufig sind.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="304"/>
        <source>Rarest value&apos;s share:</source>
        <translation>Anteil seltenster Wert:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="310"/>
        <source>Draw the sample and show it; nothing is written yet.</source>
        <translation>Stichprobe ziehen und anzeigen; noch wird nichts gespeichert.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="311"/>
        <source>Commit the draw</source>
        <translation>Ziehung festschreiben</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="313"/>
        <source>Assign the drawn articles to every chosen coder and record the draw with its seed.</source>
        <translation>Die gezogenen Artikel allen gewählten Codierenden zuweisen und die Ziehung mit ihrem Seed speichern.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="342"/>
        <source>Stratum</source>
        <translation>Schicht</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="342"/>
        <source>In the frame</source>
        <translation>In der Auswahlgesamtheit</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="342"/>
        <source>Drawn</source>
        <translation>Gezogen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="344"/>
        <source>Drawn articles:</source>
        <translation>Gezogene Artikel:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="347"/>
        <source>Drawn articles</source>
        <translation>Gezogene Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="401"/>
        <source>&lt;b&gt;No sample is drawn yet for the phase %1.&lt;/b&gt; Choose the size, method, seed and coders, then press &lt;i&gt;Draw&lt;/i&gt; to see the sample and whether it is large enough.</source>
        <translation>&lt;b&gt;Für die Phase %1 ist noch keine Stichprobe gezogen.&lt;/b&gt; Wählen Sie Umfang, Methode, Seed und Codierende und drücken Sie dann &lt;i&gt;Ziehen&lt;/i&gt;, um die Stichprobe zu sehen und ob sie groß genug ist.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="460"/>
        <source>simple random sample</source>
        <translation>einfache Zufallsstichprobe</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="462"/>
        <source>stratified by outlet</source>
        <translation>geschichtet nach Medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="464"/>
        <source>stratified by language</source>
        <translation>geschichtet nach Sprache</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="466"/>
        <source>stratified by topic</source>
        <translation>geschichtet nach Thema</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/study_design_window.cpp" line="467"/>
        <source>%n article(s) of a frame of %1, %2, seed %3, coded by %4.</source>
        <translation>
            <numerusform>%n Artikel aus einer Auswahlgesamtheit von %1, %2, Seed %3, codiert von %4.</numerusform>
            <numerusform>%n Artikel aus einer Auswahlgesamtheit von %1, %2, Seed %3, codiert von %4.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="475"/>
        <source>&lt;b&gt;%1 sample drawn on %2.&lt;/b&gt; %3 The draw is recorded and cannot be drawn again.</source>
        <translation>&lt;b&gt;Stichprobe der Phase %1 gezogen am %2.&lt;/b&gt; %3 Die Ziehung ist gespeichert und kann nicht erneut gezogen werden.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="481"/>
        <source>&lt;b&gt;Planned draw, not yet committed.&lt;/b&gt; %1 Press &lt;i&gt;Commit the draw&lt;/i&gt; to assign it.</source>
        <translation>&lt;b&gt;Geplante Ziehung, noch nicht festgeschrieben.&lt;/b&gt; %1 Drücken Sie &lt;i&gt;Ziehung festschreiben&lt;/i&gt;, um sie zuzuweisen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="490"/>
        <source>No minimum sample can be computed for these settings.</source>
        <translation>Für diese Einstellungen lässt sich keine Mindeststichprobe berechnen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="492"/>
        <source>&lt;b&gt;Krippendorff&apos;s minimum: %1 values&lt;/b&gt; per variable for α_min = %2 at p = %3, with the rarest value at %4 %.</source>
        <translation>&lt;b&gt;Krippendorffs Minimum: %1 Werte&lt;/b&gt; je Variable für α_min = %2 bei p = %3, mit dem seltensten Wert bei %4 %.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="501"/>
        <source>Unit</source>
        <translation>Einheit</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="501"/>
        <source>Values the draw delivers</source>
        <translation>Werte aus der Ziehung</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="505"/>
        <source>✓ enough</source>
        <translation>✓ genug</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/study_design_window.cpp" line="506"/>
        <source>✗ %n short</source>
        <translation>
            <numerusform>✗ %n zu wenig</numerusform>
            <numerusform>✗ %n zu wenig</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="514"/>
        <source>Article-level items</source>
        <translation>Items auf Artikelebene</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="515"/>
        <source>Paragraphs</source>
        <translation>Absätze</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="516"/>
        <source>Sentences</source>
        <translation>Sätze</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="519"/>
        <source>Values are units × coders. For spans, count the codings of each function: a rare function (often the remedy) may need a larger or stratified sample.</source>
        <translation>Werte sind Einheiten × Codierende. Zählen Sie bei Textstellen die Codierungen jeder Funktion: Eine seltene Funktion (oft die Lösung) kann eine größere oder geschichtete Stichprobe erfordern.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="556"/>
        <source>Deal the rest</source>
        <translation>Rest verteilen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="558"/>
        <source>Every article with no assignment yet goes to production coding, shuffled with the seed and dealt in turn.</source>
        <translation>Jeder noch nicht zugewiesene Artikel geht in die Hauptcodierung, mit dem Seed gemischt und reihum verteilt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="564"/>
        <source>Single-coded: one coder per article</source>
        <translation>Einfach codiert: eine Person je Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="567"/>
        <source>Double-coded: two coders per article, pairs rotating</source>
        <translation>Doppelt codiert: zwei Personen je Artikel, wechselnde Paare</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="572"/>
        <source>Coding:</source>
        <translation>Codierung:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="575"/>
        <source>Production coders</source>
        <translation>Codierende der Hauptcodierung</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="577"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="747"/>
        <source>Coders:</source>
        <translation>Codierende:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="584"/>
        <source>Plan</source>
        <translation>Planen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="586"/>
        <source>Assign</source>
        <translation>Zuweisen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="606"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="720"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="903"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="606"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="709"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="720"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="903"/>
        <source>Coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="625"/>
        <source>Press &lt;i&gt;Plan&lt;/i&gt; to see who would code which article.</source>
        <translation>Drücken Sie &lt;i&gt;Planen&lt;/i&gt;, um zu sehen, wer welchen Artikel codieren würde.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="665"/>
        <source>Every article is assigned already: there is no rest to deal.</source>
        <translation>Jeder Artikel ist bereits zugewiesen: Es gibt keinen Rest zu verteilen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="670"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/study_design_window.cpp" line="671"/>
        <source>&lt;b&gt;Planned, not yet assigned:&lt;/b&gt; %n article(s); load per coder %1. Press &lt;i&gt;Assign&lt;/i&gt; to write the plan.</source>
        <translation>
            <numerusform>&lt;b&gt;Geplant, noch nicht zugewiesen:&lt;/b&gt; %n Artikel; Last je Person %1. Drücken Sie &lt;i&gt;Zuweisen&lt;/i&gt;, um den Plan zu speichern.</numerusform>
            <numerusform>&lt;b&gt;Geplant, noch nicht zugewiesen:&lt;/b&gt; %n Artikel; Last je Person %1. Drücken Sie &lt;i&gt;Zuweisen&lt;/i&gt;, um den Plan zu speichern.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="693"/>
        <source>The rest is assigned.</source>
        <translation>Der Rest ist zugewiesen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="708"/>
        <source>&lt;b&gt;Articles per coder and phase&lt;/b&gt; (done / assigned)</source>
        <translation>&lt;b&gt;Artikel je Person und Phase&lt;/b&gt; (erledigt / zugewiesen)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="712"/>
        <source>Total</source>
        <translation>Gesamt</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="719"/>
        <source>&lt;b&gt;Every assignment&lt;/b&gt;</source>
        <translation>&lt;b&gt;Alle Zuweisungen&lt;/b&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="720"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="903"/>
        <source>Phase</source>
        <translation>Phase</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="720"/>
        <source>Status</source>
        <translation>Status</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="729"/>
        <source>Give articles to coders</source>
        <translation>Artikel an Codierende geben</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="731"/>
        <source>Every chosen coder gets every chosen article, e.g. the training articles that the lead has master-coded.</source>
        <translation>Alle gewählten Codierenden erhalten alle gewählten Artikel, z.&#xa0;B. die Trainingsartikel, für die die Leitung eine Mastercodierung erstellt hat.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="744"/>
        <source>Articles to give</source>
        <translation>Zu vergebende Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="750"/>
        <source>Coders to give to</source>
        <translation>Empfangende Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="752"/>
        <source>Give</source>
        <translation>Vergeben</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="782"/>
        <source>done</source>
        <translation>erledigt</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="783"/>
        <source>started</source>
        <translation>begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="784"/>
        <source>not started</source>
        <translation>nicht begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="840"/>
        <source>Every chosen coder has every chosen article in this phase already.</source>
        <translation>Alle gewählten Codierenden haben alle gewählten Artikel in dieser Phase bereits.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="862"/>
        <source>Version</source>
        <translation>Version</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="862"/>
        <source>Made</source>
        <translation>Erstellt</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="862"/>
        <source>By</source>
        <translation>Von</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="862"/>
        <source>Note</source>
        <translation>Notiz</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="866"/>
        <source>Add a version from a file…</source>
        <translation>Version aus Datei hinzufügen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="868"/>
        <source>Read a codebook JSON file and store it as the next version, with a note that says what changed and why.</source>
        <translation>Eine Codebuch-JSON-Datei einlesen und als nächste Version speichern, mit einer Notiz, was sich geändert hat und warum.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="881"/>
        <source>Compare version</source>
        <translation>Version vergleichen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="883"/>
        <source>with</source>
        <translation>mit</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="891"/>
        <source>Changes between the versions</source>
        <translation>Änderungen zwischen den Versionen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="899"/>
        <source>Only those to re-check</source>
        <translation>Nur erneut zu prüfende</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="903"/>
        <source>Function</source>
        <translation>Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="903"/>
        <source>Made under</source>
        <translation>Erstellt unter</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="903"/>
        <source>Re-check</source>
        <translation>Erneut prüfen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="973"/>
        <source>yes — its function changed</source>
        <translation>ja — ihre Funktion hat sich geändert</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="973"/>
        <source>no</source>
        <translation>nein</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="983"/>
        <source>&lt;b&gt;Every annotation was made under the current version (%1).&lt;/b&gt;</source>
        <translation>&lt;b&gt;Alle Annotationen wurden unter der aktuellen Version (%1) erstellt.&lt;/b&gt;</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/study_design_window.cpp" line="984"/>
        <source>&lt;b&gt;%n annotation(s) were made under an older version&lt;/b&gt; than the current one (%1); %2 of them belong to a function whose definition, rules, examples or attributes changed since, and should be re-checked.</source>
        <translation>
            <numerusform>&lt;b&gt;%n Annotation wurde unter einer älteren Version&lt;/b&gt; als der aktuellen (%1) erstellt; %2 davon gehören zu einer Funktion, deren Definition, Regeln, Beispiele oder Merkmale sich seither geändert haben, und sollten erneut geprüft werden.</numerusform>
            <numerusform>&lt;b&gt;%n Annotationen wurden unter einer älteren Version&lt;/b&gt; als der aktuellen (%1) erstellt; %2 davon gehören zu einer Funktion, deren Definition, Regeln, Beispiele oder Merkmale sich seither geändert haben, und sollten erneut geprüft werden.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="999"/>
        <source>&lt;p&gt;There is only version %1: nothing to compare yet. Add a version when the codebook changes.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Es gibt nur Version %1: noch nichts zu vergleichen. Fügen Sie eine Version hinzu, wenn sich das Codebuch ändert.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1003"/>
        <source>&lt;p&gt;Choose two different versions to compare.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Wählen Sie zwei verschiedene Versionen zum Vergleichen.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1012"/>
        <source>Codebook version %1 → %2</source>
        <translation>Codebuchversion %1 → %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1014"/>
        <source>&lt;p&gt;No changes.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Keine Änderungen.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1022"/>
        <source>added</source>
        <translation>hinzugefügt</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1026"/>
        <source>removed</source>
        <translation>entfernt</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1030"/>
        <source>changed</source>
        <translation>geändert</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1055"/>
        <source>item removed:</source>
        <translation>Item entfernt:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1059"/>
        <source>item added:</source>
        <translation>Item hinzugefügt:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1063"/>
        <source>the order changed</source>
        <translation>die Reihenfolge hat sich geändert</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1067"/>
        <source>was:</source>
        <translation>vorher:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1070"/>
        <source>now:</source>
        <translation>jetzt:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1082"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1086"/>
        <source>Add a codebook version</source>
        <translation>Codebuchversion hinzufügen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1082"/>
        <source>Codebooks (*.json)</source>
        <translation>Codebücher (*.json)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1087"/>
        <source>What changed, and why?</source>
        <translation>Was hat sich geändert, und warum?</translation>
    </message>
</context>
<context>
    <name>fourfold::TrainingFeedbackDialog</name>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="39"/>
        <source>Training feedback — %1</source>
        <translation>Trainingsfeedback — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="47"/>
        <source>Compared per:</source>
        <translation>Verglichen je:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="50"/>
        <source>Unit</source>
        <translation>Einheit</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="51"/>
        <source>sentence</source>
        <translation>Satz</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="52"/>
        <source>paragraph</source>
        <translation>Absatz</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="53"/>
        <source>word</source>
        <translation>Wort</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="60"/>
        <source>Agreement per function</source>
        <translation>Übereinstimmung je Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="61"/>
        <source>Function</source>
        <translation>Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="61"/>
        <source>Same as the master</source>
        <translation>Wie der Master</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="61"/>
        <source>α</source>
        <translation>α</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="62"/>
        <source>You marked / master marked</source>
        <translation>Sie markiert / Master markiert</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="62"/>
        <source>What it suggests</source>
        <translation>Was es nahelegt</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="71"/>
        <source>Most units carry no function, so &quot;same as the master&quot; is high even when your spans differ; α corrects for that agreement by chance (Krippendorff). Aim for α of .800 or more.</source>
        <translation>Die meisten Einheiten tragen keine Funktion, daher ist „wie der Master“ hoch, auch wenn Ihre Textstellen abweichen; α korrigiert diese zufällige Übereinstimmung (Krippendorff). Ziel ist ein α von .800 oder mehr.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="85"/>
        <source>On to the real work</source>
        <translation>Weiter zur eigentlichen Arbeit</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="123"/>
        <source>&lt;b&gt;No feedback yet.&lt;/b&gt; %1</source>
        <translation>&lt;b&gt;Noch kein Feedback.&lt;/b&gt; %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="131"/>
        <source>&lt;b&gt;No finished training article to compare yet.&lt;/b&gt; Feedback comes once you mark a training article as done.</source>
        <translation>&lt;b&gt;Noch kein abgeschlossener Trainingsartikel zum Vergleichen.&lt;/b&gt; Feedback gibt es, sobald Sie einen Trainingsartikel als erledigt markieren.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="135"/>
        <source>&lt;b&gt;%1, your coding of %n training article(s) compared with the master coding of %2&lt;/b&gt;, %3 by %3: in how many did you and the master agree on whether the function is there?</source>
        <translation>
            <numerusform>&lt;b&gt;%1, Ihre Codierung von %n Trainingsartikel verglichen mit der Mastercodierung von %2&lt;/b&gt;, %3 für %3: In wie vielen stimmten Sie und der Master darin überein, ob die Funktion vorliegt?</numerusform>
            <numerusform>&lt;b&gt;%1, Ihre Codierung von %n Trainingsartikeln verglichen mit der Mastercodierung von %2&lt;/b&gt;, %3 für %3: In wie vielen stimmten Sie und der Master darin überein, ob die Funktion vorliegt?</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="158"/>
        <source>%1 % (%2 of %3)</source>
        <translation>%1 % (%2 von %3)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="174"/>
        <source>%1 / %2</source>
        <translation>%1 / %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="180"/>
        <source>nothing to compare</source>
        <translation>nichts zu vergleichen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="182"/>
        <source>close to the master</source>
        <translation>nah am Master</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="184"/>
        <source>you mark it more often than the master: re-read the exclusion rules</source>
        <translation>Sie markieren sie öfter als der Master: Ausschlussregeln erneut lesen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="186"/>
        <source>you miss some: re-read the definition and examples</source>
        <translation>Sie übersehen einige: Definition und Beispiele erneut lesen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="188"/>
        <source>as often, but in other places: compare your spans with the lead&apos;s</source>
        <translation>gleich oft, aber an anderen Stellen: Vergleichen Sie Ihre Textstellen mit denen der Leitung</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="195"/>
        <source>You have %n training article(s) still open. Finish them before the real work starts.</source>
        <translation>
            <numerusform>Sie haben noch %n offenen Trainingsartikel. Schließen Sie ihn ab, bevor die eigentliche Arbeit beginnt.</numerusform>
            <numerusform>Sie haben noch %n offene Trainingsartikel. Schließen Sie sie ab, bevor die eigentliche Arbeit beginnt.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="201"/>
        <source>Training is complete. Talk over the functions with low agreement with your lead, then go on to your assigned articles.</source>
        <translation>Das Training ist abgeschlossen. Besprechen Sie die Funktionen mit geringer Übereinstimmung mit der Leitung und fahren Sie dann mit Ihren zugewiesenen Artikeln fort.</translation>
    </message>
</context>
<context>
    <name>main</name>
    <message>
        <location filename="../app/desktop/main.cpp" line="27"/>
        <source>Fourfold: manual frame analysis of news and opinion articles.</source>
        <translation>Fourfold: manuelle Frame-Analyse von Nachrichten- und Meinungsartikeln.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="29"/>
        <source>Code as the coder with this pseudonym.</source>
        <translation>Unter diesem Pseudonym codieren.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="32"/>
        <source>A project file to open (*.fourfold).</source>
        <translation>Eine zu öffnende Projektdatei (*.fourfold).</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="40"/>
        <source>Cannot open project</source>
        <translation>Projekt kann nicht geöffnet werden</translation>
    </message>
</context>
</TS>
