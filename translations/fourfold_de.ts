<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="de">
<context>
    <name>FunctionStyle</name>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="28"/>
        <source>Problem</source>
        <translation>Problem</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="30"/>
        <source>Cause</source>
        <translation>Ursache</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="32"/>
        <source>Evaluation</source>
        <translation>Bewertung</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="34"/>
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
    <name>fourfold::ArticleListModel</name>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="52"/>
        <source>done</source>
        <translation>erledigt</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="54"/>
        <source>in progress</source>
        <translation>in Arbeit</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="55"/>
        <source>not started</source>
        <translation>nicht begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="97"/>
        <source>Title</source>
        <translation>Titel</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="99"/>
        <source>Outlet</source>
        <translation>Medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="101"/>
        <source>Lang.</source>
        <translation>Spr.</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="105"/>
        <source>Status</source>
        <translation>Status</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="107"/>
        <source>Time</source>
        <translation>Zeit</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="103"/>
        <source>Characters</source>
        <translation>Zeichen</translation>
    </message>
</context>
<context>
    <name>fourfold::CodebookPanel</name>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="34"/>
        <source>nominal</source>
        <translation>nominalskaliert</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="36"/>
        <source>ordinal</source>
        <translation>ordinalskaliert</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="38"/>
        <source>interval</source>
        <translation>intervallskaliert</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="40"/>
        <source>ratio</source>
        <translation>verhältnisskaliert</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="68"/>
        <source>Codebook</source>
        <translation>Codebuch</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="70"/>
        <source>Framing function</source>
        <translation>Framing-Funktion</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="76"/>
        <source>Codebook entry</source>
        <translation>Codebucheintrag</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="118"/>
        <source>No codebook loaded.</source>
        <translation>Kein Codebuch geladen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="131"/>
        <source>%1, version %2</source>
        <translation>%1, Version %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="139"/>
        <source>Decision rules</source>
        <translation>Entscheidungsregeln</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="146"/>
        <source>Examples</source>
        <translation>Beispiele</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="151"/>
        <source>Attributes</source>
        <translation>Merkmale</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="154"/>
        <source>None: marking the span is all this function asks for.</source>
        <translation>Keine: Für diese Funktion genügt es, die Textstelle zu markieren.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="159"/>
        <source>free text</source>
        <translation>Freitext</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="160"/>
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
    <name>fourfold::FrameCard</name>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="174"/>
        <source>Frame card</source>
        <translation>Frame-Karte</translation>
    </message>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="221"/>
        <source>— nothing coded yet</source>
        <translation>— noch nichts codiert</translation>
    </message>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="275"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frame_card.cpp" line="291"/>
        <source>%n span(s)</source>
        <translation>
            <numerusform>%n Textstelle</numerusform>
            <numerusform>%n Textstellen</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frame_card.cpp" line="293"/>
        <source>%1: %n span(s)</source>
        <translation>
            <numerusform>%1: %n Textstelle</numerusform>
            <numerusform>%1: %n Textstellen</numerusform>
        </translation>
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
    <name>fourfold::MainWindow</name>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="645"/>
        <source>Fourfold</source>
        <translation>Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="168"/>
        <source>Articles</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="89"/>
        <source>&lt;h1&gt;Fourfold&lt;/h1&gt;&lt;p&gt;Manual frame analysis of news and opinion articles: problem, cause, evaluation, remedy.&lt;/p&gt;</source>
        <translation>&lt;h1&gt;Fourfold&lt;/h1&gt;&lt;p&gt;Manuelle Frame-Analyse von Nachrichten- und Meinungsartikeln: Problem, Ursache, Bewertung, Lösung.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="96"/>
        <source>Open a project…</source>
        <translation>Projekt öffnen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="99"/>
        <source>Open the sample project</source>
        <translation>Beispielprojekt öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="101"/>
        <source>Invented demo data: three local controversies, three coders.</source>
        <translation>Erfundene Demodaten: drei lokale Streitfragen, drei Codierende.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="107"/>
        <location filename="../app/desktop/main_window.cpp" line="120"/>
        <source>Recent projects</source>
        <translation>Zuletzt geöffnete Projekte</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="139"/>
        <source>Search the texts…</source>
        <translation>Texte durchsuchen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="141"/>
        <source>Search articles</source>
        <translation>Artikel durchsuchen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="148"/>
        <source>Status filter</source>
        <translation>Statusfilter</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="149"/>
        <source>All articles</source>
        <translation>Alle Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="150"/>
        <source>Not started</source>
        <translation>Nicht begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="151"/>
        <source>In progress</source>
        <translation>In Arbeit</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="152"/>
        <source>Done</source>
        <translation>Erledigt</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="210"/>
        <source>Mark the selected text as %1 (key %2)</source>
        <translation>Ausgewählten Text als %1 markieren (Taste %2)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="221"/>
        <source>Mark as done</source>
        <translation>Als erledigt markieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="222"/>
        <source>Mark this article as done and open the next one (Ctrl+Return)</source>
        <translation>Diesen Artikel als erledigt markieren und den nächsten öffnen (Strg+Eingabe)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="290"/>
        <source>&amp;Project</source>
        <translation>&amp;Projekt</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="291"/>
        <source>&amp;New project…</source>
        <translation>&amp;Neues Projekt…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="292"/>
        <source>&amp;Open…</source>
        <translation>Ö&amp;ffnen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="293"/>
        <source>&amp;Import articles…</source>
        <translation>Artikel &amp;importieren…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="295"/>
        <source>Open the &amp;sample project</source>
        <translation>Bei&amp;spielprojekt öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="297"/>
        <source>&amp;Quit</source>
        <translation>&amp;Beenden</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="299"/>
        <source>&amp;Edit</source>
        <translation>&amp;Bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="300"/>
        <location filename="../app/desktop/main_window.cpp" line="414"/>
        <source>&amp;Undo</source>
        <translation>&amp;Rückgängig</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="303"/>
        <location filename="../app/desktop/main_window.cpp" line="417"/>
        <source>&amp;Redo</source>
        <translation>&amp;Wiederholen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="307"/>
        <source>&amp;Code</source>
        <translation>&amp;Codieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="311"/>
        <source>Mark as %1	%2</source>
        <translation>Als %1 markieren	%2</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="315"/>
        <source>Mark article as &amp;done</source>
        <translation>Artikel als &amp;erledigt markieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="317"/>
        <source>&amp;Next article</source>
        <translation>&amp;Nächster Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="320"/>
        <source>&amp;Find in texts</source>
        <translation>In Texten &amp;suchen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="322"/>
        <source>&amp;View</source>
        <translation>&amp;Ansicht</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="323"/>
        <source>Show &amp;every coder&apos;s spans (leads only)</source>
        <translation>Textstellen &amp;aller Codierenden zeigen (nur Leitung)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="332"/>
        <source>&amp;Settings</source>
        <translation>&amp;Einstellungen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="333"/>
        <source>&amp;Language</source>
        <translation>&amp;Sprache</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="338"/>
        <source>System language</source>
        <translation>Systemsprache</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="349"/>
        <source>&amp;Help</source>
        <translation>&amp;Hilfe</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="351"/>
        <source>&amp;Keyboard shortcuts</source>
        <translation>&amp;Tastenkürzel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="368"/>
        <source>The project has no coder &quot;%1&quot;.</source>
        <translation>Im Projekt gibt es keine Codierenden mit dem Pseudonym „%1“.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="372"/>
        <source>Nobody was chosen to code.</source>
        <translation>Es wurde niemand zum Codieren ausgewählt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="396"/>
        <source>Span</source>
        <translation>Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="397"/>
        <source>Codebook</source>
        <translation>Codebuch</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="414"/>
        <source>&amp;Undo %1</source>
        <translation>&amp;Rückgängig: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="417"/>
        <source>&amp;Redo %1</source>
        <translation>&amp;Wiederholen: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="552"/>
        <source>Every article in the list is done.</source>
        <translation>Alle Artikel in der Liste sind erledigt.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/main_window.cpp" line="574"/>
        <source>%n article(s) contain &quot;%1&quot;.</source>
        <translation>
            <numerusform>%n Artikel enthält „%1“.</numerusform>
            <numerusform>%n Artikel enthalten „%1“.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="580"/>
        <source>New project</source>
        <translation>Neues Projekt</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="590"/>
        <source>Cannot create project</source>
        <translation>Projekt kann nicht erstellt werden</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="602"/>
        <source>Import articles</source>
        <translation>Artikel importieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="603"/>
        <source>Articles (*.txt *.text *.html *.htm *.jsonl *.ndjson *.csv)</source>
        <translation>Artikel (*.txt *.text *.html *.htm *.jsonl *.ndjson *.csv)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="633"/>
        <source>The language changes when Fourfold starts again.</source>
        <translation>Die Sprache wechselt beim nächsten Start von Fourfold.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="646"/>
        <source>No project open</source>
        <translation>Kein Projekt geöffnet</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="650"/>
        <source>lead</source>
        <translation>Leitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="650"/>
        <source>coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="651"/>
        <source>%1 — coding as %2 (%3) — Fourfold</source>
        <translation>%1 — Codieren als %2 (%3) — Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="654"/>
        <source>Coding as %1 · %2 · lead: every article</source>
        <translation>Codieren als %1 · %2 · Leitung: alle Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="655"/>
        <source>Coding as %1 · %2 · blind: only your own spans</source>
        <translation>Codieren als %1 · %2 · blind: nur eigene Textstellen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="667"/>
        <source>Mark the selected text as %1 (snapped to whole words; hold Alt for the exact selection); with a span selected: relabel it</source>
        <translation>Ausgewählten Text als %1 markieren (auf ganze Wörter erweitert; Alt gedrückt halten für die genaue Auswahl); bei ausgewählter Textstelle: deren Funktion ändern</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="671"/>
        <source>Delete</source>
        <translation>Entf</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="671"/>
        <source>Delete the selected span</source>
        <translation>Ausgewählte Textstelle löschen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="673"/>
        <source>Undo the last change</source>
        <translation>Letzte Änderung rückgängig machen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="674"/>
        <source>Redo</source>
        <translation>Wiederholen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="675"/>
        <source>Mark the article as done and open the next</source>
        <translation>Artikel als erledigt markieren und den nächsten öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="676"/>
        <source>Next article that is not done</source>
        <translation>Nächster noch nicht erledigter Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="678"/>
        <source>Search the texts</source>
        <translation>Texte durchsuchen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="680"/>
        <source>Keyboard shortcuts</source>
        <translation>Tastenkürzel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="683"/>
        <source>Span resizing keys are listed in the reading desk&apos;s tooltip.</source>
        <translation>Die Tasten zum Ändern der Länge einer Textstelle stehen im Tooltip des Lesebereichs.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="614"/>
        <source>Open project</source>
        <translation>Projekt öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="580"/>
        <location filename="../app/desktop/main_window.cpp" line="614"/>
        <source>Fourfold projects (*.fourfold)</source>
        <translation>Fourfold-Projekte (*.fourfold)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="114"/>
        <location filename="../app/desktop/main_window.cpp" line="595"/>
        <location filename="../app/desktop/main_window.cpp" line="618"/>
        <location filename="../app/desktop/main_window.cpp" line="627"/>
        <source>Cannot open project</source>
        <translation>Projekt kann nicht geöffnet werden</translation>
    </message>
</context>
<context>
    <name>fourfold::ReadingView</name>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="84"/>
        <source>intro</source>
        <translation>Einleitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="86"/>
        <source>body</source>
        <translation>Hauptteil</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="88"/>
        <source>conclusion</source>
        <translation>Schluss</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="113"/>
        <source>Article text</source>
        <translation>Artikeltext</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="657"/>
        <source>Mark as %1</source>
        <translation>Als %1 markieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="658"/>
        <source>Change to %1</source>
        <translation>In %1 ändern</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="663"/>
        <source>Delete span</source>
        <translation>Textstelle löschen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="689"/>
        <source>%1: “%2”</source>
        <translation>%1: „%2“</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/reading_view.cpp" line="918"/>
        <source>%n span(s). Select text and press 1 to 4 to mark a framing function; Alt+Down and Alt+Up move between spans.</source>
        <translation>
            <numerusform>%n Textstelle. Wählen Sie Text aus und drücken Sie 1 bis 4, um eine Framing-Funktion zu markieren; Alt+Pfeil nach unten und Alt+Pfeil nach oben wechseln zwischen Textstellen.</numerusform>
            <numerusform>%n Textstellen. Wählen Sie Text aus und drücken Sie 1 bis 4, um eine Framing-Funktion zu markieren; Alt+Pfeil nach unten und Alt+Pfeil nach oben wechseln zwischen Textstellen.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="927"/>
        <source>Selected span: %1, “%2”. Press 1 to 4 to relabel, Delete to delete, Alt+Left/Right and Alt+Shift+Left/Right to resize.</source>
        <translation>Ausgewählte Textstelle: %1, „%2“. 1 bis 4 ändert die Funktion, Entf löscht, Alt+Links/Rechts und Alt+Umschalt+Links/Rechts ändern die Länge.</translation>
    </message>
</context>
<context>
    <name>fourfold::SpanEditor</name>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="102"/>
        <source>judges</source>
        <translation>bewertet</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="102"/>
        <source>judged by</source>
        <translation>bewertet von</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="104"/>
        <source>addresses</source>
        <translation>behandelt</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="104"/>
        <source>addressed by</source>
        <translation>behandelt von</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="105"/>
        <source>%1 →</source>
        <translation>%1 →</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="105"/>
        <source>← %1</source>
        <translation>← %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="114"/>
        <source>Span editor</source>
        <translation>Textstellen-Editor</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="120"/>
        <source>No span selected.

Click a span in the text or on the frame card to edit it, or select text and press 1–4 to code it.</source>
        <translation>Keine Textstelle ausgewählt.

Klicken Sie auf eine Textstelle im Text oder auf der Frame-Karte, um sie zu bearbeiten, oder wählen Sie Text aus und drücken Sie 1&#xa0;bis&#xa0;4, um ihn zu codieren.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="182"/>
        <source>Another coder&apos;s span: shown, not editable.</source>
        <translation>Textstelle einer anderen codierenden Person: sichtbar, nicht bearbeitbar.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="199"/>
        <source>Function: %1</source>
        <translation>Funktion: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="203"/>
        <source>&amp;Function:</source>
        <translation>&amp;Funktion:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="210"/>
        <source>Note</source>
        <translation>Notiz</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="214"/>
        <source>&amp;Note:</source>
        <translation>&amp;Notiz:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="219"/>
        <source>Confidence</source>
        <translation>Sicherheit</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="223"/>
        <location filename="../app/desktop/span_editor.cpp" line="355"/>
        <location filename="../app/desktop/span_editor.cpp" line="363"/>
        <source>not set</source>
        <translation>nicht angegeben</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="226"/>
        <source>How sure you are of this span, from 0 (a guess) to 1 (certain).</source>
        <translation>Wie sicher Sie sich bei dieser Textstelle sind, von 0 (geraten) bis 1 (sicher).</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="227"/>
        <source>&amp;Confidence:</source>
        <translation>&amp;Sicherheit:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="236"/>
        <source>Links</source>
        <translation>Verknüpfungen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="238"/>
        <source>Links start from an evaluation (to the cause it judges) or from a remedy (to the problem it addresses).</source>
        <translation>Verknüpfungen gehen von einer Bewertung (zur bewerteten Ursache) oder von einer Lösung (zum behandelten Problem) aus.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="247"/>
        <source>Span to link to</source>
        <translation>Zu verknüpfende Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="250"/>
        <source>no other spans</source>
        <translation>keine weiteren Textstellen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="252"/>
        <source>&amp;Link</source>
        <translation>&amp;Verknüpfen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="253"/>
        <source>Link to the chosen span</source>
        <translation>Mit der gewählten Textstelle verknüpfen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="265"/>
        <source>Links of this span</source>
        <translation>Verknüpfungen dieser Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="273"/>
        <source>No links yet.</source>
        <translation>Noch keine Verknüpfungen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="370"/>
        <source>%1:</source>
        <translation>%1:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="410"/>
        <source>No note.</source>
        <translation>Keine Notiz.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="410"/>
        <source>Why this span, doubts, a question for the lead…</source>
        <translation>Warum diese Textstelle, Zweifel, eine Frage an die Leitung…</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="428"/>
        <source>&amp;Judges:</source>
        <translation>Be&amp;wertet:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="428"/>
        <source>&amp;Addresses:</source>
        <translation>Behan&amp;delt:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="457"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="473"/>
        <source>a span not shown here</source>
        <translation>eine hier nicht angezeigte Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="474"/>
        <source>%1 %2</source>
        <translation>%1 %2</translation>
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
