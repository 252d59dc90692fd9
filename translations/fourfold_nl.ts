<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="nl">
<context>
    <name>FunctionStyle</name>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="28"/>
        <source>Problem</source>
        <translation>Probleem</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="30"/>
        <source>Cause</source>
        <translation>Oorzaak</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="32"/>
        <source>Evaluation</source>
        <translation>Evaluatie</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="34"/>
        <source>Remedy</source>
        <translation>Oplossing</translation>
    </message>
</context>
<context>
    <name>fourfold::ArticleListModel</name>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="53"/>
        <source>done</source>
        <translation>klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="55"/>
        <source>in progress</source>
        <translation>bezig</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="56"/>
        <source>not started</source>
        <translation>niet begonnen</translation>
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
        <translation>Taal</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="103"/>
        <source>Status</source>
        <translation>Status</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="105"/>
        <source>Time</source>
        <translation>Tijd</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="101"/>
        <source>Characters</source>
        <translation>Tekens</translation>
    </message>
</context>
<context>
    <name>fourfold::CodebookPanel</name>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="34"/>
        <source>nominal</source>
        <translation>nominaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="36"/>
        <source>ordinal</source>
        <translation>ordinaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="38"/>
        <source>interval</source>
        <translation>interval</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="40"/>
        <source>ratio</source>
        <translation>ratio</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="68"/>
        <source>Codebook</source>
        <translation>Codeboek</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="70"/>
        <source>Framing function</source>
        <translation>Framingfunctie</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="76"/>
        <source>Codebook entry</source>
        <translation>Codeboekdefinitie</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="118"/>
        <source>No codebook loaded.</source>
        <translation>Geen codeboek geladen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="131"/>
        <source>%1, version %2</source>
        <translation>%1, versie %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="139"/>
        <source>Decision rules</source>
        <translation>Beslisregels</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="146"/>
        <source>Examples</source>
        <translation>Voorbeelden</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="151"/>
        <source>Attributes</source>
        <translation>Kenmerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="154"/>
        <source>None: marking the span is all this function asks for.</source>
        <translation>Geen: voor deze functie volstaat het om het fragment te markeren.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="159"/>
        <source>free text</source>
        <translation>vrije tekst</translation>
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
        <translation>Wie codeert er?</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="17"/>
        <source>&lt;b&gt;%1&lt;/b&gt;&lt;br&gt;Choose who you are. A coder sees only their own spans and the articles assigned to them; a lead sees every article.</source>
        <translation>&lt;b&gt;%1&lt;/b&gt;&lt;br&gt;Kies wie je bent. Codeurs zien alleen hun eigen fragmenten en de artikelen die aan hen zijn toegewezen; coördinatoren zien alle artikelen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="24"/>
        <source>Coders</source>
        <translation>Codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="26"/>
        <source>lead</source>
        <translation>coördinator</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="26"/>
        <source>coder</source>
        <translation>codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="31"/>
        <source>Start coding</source>
        <translation>Beginnen met coderen</translation>
    </message>
</context>
<context>
    <name>fourfold::FrameCard</name>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="174"/>
        <source>Frame card</source>
        <translation>Framekaart</translation>
    </message>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="221"/>
        <source>— nothing coded yet</source>
        <translation>— nog niets gecodeerd</translation>
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
            <numerusform>%n fragment</numerusform>
            <numerusform>%n fragmenten</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frame_card.cpp" line="293"/>
        <source>%1: %n span(s)</source>
        <translation>
            <numerusform>%1: %n fragment</numerusform>
            <numerusform>%1: %n fragmenten</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>fourfold::ItemForm</name>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="29"/>
        <source>Article-level items</source>
        <translation>Items op artikelniveau</translation>
    </message>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="34"/>
        <source>The codebook asks no questions about the article as a whole.</source>
        <translation>Het codeboek stelt geen vragen over het artikel als geheel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="68"/>
        <source>not answered</source>
        <translation>niet beantwoord</translation>
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
        <translation>Artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="85"/>
        <source>&lt;h1&gt;Fourfold&lt;/h1&gt;&lt;p&gt;Manual frame analysis of news and opinion articles: problem, cause, evaluation, remedy.&lt;/p&gt;</source>
        <translation>&lt;h1&gt;Fourfold&lt;/h1&gt;&lt;p&gt;Handmatige frame-analyse van nieuws- en opinieartikelen: probleem, oorzaak, evaluatie, oplossing.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="92"/>
        <source>Open a project…</source>
        <translation>Project openen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="95"/>
        <source>Open the sample project</source>
        <translation>Voorbeeldproject openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="97"/>
        <source>Invented demo data: three local controversies, three coders.</source>
        <translation>Verzonnen demogegevens: drie lokale kwesties, drie codeurs.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="103"/>
        <location filename="../app/desktop/main_window.cpp" line="116"/>
        <source>Recent projects</source>
        <translation>Recente projecten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="131"/>
        <source>Search the texts…</source>
        <translation>Zoeken in de teksten…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="133"/>
        <source>Search articles</source>
        <translation>Artikelen doorzoeken</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="140"/>
        <source>Status filter</source>
        <translation>Statusfilter</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="141"/>
        <source>All articles</source>
        <translation>Alle artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="142"/>
        <source>Not started</source>
        <translation>Niet begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="143"/>
        <source>In progress</source>
        <translation>Bezig</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="144"/>
        <source>Done</source>
        <translation>Klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="181"/>
        <source>Mark the selected text as %1 (key %2)</source>
        <translation>De geselecteerde tekst markeren als %1 (toets %2)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="188"/>
        <source>Mark as done</source>
        <translation>Markeren als klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="189"/>
        <source>Mark this article as done and open the next one (Ctrl+Return)</source>
        <translation>Dit artikel markeren als klaar en het volgende openen (Ctrl+Return)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="254"/>
        <source>&amp;Project</source>
        <translation>&amp;Project</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="255"/>
        <source>&amp;Open…</source>
        <translation>&amp;Openen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="256"/>
        <source>Open the &amp;sample project</source>
        <translation>&amp;Voorbeeldproject openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="258"/>
        <source>&amp;Quit</source>
        <translation>&amp;Afsluiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="260"/>
        <source>&amp;Edit</source>
        <translation>&amp;Bewerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="261"/>
        <location filename="../app/desktop/main_window.cpp" line="366"/>
        <source>&amp;Undo</source>
        <translation>&amp;Ongedaan maken</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="264"/>
        <location filename="../app/desktop/main_window.cpp" line="367"/>
        <source>&amp;Redo</source>
        <translation>Opn&amp;ieuw</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="268"/>
        <source>&amp;Code</source>
        <translation>&amp;Coderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="271"/>
        <source>Mark as %1	%2</source>
        <translation>Markeren als %1	%2</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="275"/>
        <source>Mark article as &amp;done</source>
        <translation>Artikel markeren als &amp;klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="276"/>
        <source>&amp;Next article</source>
        <translation>&amp;Volgend artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="277"/>
        <source>&amp;Find in texts</source>
        <translation>&amp;Zoeken in teksten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="279"/>
        <source>&amp;View</source>
        <translation>&amp;Weergave</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="280"/>
        <source>Show &amp;every coder&apos;s spans (leads only)</source>
        <translation>Fragmenten van &amp;alle codeurs tonen (alleen coördinatoren)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="289"/>
        <source>&amp;Settings</source>
        <translation>&amp;Instellingen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="290"/>
        <source>&amp;Language</source>
        <translation>&amp;Taal</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="294"/>
        <source>System language</source>
        <translation>Systeemtaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="303"/>
        <source>&amp;Help</source>
        <translation>&amp;Help</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="304"/>
        <source>&amp;Keyboard shortcuts</source>
        <translation>&amp;Sneltoetsen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="321"/>
        <source>The project has no coder &quot;%1&quot;.</source>
        <translation>Het project heeft geen codeur ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="325"/>
        <source>Nobody was chosen to code.</source>
        <translation>Er is niemand gekozen om te coderen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="349"/>
        <source>Span</source>
        <translation>Fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="350"/>
        <source>Codebook</source>
        <translation>Codeboek</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="366"/>
        <source>&amp;Undo %1</source>
        <translation>&amp;Ongedaan maken: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="367"/>
        <source>&amp;Redo %1</source>
        <translation>Opn&amp;ieuw: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="491"/>
        <source>Every article in the list is done.</source>
        <translation>Alle artikelen in de lijst zijn klaar.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/main_window.cpp" line="511"/>
        <source>%n article(s) contain &quot;%1&quot;.</source>
        <translation>
            <numerusform>%n artikel bevat ‘%1’.</numerusform>
            <numerusform>%n artikelen bevatten ‘%1’.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="535"/>
        <source>The language changes when Fourfold starts again.</source>
        <translation>De taal verandert wanneer Fourfold opnieuw wordt gestart.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="548"/>
        <source>No project open</source>
        <translation>Geen project geopend</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="552"/>
        <source>lead</source>
        <translation>coördinator</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="552"/>
        <source>coder</source>
        <translation>codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="553"/>
        <source>%1 — coding as %2 (%3) — Fourfold</source>
        <translation>%1 — coderen als %2 (%3) — Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="554"/>
        <source>Coding as %1 · %2 · lead: every article</source>
        <translation>Coderen als %1 · %2 · coördinator: alle artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="555"/>
        <source>Coding as %1 · %2 · blind: only your own spans</source>
        <translation>Coderen als %1 · %2 · blind: alleen je eigen fragmenten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="565"/>
        <source>Mark the selected text as %1 (snapped to whole words; hold Alt for the exact selection); with a span selected: relabel it</source>
        <translation>De geselecteerde tekst markeren als %1 (afgerond op hele woorden; houd Alt ingedrukt voor de exacte selectie); met een fragment geselecteerd: de functie ervan wijzigen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="568"/>
        <source>Delete</source>
        <translation>Delete</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="568"/>
        <source>Delete the selected span</source>
        <translation>Het geselecteerde fragment verwijderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="569"/>
        <source>Undo the last change</source>
        <translation>De laatste wijziging ongedaan maken</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="570"/>
        <source>Redo</source>
        <translation>Opnieuw</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="571"/>
        <source>Mark the article as done and open the next</source>
        <translation>Het artikel markeren als klaar en het volgende openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="572"/>
        <source>Next article that is not done</source>
        <translation>Volgend artikel dat nog niet klaar is</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="573"/>
        <source>Search the texts</source>
        <translation>Zoeken in de teksten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="575"/>
        <source>Keyboard shortcuts</source>
        <translation>Sneltoetsen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="577"/>
        <source>Span resizing keys are listed in the reading desk&apos;s tooltip.</source>
        <translation>De toetsen om een fragment groter of kleiner te maken staan in de tooltip van het leesvenster.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="516"/>
        <source>Open project</source>
        <translation>Project openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="516"/>
        <source>Fourfold projects (*.fourfold)</source>
        <translation>Fourfold-projecten (*.fourfold)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="109"/>
        <location filename="../app/desktop/main_window.cpp" line="520"/>
        <location filename="../app/desktop/main_window.cpp" line="529"/>
        <source>Cannot open project</source>
        <translation>Project kan niet worden geopend</translation>
    </message>
</context>
<context>
    <name>fourfold::ReadingView</name>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="83"/>
        <source>intro</source>
        <translation>inleiding</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="85"/>
        <source>body</source>
        <translation>kern</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="87"/>
        <source>conclusion</source>
        <translation>slot</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="112"/>
        <source>Article text</source>
        <translation>Artikeltekst</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="655"/>
        <source>Mark as %1</source>
        <translation>Markeren als %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="656"/>
        <source>Change to %1</source>
        <translation>Wijzigen in %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="661"/>
        <source>Delete span</source>
        <translation>Fragment verwijderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="687"/>
        <source>%1: “%2”</source>
        <translation>%1: ‘%2’</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/reading_view.cpp" line="884"/>
        <source>%n span(s). Select text and press 1 to 4 to mark a framing function; Alt+Down and Alt+Up move between spans.</source>
        <translation>
            <numerusform>%n fragment. Selecteer tekst en druk op 1 tot en met 4 om een framingfunctie te markeren; met Alt+Pijl-omlaag en Alt+Pijl-omhoog ga je van fragment naar fragment.</numerusform>
            <numerusform>%n fragmenten. Selecteer tekst en druk op 1 tot en met 4 om een framingfunctie te markeren; met Alt+Pijl-omlaag en Alt+Pijl-omhoog ga je van fragment naar fragment.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="893"/>
        <source>Selected span: %1, “%2”. Press 1 to 4 to relabel, Delete to delete, Alt+Left/Right and Alt+Shift+Left/Right to resize.</source>
        <translation>Geselecteerd fragment: %1, ‘%2’. Druk op 1 tot en met 4 om de functie te wijzigen, op Delete om het te verwijderen, en op Alt+Links/Rechts en Alt+Shift+Links/Rechts om het groter of kleiner te maken.</translation>
    </message>
</context>
<context>
    <name>fourfold::SpanEditor</name>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="102"/>
        <source>judges</source>
        <translation>beoordeelt</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="102"/>
        <source>judged by</source>
        <translation>beoordeeld door</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="104"/>
        <source>addresses</source>
        <translation>behandelt</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="104"/>
        <source>addressed by</source>
        <translation>behandeld door</translation>
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
        <translation>Fragmenteditor</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="120"/>
        <source>No span selected.

Click a span in the text or on the frame card to edit it, or select text and press 1–4 to code it.</source>
        <translation>Geen fragment geselecteerd.

Klik op een fragment in de tekst of op de framekaart om het te bewerken, of selecteer tekst en druk op 1 tot en met 4 om die te coderen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="182"/>
        <source>Another coder&apos;s span: shown, not editable.</source>
        <translation>Fragment van een andere codeur: zichtbaar, niet bewerkbaar.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="199"/>
        <source>Function: %1</source>
        <translation>Functie: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="203"/>
        <source>&amp;Function:</source>
        <translation>&amp;Functie:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="210"/>
        <source>Note</source>
        <translation>Notitie</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="214"/>
        <source>&amp;Note:</source>
        <translation>&amp;Notitie:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="219"/>
        <source>Confidence</source>
        <translation>Zekerheid</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="223"/>
        <location filename="../app/desktop/span_editor.cpp" line="355"/>
        <location filename="../app/desktop/span_editor.cpp" line="363"/>
        <source>not set</source>
        <translation>niet opgegeven</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="226"/>
        <source>How sure you are of this span, from 0 (a guess) to 1 (certain).</source>
        <translation>Hoe zeker je bent van dit fragment, van 0 (een gok) tot 1 (zeker).</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="227"/>
        <source>&amp;Confidence:</source>
        <translation>&amp;Zekerheid:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="236"/>
        <source>Links</source>
        <translation>Koppelingen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="238"/>
        <source>Links start from an evaluation (to the cause it judges) or from a remedy (to the problem it addresses).</source>
        <translation>Koppelingen beginnen bij een evaluatie (naar de oorzaak die ze beoordeelt) of bij een oplossing (naar het probleem dat ze behandelt).</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="247"/>
        <source>Span to link to</source>
        <translation>Fragment om aan te koppelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="250"/>
        <source>no other spans</source>
        <translation>geen andere fragmenten</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="252"/>
        <source>&amp;Link</source>
        <translation>&amp;Koppelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="253"/>
        <source>Link to the chosen span</source>
        <translation>Koppelen aan het gekozen fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="265"/>
        <source>Links of this span</source>
        <translation>Koppelingen van dit fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="273"/>
        <source>No links yet.</source>
        <translation>Nog geen koppelingen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="370"/>
        <source>%1:</source>
        <translation>%1:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="410"/>
        <source>No note.</source>
        <translation>Geen notitie.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="410"/>
        <source>Why this span, doubts, a question for the lead…</source>
        <translation>Waarom dit fragment, twijfels, een vraag voor de coördinator…</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="428"/>
        <source>&amp;Judges:</source>
        <translation>Be&amp;oordeelt:</translation>
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
        <translation>een fragment dat hier niet wordt getoond</translation>
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
        <translation>Fourfold: handmatige frame-analyse van nieuws- en opinieartikelen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="29"/>
        <source>Code as the coder with this pseudonym.</source>
        <translation>Coderen als de codeur met dit pseudoniem.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="32"/>
        <source>A project file to open (*.fourfold).</source>
        <translation>Een projectbestand om te openen (*.fourfold).</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="40"/>
        <source>Cannot open project</source>
        <translation>Project kan niet worden geopend</translation>
    </message>
</context>
</TS>
