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
    <name>fourfold::ArticleListModel</name>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="53"/>
        <source>done</source>
        <translation>erledigt</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="55"/>
        <source>in progress</source>
        <translation>in Arbeit</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="56"/>
        <source>not started</source>
        <translation>nicht begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="95"/>
        <source>Title</source>
        <translation>Titel</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="97"/>
        <source>Outlet</source>
        <translation>Medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="99"/>
        <source>Lang.</source>
        <translation>Spr.</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="103"/>
        <source>Status</source>
        <translation>Status</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="105"/>
        <source>Time</source>
        <translation>Zeit</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="101"/>
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
        <location filename="../app/desktop/coder_dialog.cpp" line="15"/>
        <source>Who is coding?</source>
        <translation>Wer codiert?</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="17"/>
        <source>&lt;b&gt;%1&lt;/b&gt;&lt;br&gt;Choose who you are. A coder sees only their own spans and the articles assigned to them; a lead sees every article.</source>
        <translation>&lt;b&gt;%1&lt;/b&gt;&lt;br&gt;Wählen Sie aus, wer Sie sind. Codierende sehen nur ihre eigenen Textstellen und die ihnen zugewiesenen Artikel; die Leitung sieht alle Artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="24"/>
        <source>Coders</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="26"/>
        <source>lead</source>
        <translation>Leitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="26"/>
        <source>coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="31"/>
        <source>Start coding</source>
        <translation>Codierung starten</translation>
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
        <location filename="../app/desktop/main_window.cpp" line="547"/>
        <source>Fourfold</source>
        <translation>Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="159"/>
        <source>Articles</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="85"/>
        <source>&lt;h1&gt;Fourfold&lt;/h1&gt;&lt;p&gt;Manual frame analysis of news and opinion articles: problem, cause, evaluation, remedy.&lt;/p&gt;</source>
        <translation>&lt;h1&gt;Fourfold&lt;/h1&gt;&lt;p&gt;Manuelle Frame-Analyse von Nachrichten- und Meinungsartikeln: Problem, Ursache, Bewertung, Lösung.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="92"/>
        <source>Open a project…</source>
        <translation>Projekt öffnen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="95"/>
        <source>Open the sample project</source>
        <translation>Beispielprojekt öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="97"/>
        <source>Invented demo data: three local controversies, three coders.</source>
        <translation>Erfundene Demodaten: drei lokale Streitfragen, drei Codierende.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="103"/>
        <location filename="../app/desktop/main_window.cpp" line="116"/>
        <source>Recent projects</source>
        <translation>Zuletzt geöffnete Projekte</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="131"/>
        <source>Search the texts…</source>
        <translation>Texte durchsuchen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="133"/>
        <source>Search articles</source>
        <translation>Artikel durchsuchen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="140"/>
        <source>Status filter</source>
        <translation>Statusfilter</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="141"/>
        <source>All articles</source>
        <translation>Alle Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="142"/>
        <source>Not started</source>
        <translation>Nicht begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="143"/>
        <source>In progress</source>
        <translation>In Arbeit</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="144"/>
        <source>Done</source>
        <translation>Erledigt</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="181"/>
        <source>Mark the selected text as %1 (key %2)</source>
        <translation>Ausgewählten Text als %1 markieren (Taste %2)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="188"/>
        <source>Mark as done</source>
        <translation>Als erledigt markieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="189"/>
        <source>Mark this article as done and open the next one (Ctrl+Return)</source>
        <translation>Diesen Artikel als erledigt markieren und den nächsten öffnen (Strg+Eingabe)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="254"/>
        <source>&amp;Project</source>
        <translation>&amp;Projekt</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="255"/>
        <source>&amp;Open…</source>
        <translation>Ö&amp;ffnen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="256"/>
        <source>Open the &amp;sample project</source>
        <translation>Bei&amp;spielprojekt öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="258"/>
        <source>&amp;Quit</source>
        <translation>&amp;Beenden</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="260"/>
        <source>&amp;Edit</source>
        <translation>&amp;Bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="261"/>
        <location filename="../app/desktop/main_window.cpp" line="366"/>
        <source>&amp;Undo</source>
        <translation>&amp;Rückgängig</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="264"/>
        <location filename="../app/desktop/main_window.cpp" line="367"/>
        <source>&amp;Redo</source>
        <translation>&amp;Wiederholen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="268"/>
        <source>&amp;Code</source>
        <translation>&amp;Codieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="271"/>
        <source>Mark as %1	%2</source>
        <translation>Als %1 markieren	%2</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="275"/>
        <source>Mark article as &amp;done</source>
        <translation>Artikel als &amp;erledigt markieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="276"/>
        <source>&amp;Next article</source>
        <translation>&amp;Nächster Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="277"/>
        <source>&amp;Find in texts</source>
        <translation>In Texten &amp;suchen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="279"/>
        <source>&amp;View</source>
        <translation>&amp;Ansicht</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="280"/>
        <source>Show &amp;every coder&apos;s spans (leads only)</source>
        <translation>Textstellen &amp;aller Codierenden zeigen (nur Leitung)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="289"/>
        <source>&amp;Settings</source>
        <translation>&amp;Einstellungen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="290"/>
        <source>&amp;Language</source>
        <translation>&amp;Sprache</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="294"/>
        <source>System language</source>
        <translation>Systemsprache</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="303"/>
        <source>&amp;Help</source>
        <translation>&amp;Hilfe</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="304"/>
        <source>&amp;Keyboard shortcuts</source>
        <translation>&amp;Tastenkürzel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="321"/>
        <source>The project has no coder &quot;%1&quot;.</source>
        <translation>Im Projekt gibt es keine Codierenden mit dem Pseudonym „%1“.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="325"/>
        <source>Nobody was chosen to code.</source>
        <translation>Es wurde niemand zum Codieren ausgewählt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="349"/>
        <source>Span</source>
        <translation>Textstelle</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="350"/>
        <source>Codebook</source>
        <translation>Codebuch</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="366"/>
        <source>&amp;Undo %1</source>
        <translation>&amp;Rückgängig: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="367"/>
        <source>&amp;Redo %1</source>
        <translation>&amp;Wiederholen: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="491"/>
        <source>Every article in the list is done.</source>
        <translation>Alle Artikel in der Liste sind erledigt.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/main_window.cpp" line="511"/>
        <source>%n article(s) contain &quot;%1&quot;.</source>
        <translation>
            <numerusform>%n Artikel enthält „%1“.</numerusform>
            <numerusform>%n Artikel enthalten „%1“.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="535"/>
        <source>The language changes when Fourfold starts again.</source>
        <translation>Die Sprache wechselt beim nächsten Start von Fourfold.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="548"/>
        <source>No project open</source>
        <translation>Kein Projekt geöffnet</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="552"/>
        <source>lead</source>
        <translation>Leitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="552"/>
        <source>coder</source>
        <translation>Codierende</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="553"/>
        <source>%1 — coding as %2 (%3) — Fourfold</source>
        <translation>%1 — Codieren als %2 (%3) — Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="554"/>
        <source>Coding as %1 · %2 · lead: every article</source>
        <translation>Codieren als %1 · %2 · Leitung: alle Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="555"/>
        <source>Coding as %1 · %2 · blind: only your own spans</source>
        <translation>Codieren als %1 · %2 · blind: nur eigene Textstellen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="565"/>
        <source>Mark the selected text as %1 (snapped to whole words; hold Alt for the exact selection); with a span selected: relabel it</source>
        <translation>Ausgewählten Text als %1 markieren (auf ganze Wörter erweitert; Alt gedrückt halten für die genaue Auswahl); bei ausgewählter Textstelle: deren Funktion ändern</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="568"/>
        <source>Delete</source>
        <translation>Entf</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="568"/>
        <source>Delete the selected span</source>
        <translation>Ausgewählte Textstelle löschen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="569"/>
        <source>Undo the last change</source>
        <translation>Letzte Änderung rückgängig machen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="570"/>
        <source>Redo</source>
        <translation>Wiederholen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="571"/>
        <source>Mark the article as done and open the next</source>
        <translation>Artikel als erledigt markieren und den nächsten öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="572"/>
        <source>Next article that is not done</source>
        <translation>Nächster noch nicht erledigter Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="573"/>
        <source>Search the texts</source>
        <translation>Texte durchsuchen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="575"/>
        <source>Keyboard shortcuts</source>
        <translation>Tastenkürzel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="577"/>
        <source>Span resizing keys are listed in the reading desk&apos;s tooltip.</source>
        <translation>Die Tasten zum Ändern der Länge einer Textstelle stehen im Tooltip des Lesebereichs.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="516"/>
        <source>Open project</source>
        <translation>Projekt öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="516"/>
        <source>Fourfold projects (*.fourfold)</source>
        <translation>Fourfold-Projekte (*.fourfold)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="109"/>
        <location filename="../app/desktop/main_window.cpp" line="520"/>
        <location filename="../app/desktop/main_window.cpp" line="529"/>
        <source>Cannot open project</source>
        <translation>Projekt kann nicht geöffnet werden</translation>
    </message>
</context>
<context>
    <name>fourfold::ReadingView</name>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="83"/>
        <source>intro</source>
        <translation>Einleitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="85"/>
        <source>body</source>
        <translation>Hauptteil</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="87"/>
        <source>conclusion</source>
        <translation>Schluss</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="112"/>
        <source>Article text</source>
        <translation>Artikeltext</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="655"/>
        <source>Mark as %1</source>
        <translation>Als %1 markieren</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="656"/>
        <source>Change to %1</source>
        <translation>In %1 ändern</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="661"/>
        <source>Delete span</source>
        <translation>Textstelle löschen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="687"/>
        <source>%1: “%2”</source>
        <translation>%1: „%2“</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/reading_view.cpp" line="884"/>
        <source>%n span(s). Select text and press 1 to 4 to mark a framing function; Alt+Down and Alt+Up move between spans.</source>
        <translation>
            <numerusform>%n Textstelle. Wählen Sie Text aus und drücken Sie 1 bis 4, um eine Framing-Funktion zu markieren; Alt+Pfeil nach unten und Alt+Pfeil nach oben wechseln zwischen Textstellen.</numerusform>
            <numerusform>%n Textstellen. Wählen Sie Text aus und drücken Sie 1 bis 4, um eine Framing-Funktion zu markieren; Alt+Pfeil nach unten und Alt+Pfeil nach oben wechseln zwischen Textstellen.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="893"/>
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

Klicken Sie auf eine Textstelle im Text oder auf der Frame-Karte, um sie zu bearbeiten, oder wählen Sie Text aus und drücken Sie 1 bis 4, um ihn zu codieren.</translation>
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
